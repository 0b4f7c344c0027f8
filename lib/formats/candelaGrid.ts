/**
 * A measured candela distribution on a type C grid (IES LM-63 and EULUMDAT both use it): vertical
 * angles γ from 0° (nadir, the photometric axis) to 180° (zenith), horizontal angles C about that
 * axis. Only the planes the symmetry needs are stored; intensity in any direction is bilinear in
 * (γ, C) after folding C into the stored range, and 0 outside the measured γ range.
 */

/**
 * Horizontal symmetry of the stored planes (LM-63 last horizontal angle / EULUMDAT Isym):
 * rotational — one plane (C0) for every C; quadrant — C0…C90, mirrored about C0–C180 and C90–C270;
 * c0-c180 — C0…C180, mirrored about the C0–C180 plane; c90-c270 — C90…C270, mirrored about the
 * C90–C270 plane; none — C0 up to at most C360, the gap to 360° closing back on C0.
 */
export const SYMMETRIES = ['rotational', 'quadrant', 'c0-c180', 'c90-c270', 'none'] as const;
export type Symmetry = (typeof SYMMETRIES)[number];

export interface CandelaGrid {
  readonly symmetry: Symmetry;
  /** γ, degrees, strictly ascending within [0, 180]. */
  readonly verticalAnglesDeg: readonly number[];
  /** Stored C planes, degrees, strictly ascending (see Symmetry for their range). */
  readonly horizontalAnglesDeg: readonly number[];
  /** Absolute intensity, cd: one row per stored C plane, one value per γ. */
  readonly candelaCd: readonly (readonly number[])[];
}

/** Grid size limits (a 0.1° γ grid has 1801 angles; 0.1° C planes 3601). */
export const MAX_VERTICAL_ANGLES = 2000;
export const MAX_HORIZONTAL_ANGLES = 4000;
/** Most candela values kept in a plot document (about 1.5 MB of JSON). */
export const MAX_GRID_VALUES = 200_000;

const ANGLE_EPSILON_DEG = 1e-9;

/** The C range each symmetry stores: [first, last] (for 'none', the last may be anything up to 360). */
export function storedRange(symmetry: Symmetry): readonly [number, number] {
  switch (symmetry) {
    case 'rotational':
      return [0, 0];
    case 'quadrant':
      return [0, 90];
    case 'c0-c180':
      return [0, 180];
    case 'c90-c270':
      return [90, 270];
    case 'none':
      return [0, 360];
  }
}

/** The symmetry a type C plane list implies (LM-63 rules, REFERENCE-CHECKS §5a), or null if none fits. */
export function symmetryOfPlanes(horizontalAnglesDeg: readonly number[]): Symmetry | null {
  const first = horizontalAnglesDeg[0];
  const last = horizontalAnglesDeg[horizontalAnglesDeg.length - 1];
  if (first === undefined || last === undefined) return null;
  if (near(first, 0)) {
    if (horizontalAnglesDeg.length === 1) return 'rotational';
    if (near(last, 90)) return 'quadrant';
    if (near(last, 180)) return 'c0-c180';
    if (last > 180 && last <= 360 + ANGLE_EPSILON_DEG) return 'none';
    return null;
  }
  if (near(first, 90) && near(last, 270)) return 'c90-c270';
  return null;
}

/**
 * Every problem with a grid's shape and values (empty when it is sound): counts, ranges, order,
 * and finite non-negative candela. Messages start with the field they are about.
 */
export function candelaGridProblems(grid: CandelaGrid): string[] {
  const problems: string[] = [];
  const vertical = grid.verticalAnglesDeg;
  const horizontal = grid.horizontalAnglesDeg;
  if (vertical.length < 2) problems.push('verticalAnglesDeg: needs at least 2 angles');
  if (vertical.length > MAX_VERTICAL_ANGLES)
    problems.push(`verticalAnglesDeg: may have at most ${MAX_VERTICAL_ANGLES} angles`);
  if (horizontal.length < 1) problems.push('horizontalAnglesDeg: needs at least 1 angle');
  if (horizontal.length > MAX_HORIZONTAL_ANGLES)
    problems.push(`horizontalAnglesDeg: may have at most ${MAX_HORIZONTAL_ANGLES} angles`);
  if (vertical.length * horizontal.length > MAX_GRID_VALUES)
    problems.push(`candelaCd: may hold at most ${MAX_GRID_VALUES} values`);
  const ascending = (angles: readonly number[], low: number, high: number, what: string) => {
    for (let index = 0; index < angles.length; index += 1) {
      const angle = angles[index];
      if (!Number.isFinite(angle) || angle < low - ANGLE_EPSILON_DEG || angle > high + ANGLE_EPSILON_DEG) {
        problems.push(`${what}[${index}]: must be between ${low}° and ${high}°`);
        return;
      }
      if (index > 0 && !(angle > angles[index - 1])) {
        problems.push(`${what}[${index}]: must be greater than the angle before it (ascending order)`);
        return;
      }
    }
  };
  ascending(vertical, 0, 180, 'verticalAnglesDeg');
  const [first, last] = storedRange(grid.symmetry);
  ascending(horizontal, first, last, 'horizontalAnglesDeg');
  if (problems.length === 0) {
    const implied = symmetryOfPlanes(horizontal);
    const fits =
      implied === grid.symmetry ||
      // A full set of planes may stop short of 360° (e.g. 0…345 every 15°).
      (grid.symmetry === 'none' && near(horizontal[0], 0) && horizontal.length > 1);
    if (!fits) problems.push(`horizontalAnglesDeg: do not fit the symmetry "${grid.symmetry}"`);
  }
  if (grid.candelaCd.length !== horizontal.length) {
    problems.push(`candelaCd: needs one row per horizontal angle (${horizontal.length})`);
    return problems;
  }
  for (let plane = 0; plane < grid.candelaCd.length; plane += 1) {
    const row = grid.candelaCd[plane];
    if (row.length !== vertical.length) {
      problems.push(`candelaCd[${plane}]: needs one value per vertical angle (${vertical.length})`);
      return problems;
    }
    for (let index = 0; index < row.length; index += 1) {
      if (!Number.isFinite(row[index]) || row[index] < 0) {
        problems.push(`candelaCd[${plane}][${index}]: must be a finite number of 0 or more`);
        return problems;
      }
    }
  }
  return problems;
}

