/**
 * Least squares with every unknown between bounds: minimise ‖A·x − b‖² + λ‖x − x₀‖² subject to
 * lower ≤ x ≤ upper. Small problems (tens to a few hundred unknowns): projected coordinate descent,
 * each step the exact minimum along one unknown clamped to its bounds, finds a good start with a
 * bounded amount of work; a primal active-set method (see polish) then finishes exactly. The better
 * of the two by the objective is returned.
 *
 * The small λ pulls unknowns the equations do not decide (a unit that lights nothing asked for, or
 * two units that could share one target) toward x₀, so the answer is unique and changes little.
 * No npm package fitted (the registry has non-negative least squares without upper bounds).
 */

export interface BoundedLeastSquaresInput {
  /** Rows of A (m rows, each of n columns). */
  readonly matrix: readonly (readonly number[])[];
  readonly rhs: readonly number[];
  readonly lower: readonly number[];
  readonly upper: readonly number[];
  /** Where the pull λ draws undecided unknowns (and where the search starts). */
  readonly start: readonly number[];
  /** λ relative to the mean of diag(AᵀA); default 1e-9. */
  readonly relativePull?: number;
}

export interface BoundedLeastSquaresResult {
  readonly x: number[];
  /** ‖A·x − b‖ (without the pull). */
  readonly residualNorm: number;
  readonly sweeps: number;
}

/** Coordinate sweeps stop when no unknown moves more than this (levels are kept to 0.1 %, 1e-3). */
const STEP_TOLERANCE = 1e-12;
/** At most this many multiply-adds in the sweeps (n² each), so a large rig cannot stall the editor. */
const WORK_LIMIT = 1e7;

export function boundedLeastSquares(input: BoundedLeastSquaresInput): BoundedLeastSquaresResult {
  const { matrix, rhs, lower, upper, start } = input;
  const n = start.length;
  if (lower.length !== n || upper.length !== n)
    throw new RangeError('bounds must have one entry per unknown');
  if (matrix.length !== rhs.length) throw new RangeError('the matrix needs one row per right-hand side');
  for (const row of matrix)
    if (row.length !== n) throw new RangeError('every row needs one entry per unknown');
  for (let j = 0; j < n; j += 1) {
    if (!(lower[j] <= upper[j])) throw new RangeError(`unknown ${j}: lower bound above upper bound`);
  }
  // Normal equations: H = AᵀA + λI, g = Aᵀb + λx₀.
  const gram = Array.from({ length: n }, (_, j) =>
    Array.from({ length: n }, (__, k) => matrix.reduce((sum, row) => sum + row[j] * row[k], 0)),
  );
  const meanDiagonal = gram.reduce((sum, row, j) => sum + row[j], 0) / Math.max(1, n);
  const pull = (input.relativePull ?? 1e-9) * (meanDiagonal > 0 ? meanDiagonal : 1);
  const hessian = gram.map((row, j) => row.map((value, k) => value + (j === k ? pull : 0)));
  const linear = Array.from(
    { length: n },
    (_, j) => matrix.reduce((sum, row, i) => sum + row[j] * rhs[i], 0) + pull * start[j],
  );
  const objective = (x: readonly number[]) => {
    // ½xᵀHx − gᵀx: the same minimiser as the squared norm plus pull.
    let total = 0;
    for (let j = 0; j < n; j += 1) {
      let hx = 0;
      for (let k = 0; k < n; k += 1) hx += hessian[j][k] * x[k];
      total += 0.5 * x[j] * hx - linear[j] * x[j];
    }
    return total;
  };

  const x = start.map((value, j) => Math.min(upper[j], Math.max(lower[j], value)));
  let sweeps = 0;
  const maxSweeps = Math.max(50, Math.min(20000, Math.floor(WORK_LIMIT / Math.max(1, n * n))));
  for (; sweeps < maxSweeps; sweeps += 1) {
    let largestStep = 0;
    for (let j = 0; j < n; j += 1) {
      let gradient = -linear[j];
      for (let k = 0; k < n; k += 1) gradient += hessian[j][k] * x[k];
      const next = Math.min(upper[j], Math.max(lower[j], x[j] - gradient / hessian[j][j]));
      largestStep = Math.max(largestStep, Math.abs(next - x[j]));
      x[j] = next;
    }
    if (largestStep < STEP_TOLERANCE) break;
  }

  const polished = polish(hessian, linear, x, lower, upper);
  const best = polished && objective(polished) <= objective(x) + 1e-15 ? polished : x;
  return { x: best, residualNorm: residualNorm(matrix, rhs, best), sweeps };
}

