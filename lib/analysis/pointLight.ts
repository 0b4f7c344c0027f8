/** Illuminance at one point from a whole rig: for the hover readout and spot checks. */
import { type Vec3, vec3 } from '../geometry/vector';
import { fixtureIlluminanceLx } from './fixtureLight';
import type { RigFixture } from './rig';

export interface PointLight {
  /** On a horizontal surface facing up, lx. */
  readonly horizontalLx: number;
  /** On a vertical surface turned toward the viewpoint, lx; null without a viewpoint (or directly under it). */
  readonly towardViewpointLx: number | null;
}

/** Light at `point` from every fixture of `rig`, horizontal and toward `viewpoint` (world m). */
export function pointLight(rig: readonly RigFixture[], point: Vec3, viewpoint: Vec3 | null): PointLight {
  const up = vec3(0, 0, 1);
  let horizontalLx = 0;
  for (const fixture of rig) horizontalLx += fixtureIlluminanceLx(fixture, point, up);
  if (!viewpoint) return { horizontalLx, towardViewpointLx: null };
  const dx = viewpoint.x - point.x;
  const dy = viewpoint.y - point.y;
  const planDistance = Math.hypot(dx, dy);
  if (planDistance < 1e-6) return { horizontalLx, towardViewpointLx: null };
  const normal = vec3(dx / planDistance, dy / planDistance, 0);
  let towardViewpointLx = 0;
  for (const fixture of rig) towardViewpointLx += fixtureIlluminanceLx(fixture, point, normal);
  return { horizontalLx, towardViewpointLx };
}
