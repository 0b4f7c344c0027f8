/**
 * The focus chart: for each unit, where its focus point lies from the centre line and the setting
 * line, how it is aimed, and the pool it makes. The figures come from the same focus engine the
 * inspector and the report use (`createPlotDeriver` → `fixtureFocus`), never recomputed here.
 */
import type { FixtureFocus } from '../../analysis';
import { createPlotDeriver } from '../derive';
import type { PlotDocument } from '../schema/document';
import { scheduleRows } from './schedule';

export interface FocusChartRow {
  readonly fixtureId: string;
  readonly position: string | null;
  readonly unit: number | null;
  readonly type: string;
  readonly channel: number | null;
  readonly purpose: string;
  /** Focus point across the stage from the centre line, m (+ stage left, − stage right). */
  readonly acrossM: number;
  /** Focus point from the setting line, m (+ upstage, − downstage toward the audience). */
  readonly upstageM: number;
  /** Height of the focus point above the stage floor, m. */
  readonly heightM: number;
  readonly panDeg: number | null;
  readonly tiltDeg: number | null;
  readonly throwM: number | null;
  /** Beam and field angles at the unit's setting, degrees (null for soft sources). */
  readonly beamAngleDeg: number | null;
  readonly fieldAngleDeg: number | null;
  /** The zoom setting as stored, degrees; null when the type's nominal spread is used. */
  readonly zoomBeamDeg: number | null;
  /** The lens angles the type can be fitted with, degrees (may be empty). */
  readonly lensOptionsDeg: readonly number[];
  /** Diameters square to the beam at the throw, m. */
  readonly beamDiameterM: number | null;
  readonly fieldDiameterM: number | null;
  /** Pools on the focus plane: greatest width across and length along the beam, m (null unless closed). */
  readonly beamPoolWidthM: number | null;
  readonly beamPoolLengthM: number | null;
  readonly fieldPoolWidthM: number | null;
  readonly fieldPoolLengthM: number | null;
  /** The pools' states ('closed', 'open', 'misses', 'apex-on-plane'), or null without a beam edge. */
  readonly beamPoolState: string | null;
  readonly fieldPoolState: string | null;
  readonly notes: string;
  /** Why figures are missing, or null. */
  readonly problem: string | null;
}

/** Focus chart rows in hanging order (the schedule's order), one per unit whose type exists. */
export function focusChartRows(document: PlotDocument): FocusChartRow[] {
  const derived = createPlotDeriver()(document);
  return scheduleRows(document).flatMap((row): FocusChartRow[] => {
    const unit = derived.byId.get(row.fixtureId);
    if (!unit) return [];
    const focus: FixtureFocus = unit.focus;
    const photometry = unit.type.photometry;
    return [
      {
        fixtureId: row.fixtureId,
        position: row.position,
        unit: row.unit,
        type: row.type,
        channel: row.channel,
        purpose: row.purpose,
        acrossM: unit.fixture.focus.x,
        upstageM: unit.fixture.focus.y,
        heightM: unit.fixture.focus.z,
        panDeg: focus.aim?.panDeg ?? null,
        tiltDeg: focus.aim?.tiltDeg ?? null,
        throwM: focus.aim?.throwM ?? null,
        beamAngleDeg: focus.angles?.beamAngleDeg ?? null,
        fieldAngleDeg: focus.angles?.fieldAngleDeg ?? null,
        zoomBeamDeg: unit.fixture.zoomBeamDeg,
        lensOptionsDeg: photometry.kind === 'beam' ? photometry.lensOptionsDeg : [],
        beamDiameterM: focus.beamDiameterM,
        fieldDiameterM: focus.fieldDiameterM,
        beamPoolWidthM: focus.beamPool?.widthM ?? null,
        beamPoolLengthM: focus.beamPool?.lengthM ?? null,
        fieldPoolWidthM: focus.fieldPool?.widthM ?? null,
        fieldPoolLengthM: focus.fieldPool?.lengthM ?? null,
        beamPoolState: focus.beamPool?.state ?? null,
        fieldPoolState: focus.fieldPool?.state ?? null,
        notes: row.notes,
        problem: focus.problem,
      },
    ];
  });
}
