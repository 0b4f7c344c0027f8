'use client';

/** Opens the browser's print dialog (print to PDF from there). */
export function PrintButton() {
  return (
    <button type="button" onClick={() => window.print()}>
      Print…
    </button>
  );
}
