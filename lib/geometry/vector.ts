/** Small 3D vector helpers over plain readonly records (world space, metres). */

export interface Vec3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

export function vec3(x: number, y: number, z: number): Vec3 {
  return { x, y, z };
}

export function add(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x + b.x, y: a.y + b.y, z: a.z + b.z };
}

export function subtract(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x - b.x, y: a.y - b.y, z: a.z - b.z };
}

export function scale(a: Vec3, factor: number): Vec3 {
  return { x: a.x * factor, y: a.y * factor, z: a.z * factor };
}

export function dot(a: Vec3, b: Vec3): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}

export function cross(a: Vec3, b: Vec3): Vec3 {
  return { x: a.y * b.z - a.z * b.y, y: a.z * b.x - a.x * b.z, z: a.x * b.y - a.y * b.x };
}

export function length(a: Vec3): number {
  return Math.hypot(a.x, a.y, a.z);
}

export function distance(a: Vec3, b: Vec3): number {
  return Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);
}

/** Unit vector along a; throws a RangeError for a zero-length vector. */
export function normalize(a: Vec3): Vec3 {
  const size = length(a);
  if (!(size > 0) || !Number.isFinite(size)) {
    throw new RangeError('cannot take the direction of a zero-length or non-finite vector');
  }
  return scale(a, 1 / size);
}

/** Linear interpolation from a (t = 0) to b (t = 1). */
export function lerp(a: Vec3, b: Vec3, t: number): Vec3 {
  return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t, z: a.z + (b.z - a.z) * t };
}

/** True when every component is a finite number. */
export function isFiniteVec3(a: Vec3): boolean {
  return Number.isFinite(a.x) && Number.isFinite(a.y) && Number.isFinite(a.z);
}

/**
 * Two unit vectors perpendicular to unit `axis` and to each other, (u, v, axis) right-handed.
 * u is horizontal (axis × +z) unless the axis is vertical, when u is +x.
 */
export function perpendicularBasis(axis: Vec3): { u: Vec3; v: Vec3 } {
  const up = vec3(0, 0, 1);
  const horizontal = cross(axis, up);
  const u = length(horizontal) > 1e-12 ? normalize(horizontal) : vec3(1, 0, 0);
  const v = cross(axis, u);
  return { u, v };
}

/** Angle between two vectors, rad, in [0, π]; atan2(|a × b|, a · b) stays accurate near 0 and π. */
export function angleBetween(a: Vec3, b: Vec3): number {
  return Math.atan2(length(cross(a, b)), dot(a, b));
}
