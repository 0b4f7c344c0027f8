/** The fixture schedule as a printed table, one block per position (read-only). */
import type { PlotDocument } from '@/lib/plot';
import { scheduleRows } from '@/lib/plot/paperwork';
import { formatWatts, formatWeight } from './scheduleFormat';
import { groupByPosition } from './groupByPosition';

export function ScheduleSheet({ document }: { document: PlotDocument }) {
  const rows = scheduleRows(document);
  return (
    <table className="schedule-sheet">
      <thead>
        <tr>
          <th scope="col">Unit</th>
          <th scope="col">Type</th>
          <th scope="col">Purpose</th>
          <th scope="col">Ch</th>
          <th scope="col">Circuit</th>
          <th scope="col">Level</th>
          <th scope="col">Filter</th>
          <th scope="col">Power</th>
          <th scope="col">Weight</th>
          <th scope="col">Notes</th>
        </tr>
      </thead>
      {groupByPosition(rows).map((group) => (
        <tbody key={group.key}>
          <tr className="schedule-sheet-position">
            <th scope="rowgroup" colSpan={10}>
              {group.name}
            </th>
          </tr>
          {group.rows.map((row) => (
            <tr key={row.fixtureId} data-fixture-id={row.fixtureId}>
              <td>{row.unit ?? '—'}</td>
              <td>{row.type}</td>
              <td>{row.purpose}</td>
              <td>{row.channel ?? ''}</td>
              <td>{row.circuit ?? ''}</td>
              <td>{Number(row.levelPct.toFixed(1))} %</td>
              <td>{row.filter ?? 'open'}</td>
              <td>{formatWatts(row.powerW)}</td>
              <td>{formatWeight(row.weightKg, document.displayUnits)}</td>
              <td className="schedule-notes">{row.notes}</td>
            </tr>
          ))}
        </tbody>
      ))}
    </table>
  );
}
