/** Named tolerances and safe numeric helpers shared by every pure ring. */

/** Lengths in metres closer than this are treated as the same (0.1 µm). */
export const LENGTH_TOLERANCE_M = 1e-7;

/** Angles in radians closer than this are treated as the same (~2e-8 °). */
export const ANGLE_TOLERANCE_RAD = 1e-9;

/** Relative tolerance for comparing derived photometric quantities. */
export const RELATIVE_TOLERANCE = 1e-9;

/** True when a and b differ by at most `absolute`, or by at most `relative` of the larger magnitude. */
export function approximately(
  a: number,
  b: number,
  absolute = 1e-12,
  relative = RELATIVE_TOLERANCE,
): boolean {
  if (!Number.isFinite(a) || !Number.isFinite(b)) return a === b;
  const difference = Math.abs(a - b);
  return difference <= absolute || difference <= relative * Math.max(Math.abs(a), Math.abs(b));
}

/** Clamp x into [low, high]. */
export function clamp(x: number, low: number, high: number): number {
  return Math.min(high, Math.max(low, x));
}

/** acos that tolerates rounding just outside [-1, 1]; result in radians. */
export function clampedAcos(x: number): number {
  return Math.acos(clamp(x, -1, 1));
}

/** asin that tolerates rounding just outside [-1, 1]; result in radians. */
export function clampedAsin(x: number): number {
  return Math.asin(clamp(x, -1, 1));
}

/** Degrees to radians. */
export function degToRad(angleDeg: number): number {
  return (angleDeg * Math.PI) / 180;
}

/** Radians to degrees. */
export function radToDeg(angleRad: number): number {
  return (angleRad * 180) / Math.PI;
}

/** Throws a RangeError naming `what` unless x is a finite number. */
export function requireFinite(x: number, what: string): number {
  if (typeof x !== 'number' || !Number.isFinite(x)) {
    throw new RangeError(`${what} must be a finite number (got ${String(x)})`);
  }
  return x;
}

/** Throws a RangeError naming `what` unless x is a finite number greater than zero. */
export function requirePositive(x: number, what: string): number {
  requireFinite(x, what);
  if (x <= 0) throw new RangeError(`${what} must be greater than zero (got ${x})`);
  return x;
}

/** Throws a RangeError naming `what` unless x is a finite number of zero or more. */
export function requireNonNegative(x: number, what: string): number {
  requireFinite(x, what);
  if (x < 0) throw new RangeError(`${what} must not be negative (got ${x})`);
  return x;
}

/** Exhaustiveness guard for discriminated unions. */
export function assertNever(value: never): never {
  throw new Error(`Unexpected variant: ${JSON.stringify(value)}`);
}
