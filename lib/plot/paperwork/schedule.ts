/**
 * The fixture schedule: one row per unit with what the crew hangs, patches and colours, in hanging
 * order (positions in document order, units by number; free-standing units last).
 */
import type { PlotDocument } from '../schema/document';
import type { Fixture } from '../schema/fixture';

export interface ScheduleRow {
  readonly fixtureId: string;
  /** Position name, or null for a free-standing unit. */
  readonly position: string | null;
  readonly positionId: string | null;
  readonly unit: number | null;
  readonly type: string;
  readonly typeId: string;
  readonly purpose: string;
  readonly channel: number | null;
  /** Circuit or dimmer address as written on the rig. */
  readonly circuit: string | null;
  readonly levelPct: number;
  /** Filter name, or null for open white. */
  readonly filter: string | null;
  /** Electrical load of the unit's type at full, W (null when the type is missing). */
  readonly powerW: number | null;
  /** Weight of the unit's type as hung, kg, without the rigging allowance (null when the type is missing). */
  readonly weightKg: number | null;
  readonly notes: string;
}

/** Compare numbers that may be missing: missing sorts last. */
function compareMaybe(a: number | null, b: number | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return a - b;
}

/** The schedule's rows in hanging order: by position (document order, free units last), then unit number. */
export function scheduleRows(document: PlotDocument): ScheduleRow[] {
  const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
  const positions = new Map(document.positions.map((position, index) => [position.id, { position, index }]));
  const order = (unit: Fixture) =>
    unit.positionId === null ? Number.MAX_SAFE_INTEGER : (positions.get(unit.positionId)?.index ?? -1);
  const sorted = document.fixtures
    .map((unit, index) => ({ unit, index }))
    .sort(
      (a, b) => order(a.unit) - order(b.unit) || compareMaybe(a.unit.unit, b.unit.unit) || a.index - b.index,
    );
  return sorted.map(({ unit }) => {
    const type = types.get(unit.typeId);
    return {
      fixtureId: unit.id,
      position: unit.positionId === null ? null : (positions.get(unit.positionId)?.position.name ?? null),
      positionId: unit.positionId,
      unit: unit.unit,
      type: type?.name ?? unit.typeId,
      typeId: unit.typeId,
      purpose: unit.purpose,
      channel: unit.channel,
      circuit: unit.circuit,
      levelPct: unit.levelPct,
      filter: unit.filter?.name ?? null,
      powerW: type?.powerW ?? null,
      weightKg: type?.weightKg ?? null,
      notes: unit.notes,
    };
  });
}
