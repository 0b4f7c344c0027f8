/**
 * Where a cone of light meets a plane: the conic section of a (round or oval) cone with its apex
 * at the fixture. Closed (an ellipse for a round cone) only while every edge ray reaches the plane;
 * otherwise the section is open (the light spills past the plane's horizon) and is reported so.
 */
import {
  type Vec3,
  add,
  angleBetween,
  cross,
  dot,
  length,
  normalize,
  perpendicularBasis,
  scale,
  subtract,
} from './vector';

export interface Plane {
  /** Any point on the plane (world space, m). */
  readonly point: Vec3;
  /** Normal of the plane (any length > 0; either side). */
  readonly normal: Vec3;
}

/** Half-angle of the cone (radians) as a function of the azimuth about the axis (radians from u). */
export type HalfAngleAt = (azimuthRad: number) => number;

export interface ConeSectionInput {
  readonly apex: Vec3;
  /** Beam axis direction (any length > 0). */
  readonly axis: Vec3;
  readonly halfAngleAt: HalfAngleAt;
  readonly plane: Plane;
  /** How far from the foot point an open section is drawn before it is clipped, m. */
  readonly reachM: number;
  /** Number of edge rays sampled for the outline. */
  readonly segments: number;
}

export type SectionState =
  /** Every edge ray reaches the plane: a closed outline. */
  | 'closed'
  /** Some edge rays never reach the plane: the pool runs off past the horizon. */
  | 'open'
  /** No part of the beam reaches the plane. */
  | 'misses'
  /** The apex lies in the plane: no pool can be drawn. */
  | 'apex-on-plane';

export interface ConeSectionOutline {
  readonly state: SectionState;
  /** Point of the plane closest to the apex. */
  readonly foot: Vec3;
  /** Distance from the apex to the plane, m. */
  readonly heightM: number;
  /** Unit normal of the plane pointing from the apex toward the plane. */
  readonly towardPlane: Vec3;
  /** Outline points on the plane, in azimuth order; only open sections are clipped, at reachM from the foot. */
  readonly polygon: readonly Vec3[];
  /** For each outline point, whether its edge ray reaches the plane at all. */
  readonly landed: readonly boolean[];
}

/** Distance (m) below which the apex is taken to lie in the plane. */
const APEX_IN_PLANE_M = 1e-9;

/** Outline of a cone (round or oval) on a plane by sampling its edge rays; see ConeSectionInput. */
export function coneSectionOutline(input: ConeSectionInput): ConeSectionOutline {
  const axis = normalize(input.axis);
  const planeNormal = normalize(input.plane.normal);
  const signedHeight = dot(subtract(input.apex, input.plane.point), planeNormal);
  const heightM = Math.abs(signedHeight);
  const towardPlane = signedHeight >= 0 ? scale(planeNormal, -1) : planeNormal;
  const foot = add(input.apex, scale(towardPlane, heightM));
  if (heightM < APEX_IN_PLANE_M) {
    return { state: 'apex-on-plane', foot, heightM, towardPlane, polygon: [], landed: [] };
  }
  const { u, v } = perpendicularBasis(axis);
  const rays: Vec3[] = [];
  const hits: (Vec3 | undefined)[] = [];
  for (let index = 0; index < input.segments; index += 1) {
    const azimuthRad = (2 * Math.PI * index) / input.segments;
    const halfAngleRad = input.halfAngleAt(azimuthRad);
    const ray = add(
      scale(axis, Math.cos(halfAngleRad)),
      scale(add(scale(u, Math.cos(azimuthRad)), scale(v, Math.sin(azimuthRad))), Math.sin(halfAngleRad)),
    );
    const approach = dot(ray, towardPlane);
    rays.push(ray);
    hits.push(approach > 1e-12 ? add(input.apex, scale(ray, heightM / approach)) : undefined);
  }
  const landed = hits.map((hit) => hit !== undefined);
  const anyLanded = landed.some((flag) => flag);
  const allLanded = landed.every((flag) => flag);
  // A cone reaches the plane if its axis or any edge ray does (a cap of directions that meets a
  // hemisphere contains its centre or a point of its rim); with no edge landing but the axis landing,
  // the light spreads over the whole plane.
  const axisLands = dot(axis, towardPlane) > 1e-12;
  const state: SectionState = allLanded ? 'closed' : anyLanded || axisLands ? 'open' : 'misses';
  // A closed outline is exact however far it reaches; an open one is clipped at reachM for drawing.
  const polygon = hits.map((hit, index) => {
    if (hit && (allLanded || length(subtract(hit, foot)) <= input.reachM)) return hit;
    const ray = rays[index];
    const along = subtract(ray, scale(towardPlane, dot(ray, towardPlane)));
    const alongLength = length(along);
    const direction = alongLength > 1e-12 ? scale(along, 1 / alongLength) : u;
    return add(foot, scale(direction, input.reachM));
  });
  return { state, foot, heightM, towardPlane, polygon, landed };
}

