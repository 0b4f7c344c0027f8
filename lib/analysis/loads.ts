/**
 * Electrical load arithmetic for planning: load per circuit, per phase and per feeder, the neutral
 * current of an unbalanced three-phase supply and the phase imbalance. Plain inputs, SI units (W, A, V).
 *
 * Conventions (documented in README and the panel):
 * - Loads are at full: every unit draws its type's nameplate power (the usual, conservative planning
 *   practice). The load at the units' current levels is given beside it as a rough figure only
 *   (nameplate × level; real dimmers, LED drivers and fans do not draw exactly in proportion).
 * - Currents are I = P / V with V the phase-to-neutral voltage, i.e. unity power factor (resistive
 *   loads). Real LED and discharge sources draw more current than this for the same watts.
 * - A load is over its rating when I > rating, and over the continuous limit when
 *   I > limit % × rating. Exactly at either threshold is within it (the code compares the watts with
 *   a relative tolerance of 1e-9 so a sum that equals the limit is not flagged by rounding).
 * - Neutral current of a star (wye) supply with unity-power-factor loads: the phasor sum
 *   I_N = |I1 + I2·e^(−j120°) + I3·e^(+j120°)| = √(I1² + I2² + I3² − I1·I2 − I2·I3 − I3·I1).
 *   On a single-phase supply the neutral carries the phase current.
 * - Phase imbalance (NEMA-style definition applied to currents): the largest deviation of a phase
 *   current from the mean of the three, divided by the mean, in %. Null when no phase carries load.
 */

export type SupplySystem = 'single' | 'three';
export type LoadPhase = 'L1' | 'L2' | 'L3';
export const LOAD_PHASES: readonly LoadPhase[] = ['L1', 'L2', 'L3'];

/** 'over-rating': above the rating; 'over-limit': above the continuous limit but within the rating. */
export type LoadFlag = 'ok' | 'over-limit' | 'over-rating';

export interface LoadSupplyInput {
  readonly system: SupplySystem;
  /** Phase-to-neutral voltage, V (> 0). */
  readonly phaseVoltageV: number;
  /** Share of a rating that may be drawn continuously, %. */
  readonly continuousLimitPct: number;
  readonly feeders: readonly { readonly id: string; readonly name: string; readonly ratingA: number }[];
  readonly circuits: readonly {
    readonly address: string;
    readonly ratingA: number;
    readonly feederId: string | null;
    readonly phase: LoadPhase;
  }[];
}

export interface LoadUnitInput {
  readonly id: string;
  /** The circuit address written on the unit; null when none. */
  readonly circuit: string | null;
  /** Nameplate power at full, W; null when the unit's type is unknown. */
  readonly powerW: number | null;
  readonly levelPct: number;
}

export interface CircuitLoad {
  readonly address: string;
  readonly ratingA: number;
  readonly feederId: string | null;
  readonly phase: LoadPhase;
  readonly unitIds: readonly string[];
  /** At full (nameplate), W and A. */
  readonly powerW: number;
  readonly currentA: number;
  /** Rough load at the units' current levels, W. */
  readonly atLevelW: number;
  /** Current at full as a share of the rating, %. */
  readonly ratingPct: number;
  readonly flag: LoadFlag;
}

export interface PhaseLoad {
  readonly phase: LoadPhase;
  readonly powerW: number;
  readonly currentA: number;
}

export interface FeederLoad {
  readonly id: string;
  readonly name: string;
  readonly ratingA: number;
  /** One entry per phase conductor the supply has (L1 only on a single-phase supply). */
  readonly phases: readonly (PhaseLoad & { readonly ratingPct: number; readonly flag: LoadFlag })[];
  readonly neutralCurrentA: number;
  /** The worst flag of its phases. */
  readonly flag: LoadFlag;
}

export interface UnlistedCircuit {
  readonly address: string;
  readonly unitIds: readonly string[];
  readonly powerW: number;
  readonly currentA: number;
}

export interface SupplyLoad {
  readonly system: SupplySystem;
  readonly phaseVoltageV: number;
  /** √3 × phase voltage on a three-phase supply; null on a single-phase one. */
  readonly lineVoltageV: number | null;
  readonly continuousLimitPct: number;
  readonly circuits: readonly CircuitLoad[];
  readonly feeders: readonly FeederLoad[];
  /** Totals of the listed circuits per phase (L1 only on a single-phase supply). */
  readonly phases: readonly PhaseLoad[];
  /** Total at full of the listed circuits, W. */
  readonly totalPowerW: number;
  readonly totalAtLevelW: number;
  /** Every unit's nameplate power at full, on a listed circuit or not, W. */
  readonly allUnitsPowerW: number;
  readonly neutralCurrentA: number;
  /** Phase imbalance, %; null on a single-phase supply or when nothing is loaded. */
  readonly imbalancePct: number | null;
  /** Addresses written on units but not listed: no rating is known, so no check. */
  readonly unlisted: readonly UnlistedCircuit[];
  /** Units with no circuit written on them. */
  readonly noCircuitUnitIds: readonly string[];
  /** Units whose power is not known (unknown type, or a type with 0 W), counted as 0 W. */
  readonly unknownPowerUnitIds: readonly string[];
}

const TOLERANCE = 1e-9;

/** True when `value` is above `limit` by more than the rounding tolerance. */
export function exceeds(value: number, limit: number): boolean {
  return value > limit * (1 + TOLERANCE) + Number.MIN_VALUE;
}

