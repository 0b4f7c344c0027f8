'use client';

import { useMemo, useState } from 'react';
import { type FixtureChanges, updateFixture } from '@/lib/plot';
import { type ScheduleRow, scheduleRows } from '@/lib/plot/paperwork';
import { useEditor } from '../editor/EditorContext';
import type { CommitOutcome } from '../inputs/useFieldDraft';
import { ScheduleCell } from './ScheduleCell';
import { formatWatts, formatWeight } from './scheduleFormat';
import { type ScheduleKey, type ScheduleSort, filterRows, sortRows } from './scheduleSort';

const COLUMNS: readonly { key: ScheduleKey; label: string }[] = [
  { key: 'position', label: 'Position' },
  { key: 'unit', label: 'Unit' },
  { key: 'type', label: 'Type' },
  { key: 'purpose', label: 'Purpose' },
  { key: 'channel', label: 'Channel' },
  { key: 'circuit', label: 'Circuit' },
  { key: 'levelPct', label: 'Level %' },
  { key: 'filter', label: 'Filter' },
  { key: 'powerW', label: 'Power' },
  { key: 'weightKg', label: 'Weight' },
  { key: 'notes', label: 'Notes' },
];

/** Text typed for an optional whole number: empty is none, else the number (the command checks it). */
function optionalNumber(text: string): { ok: true; value: number | null } | { ok: false; message: string } {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: true, value: null };
  const value = Number(trimmed);
  return Number.isFinite(value)
    ? { ok: true, value }
    : { ok: false, message: `"${trimmed}" is not a number` };
}

/**
 * Every unit in a table: sort by any column, filter by words, and edit purpose, channel, circuit,
 * level and notes in place through `updateFixture`; a refusal shows at the cell.
 */
export function ScheduleTable() {
  const { document, run, select, selection } = useEditor();
  const [sort, setSort] = useState<ScheduleSort>({ key: null, descending: false });
  const [query, setQuery] = useState('');
  const all = useMemo(() => scheduleRows(document), [document]);
  const rows = useMemo(() => sortRows(filterRows(all, query), sort), [all, query, sort]);

  const edit = (row: ScheduleRow, changes: FixtureChanges): CommitOutcome => {
    const result = run(updateFixture, { id: row.fixtureId, changes });
    return result.ok ? null : result.message;
  };
  const numberEdit = (row: ScheduleRow, text: string, key: 'channel' | 'levelPct'): CommitOutcome => {
    const parsed = optionalNumber(text);
    if (!parsed.ok) return parsed.message;
    if (key === 'levelPct' && parsed.value === null) return 'Enter a level from 0 to 100 %';
    return edit(row, { [key]: parsed.value });
  };
  const label = (row: ScheduleRow, what: string) =>
    `${what} of ${row.position ?? 'free-standing'} unit ${row.unit ?? row.fixtureId}`;

  return (
    <div className="schedule-view">
      <div className="schedule-controls">
        <label>
          Filter{' '}
          <input
            type="search"
            value={query}
            placeholder="position, type, purpose, channel…"
            onChange={(event) => setQuery(event.target.value)}
          />
        </label>
        <span role="status">
          {rows.length === all.length ? `${all.length} units` : `${rows.length} of ${all.length} units`}
        </span>
      </div>
      <div className="schedule-scroll">
        <table className="schedule-table">
          <thead>
            <tr>
              {COLUMNS.map((column) => {
                const active = sort.key === column.key;
                return (
                  <th
                    key={column.key}
                    scope="col"
                    aria-sort={active ? (sort.descending ? 'descending' : 'ascending') : 'none'}
                  >
                    <button
                      type="button"
                      className="schedule-sort"
                      onClick={() =>
                        setSort(
                          active
                            ? sort.descending
                              ? { key: null, descending: false }
                              : { key: column.key, descending: true }
                            : { key: column.key, descending: false },
                        )
                      }
                      title="Sort by this column (again: reverse, third time: hanging order)"
                    >
                      {column.label}
                      <span aria-hidden="true">{active ? (sort.descending ? ' ▼' : ' ▲') : ''}</span>
                    </button>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr
                key={row.fixtureId}
                data-fixture-id={row.fixtureId}
                className={selection.includes(row.fixtureId) ? 'schedule-row-selected' : undefined}
                onFocus={() => {
                  if (!selection.includes(row.fixtureId)) select([row.fixtureId]);
                }}
              >
                <td>{row.position ?? 'free-standing'}</td>
                <td>{row.unit ?? '—'}</td>
                <td className="schedule-type">{row.type}</td>
                <td>
                  <ScheduleCell
                    wide
                    label={label(row, 'Purpose')}
                    shown={row.purpose}
                    onCommit={(text) => edit(row, { purpose: text })}
                  />
                </td>
                <td>
                  <ScheduleCell
                    numeric
                    label={label(row, 'Channel')}
                    shown={row.channel === null ? '' : String(row.channel)}
                    onCommit={(text) => numberEdit(row, text, 'channel')}
                  />
                </td>
                <td>
                  <ScheduleCell
                    label={label(row, 'Circuit')}
                    shown={row.circuit ?? ''}
                    onCommit={(text) => edit(row, { circuit: text.trim() === '' ? null : text })}
                  />
                </td>
                <td>
                  <ScheduleCell
                    numeric
                    label={label(row, 'Level')}
                    shown={String(Number(row.levelPct.toFixed(1)))}
                    onCommit={(text) => numberEdit(row, text, 'levelPct')}
                  />
                </td>
                <td>{row.filter ?? 'open'}</td>
                <td>{formatWatts(row.powerW)}</td>
                <td>{formatWeight(row.weightKg, document.displayUnits)}</td>
                <td>
                  <ScheduleCell
                    wide
                    label={label(row, 'Notes')}
                    shown={row.notes}
                    onCommit={(text) => edit(row, { notes: text })}
                  />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