export interface RoundConeSection {
  readonly state: SectionState;
  readonly foot: Vec3;
  readonly heightM: number;
  /** Angle between the beam axis and the normal toward the plane, rad. */
  readonly axisToNormalRad: number;
  /** Unit direction in the plane along which the pool is longest (the axis' projection). */
  readonly alongDirection: Vec3;
  /** Unit direction in the plane across the pool. */
  readonly acrossDirection: Vec3;
  /** Signed distance from the foot along alongDirection to the near edge, m (null if the beam misses). */
  readonly nearM: number | null;
  /** Same to the far edge, m (null unless closed). */
  readonly farM: number | null;
  /** Full width across at the widest point (minor axis), m (null unless closed). */
  readonly widthM: number | null;
  /** Area of the closed ellipse π·a·b, m² (null unless closed). */
  readonly areaM2: number | null;
  /** Where the beam axis meets the plane (null if it does not). */
  readonly axisHit: Vec3 | null;
  /** Width through the axis hit point, across: 2·d·tan α, m (null if the axis does not meet the plane). */
  readonly widthAtAxisHitM: number | null;
}

/**
 * Exact section of a round cone (half-angle `halfAngleRad`, < π/2) with a plane, by the closed forms
 * near = h·tan(β − α), far = h·tan(β + α), centre x_c = (near + far)/2,
 * y² = (x·sin β + h·cos β)²/cos²α − x² − h² (derived in REFERENCE-CHECKS §3).
 */
export function roundConeSection(
  apex: Vec3,
  axisDirection: Vec3,
  halfAngleRad: number,
  plane: Plane,
): RoundConeSection {
  const axis = normalize(axisDirection);
  const planeNormal = normalize(plane.normal);
  const signedHeight = dot(subtract(apex, plane.point), planeNormal);
  const heightM = Math.abs(signedHeight);
  const towardPlane = signedHeight >= 0 ? scale(planeNormal, -1) : planeNormal;
  const foot = add(apex, scale(towardPlane, heightM));
  const beta = angleBetween(axis, towardPlane);
  const projected = subtract(axis, scale(towardPlane, dot(axis, towardPlane)));
  const alongDirection = length(projected) > 1e-12 ? normalize(projected) : perpendicularBasis(towardPlane).v;
  const acrossDirection = normalize(cross(towardPlane, alongDirection));
  const empty = {
    foot,
    heightM,
    axisToNormalRad: beta,
    alongDirection,
    acrossDirection,
    farM: null,
    widthM: null,
    areaM2: null,
  };
  if (heightM < APEX_IN_PLANE_M) {
    return { ...empty, state: 'apex-on-plane', nearM: null, axisHit: null, widthAtAxisHitM: null };
  }
  const alpha = halfAngleRad;
  const axisLands = beta < Math.PI / 2 - 1e-12;
  const axisThrowM = axisLands ? heightM / Math.cos(beta) : null;
  const axisHit = axisThrowM === null ? null : add(apex, scale(axis, axisThrowM));
  const widthAtAxisHitM = axisThrowM === null ? null : 2 * axisThrowM * Math.tan(alpha);
  if (beta - alpha >= Math.PI / 2 - 1e-12) {
    return { ...empty, state: 'misses', nearM: null, axisHit, widthAtAxisHitM };
  }
  const nearM = heightM * Math.tan(beta - alpha);
  if (beta + alpha >= Math.PI / 2 - 1e-12) {
    return { ...empty, state: 'open', nearM, axisHit, widthAtAxisHitM };
  }
  const farM = heightM * Math.tan(beta + alpha);
  const centreM = (nearM + farM) / 2;
  const semiMajor = (farM - nearM) / 2;
  const acrossSquared =
    (centreM * Math.sin(beta) + heightM * Math.cos(beta)) ** 2 / Math.cos(alpha) ** 2 -
    centreM ** 2 -
    heightM ** 2;
  const semiMinor = Math.sqrt(Math.max(0, acrossSquared));
  return {
    ...empty,
    state: 'closed',
    nearM,
    farM,
    widthM: 2 * semiMinor,
    areaM2: Math.PI * semiMajor * semiMinor,
    axisHit,
    widthAtAxisHitM,
  };
}