/** Throws a RangeError listing the problems unless the grid is sound. */
export function requireSoundGrid(grid: CandelaGrid): void {
  const problems = candelaGridProblems(grid);
  if (problems.length > 0) throw new RangeError(`candela grid: ${problems.join('; ')}`);
}

/** Any C angle (degrees) folded into the stored range of `symmetry`, in [0, 360) for 'none'. */
export function foldHorizontalDeg(symmetry: Symmetry, horizontalDeg: number): number {
  let angle = horizontalDeg % 360;
  if (angle < 0) angle += 360;
  switch (symmetry) {
    case 'rotational':
      return 0;
    case 'quadrant':
      if (angle > 180) angle = 360 - angle;
      return angle > 90 ? 180 - angle : angle;
    case 'c0-c180':
      return angle > 180 ? 360 - angle : angle;
    case 'c90-c270':
      if (angle < 90) return 180 - angle;
      return angle > 270 ? 540 - angle : angle;
    case 'none':
      return angle;
  }
}

/** Index i with angles[i] ≤ x < angles[i + 1] (clamped to [0, n − 2]); angles ascending, n ≥ 2. */
function bracket(angles: readonly number[], x: number): number {
  let low = 0;
  let high = angles.length - 1;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if (angles[middle] <= x) low = middle;
    else high = middle;
  }
  return low;
}

/** Intensity along one stored plane at γ (deg): linear between samples, 0 outside the measured range. */
function planeIntensity(grid: CandelaGrid, plane: number, verticalDeg: number): number {
  const angles = grid.verticalAnglesDeg;
  const first = angles[0];
  const last = angles[angles.length - 1];
  if (verticalDeg < first - ANGLE_EPSILON_DEG || verticalDeg > last + ANGLE_EPSILON_DEG) return 0;
  const row = grid.candelaCd[plane];
  const index = bracket(angles, verticalDeg);
  const span = angles[index + 1] - angles[index];
  const t = Math.min(1, Math.max(0, (verticalDeg - angles[index]) / span));
  return row[index] + (row[index + 1] - row[index]) * t;
}

/**
 * Intensity (cd) toward γ = verticalDeg (0 nadir … 180 zenith; values outside are clamped) and
 * C = horizontalDeg (any value; folded by the symmetry). Bilinear in (γ, C); for 'none' the planes
 * wrap from the last stored plane back to C0 at 360°. Assumes a sound grid (candelaGridProblems).
 */
export function gridIntensityCd(grid: CandelaGrid, verticalDeg: number, horizontalDeg: number): number {
  const gamma = Math.min(180, Math.max(0, verticalDeg));
  const planes = grid.horizontalAnglesDeg;
  if (planes.length === 1) return planeIntensity(grid, 0, gamma);
  const c = foldHorizontalDeg(grid.symmetry, horizontalDeg);
  const lastIndex = planes.length - 1;
  if (grid.symmetry === 'none' && c > planes[lastIndex]) {
    const span = 360 - planes[lastIndex];
    const t = span > ANGLE_EPSILON_DEG ? (c - planes[lastIndex]) / span : 0;
    return lerp(planeIntensity(grid, lastIndex, gamma), planeIntensity(grid, 0, gamma), t);
  }
  const index = bracket(planes, c);
  const t = Math.min(1, Math.max(0, (c - planes[index]) / (planes[index + 1] - planes[index])));
  return lerp(planeIntensity(grid, index, gamma), planeIntensity(grid, index + 1, gamma), t);
}

/**
 * Every C angle in [0, 360) the stored planes stand for once the symmetry is unfolded (a rotationally
 * symmetric grid gives [0]), ascending, without repeats.
 */
export function unfoldedPlanesDeg(grid: CandelaGrid): number[] {
  const images: number[] = [];
  for (const angle of grid.horizontalAnglesDeg) {
    switch (grid.symmetry) {
      case 'rotational':
        images.push(0);
        break;
      case 'quadrant':
        images.push(angle, 180 - angle, 180 + angle, 360 - angle);
        break;
      case 'c0-c180':
        images.push(angle, 360 - angle);
        break;
      case 'c90-c270':
        images.push(angle, 180 - angle);
        break;
      case 'none':
        images.push(angle);
        break;
    }
  }
  const folded = images.map((angle) => ((angle % 360) + 360) % 360).sort((a, b) => a - b);
  return folded.filter((angle, index) => index === 0 || angle - folded[index - 1] > 1e-7);
}

function near(a: number, b: number): boolean {
  return Math.abs(a - b) <= ANGLE_EPSILON_DEG;
}

function lerp(a: number, b: number, t: number): number {
  return a + (b - a) * t;
}
