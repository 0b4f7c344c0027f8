/**
 * A round beam profile tabulated for the coverage kernel, within about 1e-11 relative of the closed
 * form (each piece checked to 1e-11 when built; tests hold it to 1e-10 at dense sample angles).
 *
 * The variable is s = (1 − cos θ) / (1 − cos θe) ∈ [0, 1] (θe the model's edge): the kernel has cos θ
 * at hand, so s needs no square root or arc cosine per cell, and a beam's cells are spread about
 * evenly over s (s grows with the solid angle). [0, 1] is cut into N equal intervals (256 … 4096) and
 * on each the profile f(s) = exp(−ln2·(θ(s)/hb)^p), θ(s) = 2·asin(sin(θe/2)·√s), is interpolated by a
 * degree-5 polynomial through six Chebyshev points (error ≈ 2·(h/4)⁶/6!·|f⁽⁶⁾|).
 *
 * Near the axis f behaves like 1 − c·s^(p/2), which polynomials follow poorly for small p: the main
 * table is used from its first interval that passes the check, and below that (never above s = 1/16)
 * a table 16 times finer over the first sixteenth of s; where even that fails (its first few intervals
 * for p < 2) the closed form is evaluated from the angle itself (atan2 of |a × d| and a · d, as the
 * point-source functions do).
 *
 * Every interval is checked against the closed form when the table is built (at both ends and the
 * middle, where a Chebyshev interpolant's error peaks), together with the rounding of s itself
 * (1 − cos θ loses digits near the axis, which matters for very narrow beams); only intervals that
 * pass are used, so the tables never trade accuracy for speed: what fails is computed exactly.
 */
import { profileEdgeAngleRad, profileExponent, profileShape } from '../../photometry/beam';

export interface ProfileTable {
  readonly beamHalfRad: number;
  readonly fieldHalfRad: number;
  /** cos of the edge angle: cells with cos θ ≤ this get no light. */
  readonly cosEdge: number;
  /** cos of the beam half-angle: cells with cos θ ≥ this are inside the beam angle (≥ 50 % of peak). */
  readonly cosBeam: number;
  /** N / (1 − cos θe): turns 1 − cos θ into the table position s·N. */
  readonly positionScale: number;
  /** Number of intervals N. */
  readonly intervals: number;
  /** Positions below this take the near-axis path (`nearAxisProfile`): the fine table or the closed form. */
  readonly deferBelow: number;
  /**
   * Six monomial coefficients per interval (interval k at 6k … 6k + 5) in u = 2·(position − k) − 1,
   * u ∈ [−1, 1]: f ≈ c0 + u·(c1 + u·(c2 + u·(c3 + u·(c4 + u·c5)))); then one constant interval f(1) for
   * a position that rounds up to N at the edge, so the kernel needs no bounds check.
   */
  readonly coefficients: Float64Array;
  /** The first sixteenth of s, FINE_INTERVALS intervals: position·fineRatio is the position in it. */
  readonly fineCoefficients: Float64Array;
  readonly fineRatio: number;
  /** Fine positions below this use the closed form. */
  readonly fineExactBelow: number;
  /** The largest relative error found by the build's checks over the intervals in use. */
  readonly checkedError: number;
}

/** Relative error the build accepts per interval (the kernel's promise is 1e-10 with margin). */
export const TABLE_TOLERANCE = 1e-11;
const DEGREE = 5;
const NODES = DEGREE + 1;
const FIRST_INTERVALS = 256;
const MOST_INTERVALS = 4096;
/** The fine table covers s < 1/FINE_SPAN with this many intervals. */
const FINE_SPAN = 16;
const FINE_INTERVALS = 256;
/** Relative rounding of 1 − cos θ computed from a cos θ near 1 (a few units in the last place). */
const COSINE_ROUNDING = 4e-16;

/** Chebyshev points on [−1, 1] and the inverse of their Vandermonde matrix (monomials from values). */
const chebyshev = Array.from({ length: NODES }, (_, index) =>
  Math.cos(((2 * index + 1) * Math.PI) / (2 * NODES)),
);
const inverseVandermonde = invert(
  chebyshev.map((x) => Array.from({ length: NODES }, (_, power) => x ** power)),
);

