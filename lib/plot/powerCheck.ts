/**
 * The power and weight checks of a plot: the document's supply, circuits, units and positions handed
 * to the pure arithmetic in lib/analysis (loads.ts, rigWeights.ts), and the cautions that go with them.
 */
import { type PositionWeight, type SupplyLoad, positionWeights, supplyLoad } from '../analysis';
import type { PlotDocument } from './schema/document';

export const POWER_CAUTION =
  'Planning estimates only. A qualified electrician and the local electrical code decide what may be connected, how it is protected and cabled, and whether the supply is adequate. Loads are nameplate power at full with unity power factor (I = P / V); real sources can draw more current than this.';

export const WEIGHT_CAUTION =
  'Planning estimates only. A qualified rigger and local regulations decide what may hang on a position and how; every unit needs its safety cable.';

/** Loads of every listed circuit, phase and feeder, at full (nameplate) power. */
export function powerCheck(document: PlotDocument): SupplyLoad {
  const power = new Map(document.fixtureTypes.map((type) => [type.id, type.powerW]));
  return supplyLoad(
    document.power,
    document.fixtures.map((unit) => ({
      id: unit.id,
      circuit: unit.circuit,
      powerW: power.get(unit.typeId) ?? null,
      levelPct: unit.levelPct,
    })),
  );
}

/** Weight on every hanging position: units' own weight plus the allowance per unit, against the rating. */
export function weightCheck(document: PlotDocument): PositionWeight[] {
  const weight = new Map(document.fixtureTypes.map((type) => [type.id, type.weightKg]));
  return positionWeights(
    document.positions,
    document.fixtures.map((unit) => ({
      id: unit.id,
      positionId: unit.positionId,
      weightKg: weight.get(unit.typeId) ?? null,
      at: { x: unit.mount.x, y: unit.mount.y },
    })),
    document.rigging.allowancePerUnitKg,
  );
}
