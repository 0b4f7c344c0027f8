/**
 * Soft and area sources (soft boxes, LED panels, diffusion frames) as Lambertian emitters of uniform
 * luminance L. Near a large source the inverse-square law is wrong; the exact illuminance is
 * E = ∫ L · cos θs · cos θr / R² dA over the emitting area. On axis of a disc this is
 * E = π·L·r² / (r² + d²). Off axis and for rectangles it is integrated numerically with composite
 * Gauss–Legendre panels sized to the distance; relative error ≤ 1e-6 for points at least 2 % of the
 * source size away (checked in tests against closed-form configuration factors).
 */
import { requireNonNegative, requirePositive } from '../numeric';
import {
  type Vec3,
  add,
  cross,
  dot,
  isFiniteVec3,
  length,
  normalize,
  scale,
  subtract,
} from '../geometry/vector';
import { compositeGauss } from './quadrature';

/** Rule of thumb (common practice): point-source figures hold beyond 5 × the source's largest size. */
export const PHOTOMETRIC_DISTANCE_FACTOR = 5;

/** Illuminance (lx) on axis of a Lambertian disc, facing it: π·L·r² / (r² + d²). d = 0 gives π·L. */
export function discSourceIlluminanceLx(
  luminanceCdPerM2: number,
  radiusM: number,
  distanceM: number,
): number {
  requireNonNegative(luminanceCdPerM2, 'luminance');
  requirePositive(radiusM, 'radius');
  requireNonNegative(distanceM, 'distance');
  return (Math.PI * luminanceCdPerM2 * radiusM * radiusM) / (radiusM * radiusM + distanceM * distanceM);
}

/** Luminance (cd/m²) of a one-sided Lambertian emitter of `areaM2` giving `lumens`: L = Φ / (π·A). */
export function luminanceFromLumens(lumens: number, areaM2: number): number {
  requireNonNegative(lumens, 'lumens');
  requirePositive(areaM2, 'emitting area');
  return lumens / (Math.PI * areaM2);
}

/** On-axis intensity (cd) of a Lambertian emitter: I0 = L·A (used beyond the photometric distance). */
export function lambertianPeakCd(luminanceCdPerM2: number, areaM2: number): number {
  return requireNonNegative(luminanceCdPerM2, 'luminance') * requirePositive(areaM2, 'emitting area');
}

/** How hard to work on an area integral: 'fine' (≤ 1e-6 relative) or 'coarse' (≤ 1e-3, for light maps). */
export type AreaAccuracy = 'fine' | 'coarse';

export type AreaShape =
  | { readonly kind: 'disc'; readonly radiusM: number }
  | { readonly kind: 'rectangle'; readonly widthM: number; readonly heightM: number };

export interface AreaSourceInput {
  readonly shape: AreaShape;
  /** Centre of the emitting face (world, m). */
  readonly centre: Vec3;
  /** Direction the face emits toward (its normal). */
  readonly facing: Vec3;
  /** For rectangles: the direction of the width (made square to `facing`); default horizontal. */
  readonly widthDirection?: Vec3;
  readonly luminanceCdPerM2: number;
  readonly point: Vec3;
  /** Normal of the receiving surface. */
  readonly normal: Vec3;
}

/** Largest dimension of the emitting face, m. */
export function largestDimensionM(shape: AreaShape): number {
  return shape.kind === 'disc' ? 2 * shape.radiusM : Math.hypot(shape.widthM, shape.heightM);
}

