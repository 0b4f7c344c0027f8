/** Sorting and filtering of the schedule's rows (pure; the table keeps the choice as view state). */
import type { ScheduleRow } from '@/lib/plot/paperwork';

export type ScheduleKey =
  | 'position'
  | 'unit'
  | 'type'
  | 'purpose'
  | 'channel'
  | 'circuit'
  | 'levelPct'
  | 'filter'
  | 'powerW'
  | 'weightKg'
  | 'notes';

export interface ScheduleSort {
  readonly key: ScheduleKey | null;
  readonly descending: boolean;
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** Compare two cells: numbers by value, text in natural order ("A2" before "A10"); empty cells last. */
function compareCells(a: string | number | null, b: string | number | null): number {
  const emptyA = a === null || a === '';
  const emptyB = b === null || b === '';
  if (emptyA || emptyB) return emptyA === emptyB ? 0 : emptyA ? 1 : -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return collator.compare(String(a), String(b));
}

/** Rows sorted by one column (stable; hanging order breaks ties; empty cells stay last either way). */
export function sortRows(rows: readonly ScheduleRow[], sort: ScheduleSort): ScheduleRow[] {
  const { key } = sort;
  if (key === null) return [...rows];
  const indexed = rows.map((row, index) => ({ row, index }));
  indexed.sort((a, b) => {
    const x = a.row[key];
    const y = b.row[key];
    const emptyX = x === null || x === '';
    const emptyY = y === null || y === '';
    if (emptyX !== emptyY) return emptyX ? 1 : -1;
    const order = compareCells(x, y);
    return (sort.descending ? -order : order) || a.index - b.index;
  });
  return indexed.map((entry) => entry.row);
}

/** Rows with any cell containing every word of `query` (case-insensitive); all rows for an empty query. */
export function filterRows(rows: readonly ScheduleRow[], query: string): ScheduleRow[] {
  const words = query.toLocaleLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...rows];
  return rows.filter((row) => {
    const text = [
      row.position ?? 'free-standing',
      row.unit,
      row.type,
      row.purpose,
      row.channel,
      row.circuit,
      row.filter,
      row.notes,
    ]
      .filter((cell) => cell !== null)
      .join(' ')
      .toLocaleLowerCase();
    return words.every((word) => text.includes(word));
  });
}