/** The flag of a load of `powerW` against a rating of `ratingA` at `voltageV`. */
export function loadFlag(powerW: number, ratingA: number, voltageV: number, limitPct: number): LoadFlag {
  const ratedW = voltageV * ratingA;
  if (exceeds(powerW, ratedW)) return 'over-rating';
  if (exceeds(powerW, (ratedW * limitPct) / 100)) return 'over-limit';
  return 'ok';
}

/** I = P / V (A), 0 for a non-positive voltage (impossible by schema; never NaN). */
export function currentOf(powerW: number, voltageV: number): number {
  return voltageV > 0 ? powerW / voltageV : 0;
}

/** Neutral current of a star supply with unity-power-factor phase currents a, b, c (phasor sum). */
export function neutralCurrent(a: number, b: number, c: number): number {
  // a² + b² + c² − ab − bc − ca = ½((a−b)² + (b−c)² + (c−a)²) ≥ 0; written that way it never goes negative.
  return Math.sqrt(((a - b) ** 2 + (b - c) ** 2 + (c - a) ** 2) / 2);
}

/** Largest deviation from the mean over the mean, %; null when the mean is 0. */
export function phaseImbalancePct(currents: readonly number[]): number | null {
  if (currents.length === 0) return null;
  const mean = currents.reduce((sum, value) => sum + value, 0) / currents.length;
  if (!(mean > 0)) return null;
  return (Math.max(...currents.map((value) => Math.abs(value - mean))) / mean) * 100;
}

function worst(flags: readonly LoadFlag[]): LoadFlag {
  if (flags.includes('over-rating')) return 'over-rating';
  if (flags.includes('over-limit')) return 'over-limit';
  return 'ok';
}

/** Loads of every circuit, phase and feeder of `supply` from the units written on its circuits. */
export function supplyLoad(supply: LoadSupplyInput, units: readonly LoadUnitInput[]): SupplyLoad {
  const voltage = supply.phaseVoltageV;
  const limit = supply.continuousLimitPct;
  const phasesInUse: readonly LoadPhase[] = supply.system === 'three' ? LOAD_PHASES : ['L1'];
  const byAddress = new Map<string, LoadUnitInput[]>();
  const noCircuitUnitIds: string[] = [];
  for (const unit of units) {
    if (unit.circuit === null || unit.circuit.trim() === '') noCircuitUnitIds.push(unit.id);
    else byAddress.set(unit.circuit, [...(byAddress.get(unit.circuit) ?? []), unit]);
  }
  const watts = (list: readonly LoadUnitInput[]) => list.reduce((sum, unit) => sum + (unit.powerW ?? 0), 0);
  const circuits = supply.circuits.map((entry): CircuitLoad => {
    const on = byAddress.get(entry.address) ?? [];
    const powerW = watts(on);
    const currentA = currentOf(powerW, voltage);
    return {
      address: entry.address,
      ratingA: entry.ratingA,
      feederId: entry.feederId,
      phase: entry.phase,
      unitIds: on.map((unit) => unit.id),
      powerW,
      currentA,
      atLevelW: on.reduce((sum, unit) => sum + ((unit.powerW ?? 0) * unit.levelPct) / 100, 0),
      ratingPct: entry.ratingA > 0 ? (currentA / entry.ratingA) * 100 : 0,
      flag: loadFlag(powerW, entry.ratingA, voltage, limit),
    };
  });
  const phaseTotals = (list: readonly CircuitLoad[]): PhaseLoad[] =>
    phasesInUse.map((phase) => {
      const powerW = list
        .filter((entry) => entry.phase === phase)
        .reduce((sum, entry) => sum + entry.powerW, 0);
      return { phase, powerW, currentA: currentOf(powerW, voltage) };
    });
  const neutralOf = (phases: readonly PhaseLoad[]) => {
    const current = (phase: LoadPhase) => phases.find((entry) => entry.phase === phase)?.currentA ?? 0;
    return supply.system === 'three'
      ? neutralCurrent(current('L1'), current('L2'), current('L3'))
      : current('L1');
  };
  const feeders = supply.feeders.map((line): FeederLoad => {
    const phases = phaseTotals(circuits.filter((entry) => entry.feederId === line.id)).map((phase) => ({
      ...phase,
      ratingPct: (phase.currentA / line.ratingA) * 100,
      flag: loadFlag(phase.powerW, line.ratingA, voltage, limit),
    }));
    return {
      id: line.id,
      name: line.name,
      ratingA: line.ratingA,
      phases,
      neutralCurrentA: neutralOf(phases),
      flag: worst(phases.map((phase) => phase.flag)),
    };
  });
  const phases = phaseTotals(circuits);
  const listed = new Set(supply.circuits.map((entry) => entry.address));
  const unlisted = [...byAddress.entries()]
    .filter(([address]) => !listed.has(address))
    .map(([address, on]) => ({
      address,
      unitIds: on.map((unit) => unit.id),
      powerW: watts(on),
      currentA: currentOf(watts(on), voltage),
    }));
  return {
    system: supply.system,
    phaseVoltageV: voltage,
    lineVoltageV: supply.system === 'three' ? Math.sqrt(3) * voltage : null,
    continuousLimitPct: limit,
    circuits,
    feeders,
    phases,
    totalPowerW: circuits.reduce((sum, entry) => sum + entry.powerW, 0),
    totalAtLevelW: circuits.reduce((sum, entry) => sum + entry.atLevelW, 0),
    allUnitsPowerW: watts(units),
    neutralCurrentA: neutralOf(phases),
    imbalancePct: supply.system === 'three' ? phaseImbalancePct(phases.map((phase) => phase.currentA)) : null,
    unlisted,
    noCircuitUnitIds,
    unknownPowerUnitIds: units.filter((unit) => !((unit.powerW ?? 0) > 0)).map((unit) => unit.id),
  };
}