function invert(matrix: number[][]): number[][] {
  const size = matrix.length;
  const work = matrix.map((row, index) => [
    ...row,
    ...Array.from({ length: size }, (_, column) => (column === index ? 1 : 0)),
  ]);
  for (let column = 0; column < size; column += 1) {
    let pivot = column;
    for (let row = column + 1; row < size; row += 1)
      if (Math.abs(work[row][column]) > Math.abs(work[pivot][column])) pivot = row;
    [work[column], work[pivot]] = [work[pivot], work[column]];
    const lead = work[column][column];
    for (let entry = 0; entry < 2 * size; entry += 1) work[column][entry] /= lead;
    for (let row = 0; row < size; row += 1) {
      if (row === column) continue;
      const factor = work[row][column];
      for (let entry = 0; entry < 2 * size; entry += 1) work[row][entry] -= factor * work[column][entry];
    }
  }
  return work.map((row) => row.slice(size));
}

/** Horner evaluation of interval k's polynomial at u ∈ [−1, 1]. */
function evaluate(coefficients: Float64Array, interval: number, u: number): number {
  const base = interval * NODES;
  return (
    coefficients[base] +
    u *
      (coefficients[base + 1] +
        u *
          (coefficients[base + 2] +
            u * (coefficients[base + 3] + u * (coefficients[base + 4] + u * coefficients[base + 5]))))
  );
}

interface Built {
  readonly coefficients: Float64Array;
  /** Intervals below this are not trusted (or were not filled). */
  readonly exactBelow: number;
  readonly checkedError: number;
}

/** Fit `intervals` pieces over s ∈ [0, span], from interval `first` on, and check each. */
function build(
  intervals: number,
  span: number,
  first: number,
  beamHalfRad: number,
  fieldHalfRad: number,
  edge: number,
): Built {
  const sinHalfEdge = Math.sin(edge / 2);
  const oneMinusCosEdge = 1 - Math.cos(edge);
  const exponent = profileExponent(beamHalfRad, fieldHalfRad);
  // profileShape's own expression, with the exponent worked out once.
  const exactAt = (s: number) =>
    Math.exp(
      -Math.LN2 * Math.pow((2 * Math.asin(Math.min(1, Math.sqrt(s) * sinHalfEdge))) / beamHalfRad, exponent),
    );
  // Rounding of s: δs/s ≈ COSINE_ROUNDING / (1 − cos θ), and d ln f / d ln s = ln2·p·(θ/hb)^p·tan(θ/2)/θ,
  // so f is off by about that product. At s = 0 its limit is 0 for p > 2 and unbounded for p < 2.
  const roundingAt = (s: number, value: number) => {
    if (s === 0) return exponent > 2 ? 0 : Infinity;
    const sinHalf = Math.sqrt(s) * sinHalfEdge;
    const theta = 2 * Math.asin(Math.min(1, sinHalf));
    const tanHalf = sinHalf / Math.sqrt(Math.max(1e-300, 1 - sinHalf * sinHalf));
    const sensitivity = -Math.log(value) * exponent * (tanHalf / theta);
    return (sensitivity * COSINE_ROUNDING) / (s * oneMinusCosEdge);
  };
  // One interval more than N: a constant f(1), for a position that rounds to N exactly at the edge.
  const coefficients = new Float64Array((intervals + 1) * NODES);
  coefficients[intervals * NODES] = exactAt(span);
  const values = new Float64Array(NODES);
  const errors = new Float64Array(intervals).fill(Infinity);
  const step = span / intervals;
  let left = exactAt(first * step);
  for (let interval = first; interval < intervals; interval += 1) {
    for (let node = 0; node < NODES; node += 1)
      values[node] = exactAt((interval + (chebyshev[node] + 1) / 2) * step);
    for (let power = 0; power < NODES; power += 1) {
      let sum = 0;
      for (let node = 0; node < NODES; node += 1) sum += inverseVandermonde[power][node] * values[node];
      coefficients[interval * NODES + power] = sum;
    }
    const middle = exactAt((interval + 0.5) * step);
    const right = exactAt((interval + 1) * step);
    errors[interval] = Math.max(
      Math.abs(evaluate(coefficients, interval, -1) - left) / left,
      Math.abs(evaluate(coefficients, interval, 0) - middle) / middle,
      Math.abs(evaluate(coefficients, interval, 1) - right) / right,
      roundingAt(interval * step, left),
      roundingAt((interval + 1) * step, right),
    );
    left = right;
  }
  // The table is trusted from the first interval after which every interval passes.
  let exactBelow = intervals;
  let checkedError = 0;
  while (exactBelow > first && errors[exactBelow - 1] <= TABLE_TOLERANCE) {
    exactBelow -= 1;
    checkedError = Math.max(checkedError, errors[exactBelow]);
  }
  return { coefficients, exactBelow, checkedError };
}

