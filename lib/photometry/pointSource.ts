/**
 * Illuminance from a point source: E = I · max(0, cos i) / d² (inverse-square law × Lambert's
 * cosine law; 1 cd at 1 m on a square surface gives 1 lx, SI Brochure). Valid when d is well over
 * the source size (about five times its largest dimension, common practice).
 */
import { degToRad, requireFinite, requireNonNegative, requirePositive } from '../numeric';
import { type Vec3, dot, isFiniteVec3, length, normalize, subtract } from '../geometry/vector';
import { type BeamSpread, directionInBeamFrame, spreadProfile } from './beam';

/**
 * Illuminance (lx) on a surface at `distanceM` from a source sending `intensityCd` toward it, with
 * the light arriving `incidenceDeg` from the surface normal. Light arriving at 90° or more (from
 * behind the surface) gives 0. Throws a RangeError for non-positive distance or negative intensity.
 */
export function illuminanceLx(intensityCd: number, distanceM: number, incidenceDeg: number): number {
  requireNonNegative(intensityCd, 'intensity');
  requirePositive(distanceM, 'distance');
  requireFinite(incidenceDeg, 'incidence angle');
  const cosine = Math.cos(degToRad(incidenceDeg));
  if (Math.abs(incidenceDeg) >= 90 || cosine <= 0) return 0;
  return (intensityCd * cosine) / (distanceM * distanceM);
}

export interface PointIlluminanceInput {
  /** Where the light comes from (world, m). */
  readonly source: Vec3;
  /** Intensity the source sends toward the point, cd. */
  readonly intensityCd: number;
  /** Where the light lands (world, m). */
  readonly point: Vec3;
  /** Normal of the receiving surface (any length > 0), on the side that is lit. */
  readonly normal: Vec3;
}

/**
 * Illuminance (lx) at a point on a surface of any orientation from a point source. 0 when the source
 * is behind the surface. Throws a RangeError when the point is at the source (zero distance).
 */
export function illuminanceAtPoint(input: PointIlluminanceInput): number {
  if (!isFiniteVec3(input.source) || !isFiniteVec3(input.point) || !isFiniteVec3(input.normal)) {
    throw new RangeError('source, point and normal must have finite coordinates');
  }
  requireNonNegative(input.intensityCd, 'intensity');
  const toSource = subtract(input.source, input.point);
  const distanceM = length(toSource);
  requirePositive(distanceM, 'distance from the source');
  const cosine = dot(toSource, normalize(input.normal)) / distanceM;
  return cosine > 0 ? (input.intensityCd * cosine) / (distanceM * distanceM) : 0;
}

export interface BeamIlluminanceInput {
  /** Fixture position (world, m). */
  readonly mount: Vec3;
  /** Beam axis direction (any length > 0), e.g. focus − mount. */
  readonly axis: Vec3;
  /** Peak (on-axis) intensity after level and filter, cd. */
  readonly peakCd: number;
  readonly spread: BeamSpread;
  readonly point: Vec3;
  /** Normal of the receiving surface. */
  readonly normal: Vec3;
}

/** Intensity (cd) a beam sends toward `point`: peak × the beam profile at that direction. */
export function beamIntensityTowardCd(
  mount: Vec3,
  axis: Vec3,
  peakCd: number,
  spread: BeamSpread,
  point: Vec3,
): number {
  const { offAxisRad, azimuthRad } = directionInBeamFrame(axis, subtract(point, mount));
  return peakCd * spreadProfile(spread, offAxisRad, azimuthRad);
}

/** Illuminance (lx) at a point on a surface from a fixture modelled by its beam spread. */
export function beamIlluminanceLx(input: BeamIlluminanceInput): number {
  const intensityCd = beamIntensityTowardCd(input.mount, input.axis, input.peakCd, input.spread, input.point);
  return illuminanceAtPoint({ source: input.mount, intensityCd, point: input.point, normal: input.normal });
}
