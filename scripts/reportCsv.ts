/** The paperwork sheets as CSV files in a folder, for `npm run report -- file --csv DIR`. */
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { type PlotDocument, focusChartCsv, scheduleCsv } from '../lib/plot';

/** One sheet: its file name and how to write it. The power sheet (power.csv) joins this list. */
const SHEETS: readonly {
  readonly file: string;
  readonly what: string;
  readonly csv: (d: PlotDocument) => string;
}[] = [
  { file: 'schedule.csv', what: 'fixture schedule', csv: scheduleCsv },
  { file: 'focus-chart.csv', what: 'focus chart', csv: focusChartCsv },
];

export type WriteResult = { ok: true; lines: string[] } | { ok: false; message: string };

function reason(error: unknown): string {
  return (error as NodeJS.ErrnoException).code ?? (error as Error).message;
}

/** Create `folder` if needed and write every sheet into it; a line per file written, or why not. */
export function writeCsvSheets(document: PlotDocument, folder: string): WriteResult {
  try {
    mkdirSync(folder, { recursive: true });
  } catch (error) {
    return { ok: false, message: `${folder}: cannot create the folder (${reason(error)})` };
  }
  const lines: string[] = [];
  const rows = document.fixtures.length;
  for (const sheet of SHEETS) {
    const target = path.join(folder, sheet.file);
    try {
      writeFileSync(target, sheet.csv(document), 'utf8');
    } catch (error) {
      return { ok: false, message: `${target}: cannot write it (${reason(error)})` };
    }
    lines.push(`Wrote ${target}: ${sheet.what}, ${rows} ${rows === 1 ? 'unit' : 'units'}`);
  }
  return { ok: true, lines };
}
