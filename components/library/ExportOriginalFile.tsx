'use client';

import { MAX_STORED_FILE_CHARS, type MeasuredPhotometry } from '@/lib/plot';

/**
 * Hand text to the browser as a download named `fileName` (a Blob behind an object URL, clicked
 * through a temporary <a download>). The text is written as UTF-8, character for character.
 */
export function downloadText(text: string, fileName: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/plain;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoked after the click has been handled, so the download has its data.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** Export a measured type's photometric file exactly as it was imported, or say why it cannot be. */
export function ExportOriginalFile({ file }: { file: MeasuredPhotometry['file'] }) {
  const text = file.originalText;
  if (text === null) {
    return (
      <p className="panel-note" data-export-original="unavailable">
        The original file was too large to keep (over {MAX_STORED_FILE_CHARS.toLocaleString('en')}{' '}
        characters), so it cannot be exported; the show keeps only its candela grid.
      </p>
    );
  }
  return (
    <button
      type="button"
      className="panel-button"
      data-export-original="available"
      onClick={() => downloadText(text, file.fileName)}
      title="Download the photometric file exactly as it was imported"
    >
      Export {file.fileName}
    </button>
  );
}
