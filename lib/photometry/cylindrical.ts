/**
 * Cylindrical and semi-cylindrical illuminance at a point from a point source: the trade's measures
 * for light on faces. By definition the mean vertical illuminance around a small vertical cylinder
 * (over the whole turn, or over the half facing a direction). For one source with the light arriving
 * at angle ε from the vertical, E_n = I/d²:
 *   E_z  = E_n · sin ε / π                       (cylindrical)
 *   E_sz = E_n · sin ε · (1 + cos α) / π         (semi-cylindrical, α = plan angle between the
 *                                                  semi-cylinder's facing and the source)
 * (REFERENCE-CHECKS §2 [DER]; tests confirm them by averaging vertical illuminance over azimuth.)
 */
import { clampedAcos, requireNonNegative } from '../numeric';
import { type Vec3, isFiniteVec3, length, subtract } from '../geometry/vector';

export interface CylindricalInput {
  readonly source: Vec3;
  /** Intensity the source sends toward the point, cd. */
  readonly intensityCd: number;
  readonly point: Vec3;
}

function parts(input: CylindricalInput): {
  normalLx: number;
  sinElevationFromVertical: number;
  toSource: Vec3;
} {
  if (!isFiniteVec3(input.source) || !isFiniteVec3(input.point)) {
    throw new RangeError('source and point must have finite coordinates');
  }
  requireNonNegative(input.intensityCd, 'intensity');
  const toSource = subtract(input.source, input.point);
  const distanceM = length(toSource);
  if (!(distanceM > 0)) throw new RangeError('distance from the source must be greater than zero');
  return {
    normalLx: input.intensityCd / (distanceM * distanceM),
    sinElevationFromVertical: Math.hypot(toSource.x, toSource.y) / distanceM,
    toSource,
  };
}

/** Mean cylindrical illuminance (lx) at a point from one point source. */
export function cylindricalIlluminanceLx(input: CylindricalInput): number {
  const { normalLx, sinElevationFromVertical } = parts(input);
  return (normalLx * sinElevationFromVertical) / Math.PI;
}

/**
 * Semi-cylindrical illuminance (lx) at a point from one point source, for the half-cylinder facing
 * the plan direction `facing` (e.g. toward a camera or the audience). A source straight above gives 0.
 */
export function semiCylindricalIlluminanceLx(
  input: CylindricalInput & { readonly facing: { x: number; y: number } },
): number {
  const { normalLx, sinElevationFromVertical, toSource } = parts(input);
  const planLength = Math.hypot(toSource.x, toSource.y);
  const facingLength = Math.hypot(input.facing.x, input.facing.y);
  if (!(facingLength > 0) || !Number.isFinite(facingLength)) {
    throw new RangeError('the facing direction must be a finite, non-zero plan vector');
  }
  if (planLength === 0) return 0;
  const cosine = Math.cos(
    clampedAcos((toSource.x * input.facing.x + toSource.y * input.facing.y) / (planLength * facingLength)),
  );
  return (normalLx * sinElevationFromVertical * (1 + cosine)) / Math.PI;
}
