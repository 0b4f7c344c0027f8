/** The print view's choices, read from its address: ?sheet=plot|schedule|focus|all&paper=a4|letter. */

export type PrintSheet = 'plot' | 'schedule' | 'focus' | 'all';
export type PaperSize = 'a4' | 'letter';

/** CSS page sizes for @page. */
export const PAPER_PAGE_SIZES: Record<PaperSize, string> = { a4: 'A4', letter: 'letter' };

/** The sections each choice prints, in order. */
export const SHEETS_IN: Record<PrintSheet, readonly ('plan' | 'schedule' | 'focus')[]> = {
  plot: ['plan'],
  schedule: ['schedule'],
  focus: ['focus'],
  all: ['plan', 'schedule', 'focus'],
};

/** The sheet asked for, or everything when the value is missing or unknown. */
export function readPrintSheet(value: unknown): PrintSheet {
  return value === 'plot' || value === 'schedule' || value === 'focus' || value === 'all' ? value : 'all';
}

/** The paper asked for; A4 unless Letter is named. */
export function readPaperSize(value: unknown): PaperSize {
  return value === 'letter' ? 'letter' : 'a4';
}

/** The print view's address for a show. */
export function printHref(showId: string, sheet: PrintSheet, paper: PaperSize): string {
  return `/shows/${showId}/print?sheet=${sheet}&paper=${paper}`;
}
