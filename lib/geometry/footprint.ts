/**
 * Pools on the floor (or any horizontal plane) and on walls: the real tilted footprint of a beam,
 * not a circle. Distances are along the plane from the point of it closest to the fixture.
 */
import { degToRad, requireFinite } from '../numeric';
import {
  type ConeSectionOutline,
  type HalfAngleAt,
  type SectionState,
  coneSectionOutline,
  roundConeSection,
} from './coneSection';
import { type Vec3, dot, isFiniteVec3, normalize, subtract, vec3 } from './vector';

export interface PlanPoint {
  readonly x: number;
  readonly y: number;
}

export interface FootprintOptions {
  /** How far (m, in plan from the point under the fixture) an open pool is drawn before clipping. Default 40. */
  readonly reachM?: number;
  /** Outline points. Default 96. */
  readonly segments?: number;
}

export interface Footprint {
  /**
   * True when the pool does not close on the plane: part of the cone reaches the plane's horizon
   * (edge at or above horizontal for a floor) and the light spills on to whatever stands beyond.
   */
  readonly open: boolean;
  /** 'closed', 'open', 'misses' (no light reaches the plane) or 'apex-on-plane' (fixture in the plane). */
  readonly state: SectionState;
  /**
   * Signed plan distance, m, from the point under the fixture to the pool's near edge, measured along
   * the beam's plan bearing (negative: the pool reaches behind the point under the fixture).
   * null when no light reaches the plane.
   */
  readonly nearM: number | null;
  /** Same to the far edge; null unless closed. */
  readonly farM: number | null;
  /** Length of the pool along the bearing (far − near), m; null unless closed. */
  readonly lengthM: number | null;
  /** Greatest width across the bearing (the ellipse's minor axis), m; null unless closed. */
  readonly widthM: number | null;
  /** Width across through the point where the beam axis meets the plane, m; null if it does not meet it. */
  readonly widthAtAxisM: number | null;
  /** Area of the pool on the plane, m²; null unless closed. */
  readonly areaM2: number | null;
  /** Outline in plan, in order; an open pool is clipped at reachM and marked by `open`. */
  readonly polygon: readonly PlanPoint[];
}

/**
 * Footprint of a round beam of full angle `fullAngleDeg` from a fixture at `mount` aimed at `focus`,
 * on the horizontal plane z = planeZ (m). Exact closed forms (REFERENCE-CHECKS §3) for the edges,
 * width and area; the polygon samples the true edge rays. Throws a RangeError for non-finite input,
 * zero throw, or an angle outside (0°, 180°).
 */
export function footprintOnPlane(
  mount: Vec3,
  focus: Vec3,
  fullAngleDeg: number,
  planeZ: number,
  options: FootprintOptions = {},
): Footprint {
  const halfAngleRad = checkedHalfAngle(fullAngleDeg);
  requireFinite(planeZ, 'plane height');
  const axis = checkedAxis(mount, focus);
  const plane = { point: vec3(0, 0, planeZ), normal: vec3(0, 0, 1) };
  const section = roundConeSection(mount, axis, halfAngleRad, plane);
  const outline = coneSectionOutline({
    apex: mount,
    axis,
    halfAngleAt: () => halfAngleRad,
    plane,
    reachM: options.reachM ?? 40,
    segments: options.segments ?? 96,
  });
  const bearingSign = alongSign(section.alongDirection, axis);
  const flip = (value: number | null) => (value === null ? null : value * bearingSign);
  const nearM = flip(section.nearM);
  const farM = flip(section.farM);
  return {
    open: section.state !== 'closed',
    state: section.state,
    nearM: nearM !== null && farM !== null ? Math.min(nearM, farM) : nearM,
    farM: nearM !== null && farM !== null ? Math.max(nearM, farM) : farM,
    lengthM: section.nearM !== null && section.farM !== null ? section.farM - section.nearM : null,
    widthM: section.widthM,
    widthAtAxisM: section.widthAtAxisHitM,
    areaM2: section.areaM2,
    polygon: outline.polygon.map((point) => ({ x: point.x, y: point.y })),
  };
}

/**
 * Outline of an oval (or round) beam on the horizontal plane z = planeZ. `halfAngleAt` gives the
 * edge half-angle (rad) at each azimuth about the axis, measured from the beam frame's horizontal
 * direction (see perpendicularBasis). Numerical: extents come from the sampled outline.
 */
export function beamOutlineOnPlane(
  mount: Vec3,
  focus: Vec3,
  halfAngleAt: HalfAngleAt,
  planeZ: number,
  options: FootprintOptions = {},
): ConeSectionOutline {
  requireFinite(planeZ, 'plane height');
  return coneSectionOutline({
    apex: mount,
    axis: checkedAxis(mount, focus),
    halfAngleAt,
    plane: { point: vec3(0, 0, planeZ), normal: vec3(0, 0, 1) },
    reachM: options.reachM ?? 40,
    segments: options.segments ?? 96,
  });
}

/** A vertical plane (wall, cyclorama, camera plane) through `point`, facing `facing` in plan. */
export interface VerticalPlane {
  readonly point: Vec3;
  /** Plan direction of the plane's normal (z ignored). */
  readonly facing: PlanPoint;
}

export interface WallFootprint {
  readonly open: boolean;
  readonly state: SectionState;
  /** Lowest and highest z reached by the pool on the wall, m; null unless closed. */
  readonly bottomZ: number | null;
  readonly topZ: number | null;
  /** Greatest horizontal width of the pool on the wall, m; null unless closed. */
  readonly widthM: number | null;
  readonly areaM2: number | null;
  /** Outline in the wall's own coordinates: `across` (m, to the right seen from the fixture's side) and z. */
  readonly polygon: readonly { readonly across: number; readonly z: number }[];
}

