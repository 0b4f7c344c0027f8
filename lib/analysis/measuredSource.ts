/**
 * A unit with a measured candela distribution: its photometric axis (γ = 0) is the beam axis
 * (mount → focus); C = 0 lies along the beam frame's horizontal u and C = 90 along −v (see
 * directionInBeamFrame), i.e. C counts counter-clockwise seen from behind the unit — seen from above
 * for a unit aimed straight down, as type C files count it [MEM].
 */
import { type Vec3, subtract } from '../geometry/vector';
import { directionInBeamFrame } from '../photometry/beam';
import { type CandelaGrid, gridIntensityCd } from '../formats/candelaGrid';
import { radToDeg } from '../numeric';

/** Photometric angles (γ, C in degrees) of a world direction for a unit aimed along `axis`. */
export function photometricAngles(
  axis: Vec3,
  direction: Vec3,
): { verticalDeg: number; horizontalDeg: number } {
  const { offAxisRad, azimuthRad } = directionInBeamFrame(axis, direction);
  return { verticalDeg: radToDeg(offAxisRad), horizontalDeg: -radToDeg(azimuthRad) };
}

/** Beam-frame azimuth (rad, from u toward v, as footprint outlines use) to the C angle, degrees. */
export function azimuthToHorizontalDeg(azimuthRad: number): number {
  return -radToDeg(azimuthRad);
}

/** Intensity (cd) a measured unit at `mount` aimed along `axis` sends toward `point`: scale × grid. */
export function measuredIntensityTowardCd(
  mount: Vec3,
  axis: Vec3,
  grid: CandelaGrid,
  scale: number,
  point: Vec3,
): number {
  const { verticalDeg, horizontalDeg } = photometricAngles(axis, subtract(point, mount));
  return scale * gridIntensityCd(grid, verticalDeg, horizontalDeg);
}