const cache = new Map<string, ProfileTable>();

/** The table for a round profile of half-angles hb < hf (rad); memoised. */
export function profileTable(beamHalfRad: number, fieldHalfRad: number): ProfileTable {
  const key = `${beamHalfRad}:${fieldHalfRad}`;
  const cached = cache.get(key);
  if (cached) return cached;
  const edge = profileEdgeAngleRad(beamHalfRad, fieldHalfRad);
  // The main table: doubled until every interval from N/16 on passes (or N reaches its most); it is
  // used from its first passing interval, and the fine table or the closed form below that.
  let intervals = FIRST_INTERVALS;
  let main = build(intervals, 1, 0, beamHalfRad, fieldHalfRad, edge);
  while (main.exactBelow > intervals / FINE_SPAN && intervals < MOST_INTERVALS) {
    intervals *= 2;
    main = build(intervals, 1, 0, beamHalfRad, fieldHalfRad, edge);
  }
  const fine = build(FINE_INTERVALS, 1 / FINE_SPAN, 0, beamHalfRad, fieldHalfRad, edge);
  const table: ProfileTable = {
    beamHalfRad,
    fieldHalfRad,
    cosEdge: Math.cos(edge),
    cosBeam: Math.cos(beamHalfRad),
    positionScale: intervals / (1 - Math.cos(edge)),
    intervals,
    deferBelow: main.exactBelow,
    coefficients: main.coefficients,
    fineCoefficients: fine.coefficients,
    fineRatio: (FINE_INTERVALS * FINE_SPAN) / intervals,
    fineExactBelow: fine.exactBelow,
    checkedError: Math.max(main.checkedError, fine.checkedError),
  };
  if (cache.size >= 1024) cache.clear();
  cache.set(key, table);
  return table;
}

/** The closed-form profile at off-axis angle θ (rad), for the near-axis region and for checks. */
export function exactTableProfile(table: ProfileTable, offAxisRad: number): number {
  return profileShape(offAxisRad, table.beamHalfRad, table.fieldHalfRad);
}

/**
 * The profile at a table position below `deferBelow`: from the fine table where it is trusted, else
 * NaN, meaning "evaluate the closed form from the angle".
 */
export function nearAxisProfile(table: ProfileTable, position: number): number {
  const finePosition = position * table.fineRatio;
  if (finePosition >= FINE_INTERVALS || finePosition < table.fineExactBelow) return Number.NaN;
  const interval = finePosition | 0;
  return evaluate(table.fineCoefficients, interval, 2 * (finePosition - interval) - 1);
}

/**
 * Relative intensity from a table for a direction with cosine `cosOffAxis` and angle `offAxisRad`
 * (the angle is used only where the closed form is): 0 at or beyond the edge. The kernel inlines this.
 */
export function tableProfile(table: ProfileTable, cosOffAxis: number, offAxisRad: number): number {
  if (cosOffAxis <= table.cosEdge) return 0;
  const position = (1 - cosOffAxis) * table.positionScale;
  if (position >= table.deferBelow) {
    const interval = position | 0;
    return evaluate(table.coefficients, interval, 2 * (position - interval) - 1);
  }
  const near = nearAxisProfile(table, position);
  return Number.isNaN(near) ? exactTableProfile(table, offAxisRad) : near;
}