/**
 * Footprint of a round beam on a vertical plane. Extents of the closed ellipse are exact
 * (projection of its axes); the outline samples the true edge rays.
 */
export function footprintOnVerticalPlane(
  mount: Vec3,
  focus: Vec3,
  fullAngleDeg: number,
  wall: VerticalPlane,
  options: FootprintOptions = {},
): WallFootprint {
  const halfAngleRad = checkedHalfAngle(fullAngleDeg);
  const axis = checkedAxis(mount, focus);
  if (!isFiniteVec3(wall.point) || !Number.isFinite(wall.facing.x) || !Number.isFinite(wall.facing.y)) {
    throw new RangeError('the wall point and facing must be finite');
  }
  const normal = normalize(vec3(wall.facing.x, wall.facing.y, 0));
  const plane = { point: wall.point, normal };
  const section = roundConeSection(mount, axis, halfAngleRad, plane);
  const outline = coneSectionOutline({
    apex: mount,
    axis,
    halfAngleAt: () => halfAngleRad,
    plane,
    reachM: options.reachM ?? 40,
    segments: options.segments ?? 96,
  });
  const up = vec3(0, 0, 1);
  const acrossAxis = normalize(vec3(-outline.towardPlane.y, outline.towardPlane.x, 0));
  const polygon = outline.polygon.map((point) => ({
    across: dot(subtract(point, section.foot), acrossAxis),
    z: point.z,
  }));
  if (
    section.state !== 'closed' ||
    section.nearM === null ||
    section.farM === null ||
    section.widthM === null
  ) {
    return {
      open: true,
      state: section.state,
      bottomZ: null,
      topZ: null,
      widthM: null,
      areaM2: null,
      polygon,
    };
  }
  const semiMajor = (section.farM - section.nearM) / 2;
  const semiMinor = section.widthM / 2;
  const centreAlong = (section.nearM + section.farM) / 2;
  const centreZ = section.foot.z + centreAlong * dot(section.alongDirection, up);
  const halfHeight = Math.hypot(
    semiMajor * dot(section.alongDirection, up),
    semiMinor * dot(section.acrossDirection, up),
  );
  const halfWidth = Math.hypot(
    semiMajor * dot(section.alongDirection, acrossAxis),
    semiMinor * dot(section.acrossDirection, acrossAxis),
  );
  return {
    open: false,
    state: 'closed',
    bottomZ: centreZ - halfHeight,
    topZ: centreZ + halfHeight,
    widthM: 2 * halfWidth,
    areaM2: section.areaM2,
    polygon,
  };
}

function checkedHalfAngle(fullAngleDeg: number): number {
  requireFinite(fullAngleDeg, 'beam angle');
  if (fullAngleDeg <= 0 || fullAngleDeg >= 180) {
    throw new RangeError(`a pool needs a beam angle between 0° and 180° (got ${fullAngleDeg}°)`);
  }
  return degToRad(fullAngleDeg / 2);
}

function checkedAxis(mount: Vec3, focus: Vec3): Vec3 {
  if (!isFiniteVec3(mount) || !isFiniteVec3(focus)) {
    throw new RangeError('mount and focus points must have finite coordinates');
  }
  const axis = subtract(focus, mount);
  if (Math.hypot(axis.x, axis.y, axis.z) <= 1e-9) {
    throw new RangeError('the focus point is at the mount point: zero throw has no pool');
  }
  return axis;
}

/** +1 when the section's along-direction points the same way as the beam's plan bearing, else −1. */
function alongSign(alongDirection: Vec3, axis: Vec3): number {
  const planAxis = Math.hypot(axis.x, axis.y);
  if (planAxis <= 1e-12) return 1;
  return alongDirection.x * axis.x + alongDirection.y * axis.y >= 0 ? 1 : -1;
}

/**
 * Footprint figures measured from a sampled outline (for oval beams, where no closed form is used):
 * near/far along the beam's plan bearing from the point under the fixture, greatest width across it,
 * and the shoelace area. Accurate to the outline's sampling (96 points: well under 0.1 % in area).
 */
export function footprintFromOutline(mount: Vec3, focus: Vec3, outline: ConeSectionOutline): Footprint {
  const polygon = outline.polygon.map((point) => ({ x: point.x, y: point.y }));
  if (outline.state !== 'closed') {
    return {
      open: true,
      state: outline.state,
      nearM: null,
      farM: null,
      lengthM: null,
      widthM: null,
      widthAtAxisM: null,
      areaM2: null,
      polygon,
    };
  }
  const planLength = Math.hypot(focus.x - mount.x, focus.y - mount.y);
  const along =
    planLength > 1e-12
      ? { x: (focus.x - mount.x) / planLength, y: (focus.y - mount.y) / planLength }
      : { x: 0, y: -1 };
  const across = { x: -along.y, y: along.x };
  const alongValues = polygon.map((point) => (point.x - mount.x) * along.x + (point.y - mount.y) * along.y);
  const acrossValues = polygon.map(
    (point) => (point.x - mount.x) * across.x + (point.y - mount.y) * across.y,
  );
  let twiceArea = 0;
  for (let index = 0; index < polygon.length; index += 1) {
    const a = polygon[index];
    const b = polygon[(index + 1) % polygon.length];
    twiceArea += a.x * b.y - b.x * a.y;
  }
  const nearM = Math.min(...alongValues);
  const farM = Math.max(...alongValues);
  return {
    open: false,
    state: 'closed',
    nearM,
    farM,
    lengthM: farM - nearM,
    widthM: Math.max(...acrossValues) - Math.min(...acrossValues),
    widthAtAxisM: null,
    areaM2: Math.abs(twiceArea) / 2,
    polygon,
  };
}
