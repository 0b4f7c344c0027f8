/** Illuminance from one resolved fixture at a point on a surface (point-source beams and measured distributions, area-integrated soft sources). */
import { type Vec3, distance, subtract } from '../geometry/vector';
import { areaSourceIlluminanceLx } from '../photometry/areaSource';
import { beamIlluminanceLx, illuminanceAtPoint } from '../photometry/pointSource';
import { measuredIntensityTowardCd } from './measuredSource';
import type { RigFixture } from './rig';

/** Throws below this mount-to-focus distance: the unit has no aim (m). */
export const MIN_THROW_M = 1e-6;

/** True when a fixture's focus point is (practically) at its mount point, so it has no aim. */
export function hasNoAim(fixture: RigFixture): boolean {
  return distance(fixture.mount, fixture.focus) < MIN_THROW_M;
}

/**
 * Illuminance (lx) that `fixture` gives at `point` on a surface whose lit side faces `normal`.
 * Defined results for impossible geometry: a unit with no aim (zero throw) or a point at the unit
 * itself gives 0 rather than throwing; light from behind the surface gives 0.
 */
export function fixtureIlluminanceLx(fixture: RigFixture, point: Vec3, normal: Vec3): number {
  if (hasNoAim(fixture) || distance(fixture.mount, point) < MIN_THROW_M) return 0;
  const axis = subtract(fixture.focus, fixture.mount);
  const source = fixture.source;
  switch (source.kind) {
    case 'beam':
      return beamIlluminanceLx({
        mount: fixture.mount,
        axis,
        peakCd: source.peakCd,
        spread: source.spread,
        point,
        normal,
      });
    case 'soft':
      return areaSourceIlluminanceLx({
        shape: source.shape,
        centre: fixture.mount,
        facing: axis,
        luminanceCdPerM2: source.luminanceCdPerM2,
        point,
        normal,
      });
    case 'measured':
      return illuminanceAtPoint({
        source: fixture.mount,
        intensityCd: measuredIntensityTowardCd(fixture.mount, axis, source.grid, source.scale, point),
        point,
        normal,
      });
    default: {
      const unknown: never = source;
      throw new Error(`unknown light source ${JSON.stringify(unknown)}`);
    }
  }
}
