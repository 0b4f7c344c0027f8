/**
 * Weight per hanging position for planning: each unit's own weight plus an allowance per unit (clamp,
 * safety cable, its share of cable), the total against the position's rated load, and kg per metre.
 *
 * Rules (documented in README and the panel):
 * - A point rating is for the whole load at one point: the total is compared with it.
 * - A uniform rating assumes the load spread evenly along the run: the total is compared with it, and
 *   kg per metre (total / length) is given. Because the rating assumes an even spread, units bunched
 *   together are flagged too, by bending moment: the run is taken as one span supported at its two
 *   ends, the units as point loads where their mounts project onto it (clamped to its ends), and the
 *   largest bending moment they cause is compared with that of the rated load spread evenly, W·L/8.
 *   This checks bending only: deflection (long spans) and shear (short ones) can limit a point load
 *   further, so a position's own load table, where it gives a centre-point or point-load figure,
 *   governs, and that figure can be less than half the evenly spread rating. Positions hung from
 *   more points than their two ends behave differently; this is a planning prompt to ask the rigger,
 *   not a structural calculation.
 * - Over means strictly above (with a relative tolerance of 1e-9); a total exactly at the rating is
 *   within it.
 * - Units of unknown weight (no type, or a type with 0 kg) are counted as 0 kg plus the allowance and
 *   reported by id.
 */
import { exceeds } from './loads';

export type WeightFlag = 'no-rating' | 'ok' | 'bunched' | 'over-rating';

export interface WeightPositionInput {
  readonly id: string;
  readonly name: string;
  readonly ratedLoadKg: number | null;
  readonly loadKind: 'uniform' | 'point';
  readonly shape:
    | {
        readonly kind: 'line';
        readonly start: { readonly x: number; readonly y: number };
        readonly end: { readonly x: number; readonly y: number };
      }
    | { readonly kind: 'point'; readonly at: { readonly x: number; readonly y: number } };
}

export interface WeightUnitInput {
  readonly id: string;
  readonly positionId: string | null;
  /** The type's weight, kg; null when the type is unknown. */
  readonly weightKg: number | null;
  /** Where the unit hangs in plan, m. */
  readonly at: { readonly x: number; readonly y: number };
}

export interface PositionWeight {
  readonly id: string;
  readonly name: string;
  readonly loadKind: 'uniform' | 'point';
  readonly unitIds: readonly string[];
  /** Sum of the units' own weights, kg. */
  readonly unitsKg: number;
  /** Allowance per unit × number of units, kg. */
  readonly allowanceKg: number;
  readonly totalKg: number;
  readonly ratedLoadKg: number | null;
  /** Total as a share of the rating, %; null without a rating. */
  readonly ratingPct: number | null;
  /** Length of a line position in plan, m; null for a point position. */
  readonly lengthM: number | null;
  /** Total / length, kg/m; null for a point position or a run of zero length. */
  readonly kgPerM: number | null;
  /** Uniform rating / length, kg/m; null unless a uniform rating on a run of some length. */
  readonly ratedKgPerM: number | null;
  /** Largest bending moment of the units on the run as a simple span, kg·m; null unless ratedKgPerM is given. */
  readonly peakMomentKgM: number | null;
  /** Bending moment of the rated load spread evenly, W·L/8, kg·m; null unless ratedKgPerM is given. */
  readonly ratedMomentKgM: number | null;
  readonly unknownWeightUnitIds: readonly string[];
  readonly flag: WeightFlag;
}

/**
 * Largest bending moment of point loads on a span of `lengthM` supported at both ends (kg·m, g
 * cancels). It is largest under one of the loads: M(x) = R₁·x − Σ over loads left of x of P·(x − a),
 * with R₁ = Σ P·(L − a) / L.
 */
export function peakMomentKgM(loads: readonly { offsetM: number; kg: number }[], lengthM: number): number {
  if (!(lengthM > 0)) return 0;
  const leftReaction = loads.reduce((sum, load) => sum + (load.kg * (lengthM - load.offsetM)) / lengthM, 0);
  let best = 0;
  for (const at of loads) {
    const x = at.offsetM;
    const moment = loads.reduce(
      (sum, load) => (load.offsetM < x ? sum - load.kg * (x - load.offsetM) : sum),
      leftReaction * x,
    );
    best = Math.max(best, moment);
  }
  return best;
}

function offsetAlong(
  point: { x: number; y: number },
  start: { x: number; y: number },
  end: { x: number; y: number },
): number {
  const dx = end.x - start.x;
  const dy = end.y - start.y;
  const length = Math.hypot(dx, dy);
  if (!(length > 0)) return 0;
  const along = ((point.x - start.x) * dx + (point.y - start.y) * dy) / length;
  return Math.min(length, Math.max(0, along));
}

/** Weight on every position, in the order given. */
export function positionWeights(
  positions: readonly WeightPositionInput[],
  units: readonly WeightUnitInput[],
  allowancePerUnitKg: number,
): PositionWeight[] {
  return positions.map((position): PositionWeight => {
    const held = units.filter((unit) => unit.positionId === position.id);
    const unitsKg = held.reduce((sum, unit) => sum + (unit.weightKg ?? 0), 0);
    const allowanceKg = held.length * allowancePerUnitKg;
    const totalKg = unitsKg + allowanceKg;
    const rated = position.ratedLoadKg;
    const shape = position.shape;
    const lengthM =
      shape.kind === 'line' ? Math.hypot(shape.end.x - shape.start.x, shape.end.y - shape.start.y) : null;
    const ratedKgPerM =
      rated !== null && position.loadKind === 'uniform' && lengthM !== null && lengthM > 0
        ? rated / lengthM
        : null;
    const peak =
      ratedKgPerM !== null && shape.kind === 'line' && lengthM !== null
        ? peakMomentKgM(
            held.map((unit) => ({
              offsetM: offsetAlong(unit.at, shape.start, shape.end),
              kg: (unit.weightKg ?? 0) + allowancePerUnitKg,
            })),
            lengthM,
          )
        : null;
    const ratedMoment =
      ratedKgPerM !== null && rated !== null && lengthM !== null ? (rated * lengthM) / 8 : null;
    let flag: WeightFlag = rated === null ? 'no-rating' : 'ok';
    if (rated !== null && exceeds(totalKg, rated)) flag = 'over-rating';
    else if (peak !== null && ratedMoment !== null && exceeds(peak, ratedMoment)) flag = 'bunched';
    return {
      id: position.id,
      name: position.name,
      loadKind: position.loadKind,
      unitIds: held.map((unit) => unit.id),
      unitsKg,
      allowanceKg,
      totalKg,
      ratedLoadKg: rated,
      ratingPct: rated === null ? null : (totalKg / rated) * 100,
      lengthM,
      kgPerM: lengthM !== null && lengthM > 0 ? totalKg / lengthM : null,
      ratedKgPerM,
      peakMomentKgM: peak,
      ratedMomentKgM: ratedMoment,
      unknownWeightUnitIds: held.filter((unit) => !((unit.weightKg ?? 0) > 0)).map((unit) => unit.id),
      flag,
    };
  });
}