/** Illuminance (lx) at a point on a surface of any orientation from a Lambertian area source. */
export function areaSourceIlluminanceLx(input: AreaSourceInput, accuracy: AreaAccuracy = 'fine'): number {
  for (const [name, point] of [
    ['centre', input.centre],
    ['facing', input.facing],
    ['point', input.point],
    ['normal', input.normal],
  ] as const) {
    if (!isFiniteVec3(point)) throw new RangeError(`area source ${name} must have finite coordinates`);
  }
  requireNonNegative(input.luminanceCdPerM2, 'luminance');
  const facing = normalize(input.facing);
  const receiver = normalize(input.normal);
  const widthAxis = squareTo(facing, input.widthDirection);
  const heightAxis = cross(facing, widthAxis);
  // Integrand: L · max(0, r·n_s) · max(0, −r·n_r) / |r|⁴ with r from the source element to the point.
  const contribution = (element: Vec3): number => {
    const ray = subtract(input.point, element);
    const emit = dot(ray, facing);
    const receive = -dot(ray, receiver);
    if (emit <= 0 || receive <= 0) return 0;
    const squared = dot(ray, ray);
    return (emit * receive) / (squared * squared);
  };
  const nearestM = Math.max(distanceToFace(input, facing, widthAxis, heightAxis), 1e-6);
  // 'fine': 8-point panels about a third of the distance wide (≤ 1e-6); 'coarse': 4-point panels as
  // wide as the distance, at most 16 a side (≤ 1e-3 from a quarter of the source size out; for maps).
  const coarse = accuracy === 'coarse';
  const pointCount = coarse ? 4 : 8;
  const panels = (extentM: number, minimum: number, maximum: number) =>
    Math.min(coarse ? 16 : maximum, Math.max(minimum, Math.ceil(((coarse ? 1 : 3) * extentM) / nearestM)));

  if (input.shape.kind === 'disc') {
    const radiusM = requirePositive(input.shape.radiusM, 'disc radius');
    const radialPanels = panels(radiusM, 1, 64);
    const angularPanels = panels(2 * Math.PI * radiusM, 4, 128);
    const total = compositeGauss(
      (radius) =>
        radius *
        compositeGauss(
          (angle) =>
            contribution(
              add(
                input.centre,
                add(scale(widthAxis, radius * Math.cos(angle)), scale(heightAxis, radius * Math.sin(angle))),
              ),
            ),
          0,
          2 * Math.PI,
          angularPanels,
          pointCount,
        ),
      0,
      radiusM,
      radialPanels,
      pointCount,
    );
    return input.luminanceCdPerM2 * total;
  }
  const halfWidth = requirePositive(input.shape.widthM, 'rectangle width') / 2;
  const halfHeight = requirePositive(input.shape.heightM, 'rectangle height') / 2;
  const total = compositeGauss(
    (across) =>
      compositeGauss(
        (up) => contribution(add(input.centre, add(scale(widthAxis, across), scale(heightAxis, up)))),
        -halfHeight,
        halfHeight,
        panels(2 * halfHeight, 1, 64),
        pointCount,
      ),
    -halfWidth,
    halfWidth,
    panels(2 * halfWidth, 1, 64),
    pointCount,
  );
  return input.luminanceCdPerM2 * total;
}

/**
 * A warning when a point-source figure would be used closer than 5 × the source's largest dimension
 * (common practice: the error then exceeds about 1 %), or null when the distance is far enough.
 */
export function pointSourceWarning(distanceM: number, largestSourceDimensionM: number): string | null {
  if (!Number.isFinite(distanceM) || !Number.isFinite(largestSourceDimensionM)) return null;
  const limitM = PHOTOMETRIC_DISTANCE_FACTOR * largestSourceDimensionM;
  if (distanceM >= limitM) return null;
  return (
    `This point is ${distanceM.toFixed(2)} m from a source ${largestSourceDimensionM.toFixed(2)} m across: ` +
    `closer than ${limitM.toFixed(2)} m (5 × its size) a point-source figure is not reliable; ` +
    `the area-source calculation is used instead.`
  );
}

function squareTo(facing: Vec3, wanted: Vec3 | undefined): Vec3 {
  const candidates = [
    wanted,
    cross({ x: 0, y: 0, z: 1 }, facing),
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
  ];
  for (const candidate of candidates) {
    if (!candidate || !isFiniteVec3(candidate)) continue;
    const square = subtract(candidate, scale(facing, dot(candidate, facing)));
    if (length(square) > 1e-9) return normalize(square);
  }
  throw new RangeError('cannot orient the area source');
}

/** Distance from the point to the nearest point of the emitting face (m). */
function distanceToFace(input: AreaSourceInput, facing: Vec3, widthAxis: Vec3, heightAxis: Vec3): number {
  const offset = subtract(input.point, input.centre);
  const normalPart = dot(offset, facing);
  const across = dot(offset, widthAxis);
  const up = dot(offset, heightAxis);
  let inPlane: number;
  if (input.shape.kind === 'disc') {
    inPlane = Math.max(0, Math.hypot(across, up) - input.shape.radiusM);
  } else {
    inPlane = Math.hypot(
      Math.max(0, Math.abs(across) - input.shape.widthM / 2),
      Math.max(0, Math.abs(up) - input.shape.heightM / 2),
    );
  }
  return Math.hypot(normalPart, inPlane);
}