/**
 * Primal active-set method for the box-constrained quadratic ½xᵀHx − gᵀx (H positive definite),
 * from a feasible start: solve the free unknowns exactly with the others held at their bounds; if that
 * leaves the box, step toward it as far as the first bound and hold that unknown there; at the
 * optimum of the free set, free the held unknowns whose gradients want them off their bounds (the
 * optimality conditions), until none does. Null if a system is singular.
 */
function polish(
  hessian: readonly (readonly number[])[],
  linear: readonly number[],
  start: readonly number[],
  lower: readonly number[],
  upper: readonly number[],
): number[] | null {
  const n = start.length;
  const x = [...start];
  const span = (j: number) => Math.max(1, Math.abs(upper[j] - lower[j]));
  const free = new Set(
    x
      .map((value, j) => j)
      .filter((j) => x[j] > lower[j] + 1e-12 * span(j) && x[j] < upper[j] - 1e-12 * span(j)),
  );
  const gradientScale = 1e-12 * (1 + Math.max(...linear.map(Math.abs)));
  for (let iteration = 0; iteration < 3 * n + 10; iteration += 1) {
    const freeList = [...free];
    if (freeList.length > 0) {
      const right = freeList.map(
        (j) => linear[j] - hessian[j].reduce((sum, value, k) => (free.has(k) ? sum : sum + value * x[k]), 0),
      );
      const solved = solveLinear(
        freeList.map((j) => freeList.map((k) => hessian[j][k])),
        right,
      );
      if (!solved) return null;
      // Step toward the free optimum, stopping at the first bound in the way.
      let step = 1;
      let blocking = -1;
      for (const [index, j] of freeList.entries()) {
        const change = solved[index] - x[j];
        if (solved[index] < lower[j] && change < 0) {
          const reach = (lower[j] - x[j]) / change;
          if (reach < step) [step, blocking] = [reach, j];
        } else if (solved[index] > upper[j] && change > 0) {
          const reach = (upper[j] - x[j]) / change;
          if (reach < step) [step, blocking] = [reach, j];
        }
      }
      for (const [index, j] of freeList.entries()) x[j] += Math.max(0, step) * (solved[index] - x[j]);
      if (blocking >= 0) {
        x[blocking] =
          solved[freeList.indexOf(blocking)] < lower[blocking] ? lower[blocking] : upper[blocking];
        free.delete(blocking);
        continue;
      }
    }
    // Optimal for this free set: free every held unknown whose gradient pulls it off its bound (all
    // at once; a step that then leaves the box holds one back again).
    let released = false;
    for (let j = 0; j < n; j += 1) {
      if (free.has(j) || lower[j] === upper[j]) continue;
      let gradient = -linear[j];
      for (let k = 0; k < n; k += 1) gradient += hessian[j][k] * x[k];
      const pull = x[j] <= lower[j] ? -gradient : x[j] >= upper[j] ? gradient : Math.abs(gradient);
      if (pull > gradientScale) {
        free.add(j);
        released = true;
      }
    }
    if (!released) return x;
  }
  return x;
}

/** Gaussian elimination with partial pivoting; null for a singular system. */
export function solveLinear(matrix: readonly (readonly number[])[], rhs: readonly number[]): number[] | null {
  const n = rhs.length;
  const a = matrix.map((row, i) => [...row, rhs[i]]);
  const scale = Math.max(1e-300, ...a.flatMap((row) => row.slice(0, n).map(Math.abs)));
  for (let column = 0; column < n; column += 1) {
    let pivot = column;
    for (let row = column + 1; row < n; row += 1) {
      if (Math.abs(a[row][column]) > Math.abs(a[pivot][column])) pivot = row;
    }
    if (Math.abs(a[pivot][column]) < 1e-14 * scale) return null;
    [a[column], a[pivot]] = [a[pivot], a[column]];
    for (let row = column + 1; row < n; row += 1) {
      const factor = a[row][column] / a[column][column];
      for (let k = column; k <= n; k += 1) a[row][k] -= factor * a[column][k];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let row = n - 1; row >= 0; row -= 1) {
    let sum = a[row][n];
    for (let k = row + 1; k < n; k += 1) sum -= a[row][k] * x[k];
    x[row] = sum / a[row][row];
  }
  return x;
}

function residualNorm(matrix: readonly (readonly number[])[], rhs: readonly number[], x: readonly number[]) {
  return Math.sqrt(
    matrix.reduce((sum, row, i) => {
      const r = row.reduce((total, value, j) => total + value * x[j], 0) - rhs[i];
      return sum + r * r;
    }, 0),
  );
}
