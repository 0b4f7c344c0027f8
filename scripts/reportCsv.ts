/** The paperwork sheets as CSV files in a folder, for `npm run report -- file --csv DIR`. */
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { type PlotDocument, focusChartCsv, powerSheetCsv, scheduleCsv } from '../lib/plot';

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** One sheet: its file name, how to write it, and what it holds (for the line saying it was written). */
const SHEETS: readonly {
  readonly file: string;
  readonly csv: (d: PlotDocument) => string;
  readonly what: (d: PlotDocument) => string;
}[] = [
  {
    file: 'schedule.csv',
    csv: scheduleCsv,
    what: (d) => `fixture schedule, ${count(d.fixtures.length, 'unit', 'units')}`,
  },
  {
    file: 'focus-chart.csv',
    csv: focusChartCsv,
    what: (d) => `focus chart, ${count(d.fixtures.length, 'unit', 'units')}`,
  },
  {
    file: 'power.csv',
    csv: powerSheetCsv,
    what: (d) => `power sheet, ${count(d.power.circuits.length, 'listed circuit', 'listed circuits')}`,
  },
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
  for (const sheet of SHEETS) {
    const target = path.join(folder, sheet.file);
    try {
      writeFileSync(target, sheet.csv(document), 'utf8');
    } catch (error) {
      return { ok: false, message: `${target}: cannot write it (${reason(error)})` };
    }
    lines.push(`Wrote ${target}: ${sheet.what(document)}`);
  }
  return { ok: true, lines };
}
