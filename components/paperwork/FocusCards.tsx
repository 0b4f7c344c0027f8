/**
 * The focus chart as cards, one per unit, grouped by position, in large type for reading from a lift.
 * Figures come from `focusChartRows` (the same focus engine as the inspector and the report).
 */
import type { PlotDocument } from '@/lib/plot';
import {
  type FocusChartRow,
  STAGE_SIDE_LEGEND,
  describeAcross,
  describeUpDown,
  focusChartRows,
} from '@/lib/plot/paperwork';
import { type LengthUnitSystem, formatLength } from '@/lib/units';
import { formatAngleShort } from '../panels/format';
import { groupByPosition } from './groupByPosition';
import './focusCards.css';

const length = (valueM: number | null, units: LengthUnitSystem) =>
  valueM === null ? '—' : formatLength(valueM, units);

/** A pool on the focus plane: "2.81 m × 3.88 m" (across × along the beam), or why it has no size. */
function poolText(
  widthM: number | null,
  lengthM: number | null,
  state: string | null,
  units: LengthUnitSystem,
) {
  if (state === null) return '—';
  if (state === 'misses') return 'misses the focus plane';
  if (state === 'open') return 'open: spills beyond the plane';
  if (state === 'apex-on-plane') return 'unit is in the focus plane';
  return `${length(widthM, units)} × ${length(lengthM, units)}`;
}

/** The lens or zoom to set: the zoom setting, else the type's spread, with its lens options. */
function lensText(row: FocusChartRow): string {
  if (row.beamAngleDeg === null || row.fieldAngleDeg === null) return 'soft source: no lens';
  const spread = `${formatAngleShort(row.beamAngleDeg)} beam · ${formatAngleShort(row.fieldAngleDeg)} field`;
  const zoom = row.zoomBeamDeg === null ? '' : 'zoom to ';
  const lenses =
    row.lensOptionsDeg.length > 0 ? ` (lenses ${row.lensOptionsDeg.map(formatAngleShort).join(', ')})` : '';
  return `${zoom}${spread}${lenses}`;
}

function FocusCard({ row, units }: { row: FocusChartRow; units: LengthUnitSystem }) {
  return (
    <article className="focus-card" aria-label={`Unit ${row.unit ?? '—'} on ${row.position ?? 'its own'}`}>
      <header className="focus-card-head">
        <span className="focus-card-unit">Unit {row.unit ?? '—'}</span>
        <span className="focus-card-channel">Ch {row.channel ?? '—'}</span>
        <span className="focus-card-type">{row.type}</span>
      </header>
      {row.purpose ? <p className="focus-card-purpose">{row.purpose}</p> : null}
      <dl className="focus-card-figures">
        <dt>Focus point</dt>
        <dd className="focus-card-point">
          <span>{describeAcross(row.acrossM, units)}</span>
          <span>{describeUpDown(row.upstageM, units)}</span>
          <span className="focus-card-height">{formatLength(row.heightM, units)} up</span>
        </dd>
        <dt>Pan · tilt</dt>
        <dd>
          {row.panDeg === null ? '—' : formatAngleShort(row.panDeg)} ·{' '}
          {row.tiltDeg === null ? '—' : `${formatAngleShort(row.tiltDeg)} down`}
        </dd>
        <dt>Throw</dt>
        <dd>{length(row.throwM, units)}</dd>
        <dt>Beam pool</dt>
        <dd>{poolText(row.beamPoolWidthM, row.beamPoolLengthM, row.beamPoolState, units)}</dd>
        <dt>Field pool</dt>
        <dd>{poolText(row.fieldPoolWidthM, row.fieldPoolLengthM, row.fieldPoolState, units)}</dd>
        <dt>Lens</dt>
        <dd>{lensText(row)}</dd>
        {row.notes ? (
          <>
            <dt>Notes</dt>
            <dd className="focus-card-notes">{row.notes}</dd>
          </>
        ) : null}
        {row.problem ? (
          <>
            <dt>Problem</dt>
            <dd className="focus-card-problem">{row.problem}</dd>
          </>
        ) : null}
      </dl>
    </article>
  );
}

/** Every unit's focus card, grouped by position, with the legend for SR/SL and US/DS. */
export function FocusCards({ document }: { document: PlotDocument }) {
  const rows = focusChartRows(document);
  const units = document.displayUnits;
  return (
    <div className="focus-chart">
      <p className="focus-legend">
        {STAGE_SIDE_LEGEND} Pan: 0° points straight downstage, + toward stage left, − toward stage right.
        Tilt: below the horizontal. Pools: width across the beam × length along it, on the focus plane{' '}
        {formatLength(document.focusPlaneHeightM, units)} above the stage.
      </p>
      {rows.length === 0 ? <p>No units hung yet.</p> : null}
      {groupByPosition(rows).map((group) => (
        <section key={group.key} className="focus-group" aria-label={group.name}>
          <h3 className="focus-group-name">{group.name}</h3>
          <div className="focus-group-cards">
            {group.rows.map((row) => (
              <FocusCard key={row.fixtureId} row={row} units={units} />
            ))}
          </div>
        </section>
      ))}
    </div>
  );
}
