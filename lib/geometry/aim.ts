/** Throw, pan and tilt of a fixture from its mount point and focus point (world space, metres). */
import { radToDeg } from '../numeric';
import { type Vec3, distance, isFiniteVec3 } from './vector';

export interface Aim {
  /** Straight-line distance from the mount point to the focus point, m. */
  readonly throwM: number;
  /** Plan distance from the point under the fixture to the focus point, m. */
  readonly horizontalM: number;
  /** Height of the mount point above the focus point, m (negative when aiming up). */
  readonly dropM: number;
  /**
   * Plan bearing of the beam axis, degrees in (-180, 180]: 0 = straight downstage (toward the
   * audience, −y), +90 = toward stage left (+x), −90 = toward stage right, 180 = upstage.
   * 0 when the axis is vertical (the bearing is then undefined).
   */
  readonly panDeg: number;
  /** Angle of the beam axis below the horizontal, degrees: 90 = straight down, negative = aiming up. */
  readonly tiltDeg: number;
  /** Angle of the beam axis from straight down, degrees (0 = straight down, 90 = horizontal). */
  readonly fromVerticalDeg: number;
}

/**
 * Aim of a fixture hung at `mount` and focused at `focus`. Throws a RangeError for non-finite
 * points or when the two coincide (zero throw: no direction exists).
 */
export function aimFromPoints(mount: Vec3, focus: Vec3): Aim {
  if (!isFiniteVec3(mount) || !isFiniteVec3(focus)) {
    throw new RangeError('mount and focus points must have finite coordinates');
  }
  const throwM = distance(mount, focus);
  if (!(throwM > 1e-9)) {
    throw new RangeError('the focus point is at the mount point: zero throw has no aim');
  }
  const dx = focus.x - mount.x;
  const dy = focus.y - mount.y;
  const dropM = mount.z - focus.z;
  const horizontalM = Math.hypot(dx, dy);
  const panDeg = horizontalM > 1e-12 ? radToDeg(Math.atan2(dx, -dy)) : 0;
  const tiltDeg = radToDeg(Math.atan2(dropM, horizontalM));
  return {
    throwM,
    horizontalM,
    dropM,
    panDeg: panDeg === -180 ? 180 : panDeg,
    tiltDeg,
    fromVerticalDeg: 90 - tiltDeg,
  };
}
