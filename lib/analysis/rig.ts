/**
 * The analysis engines' view of a rig: plain data with everything resolved (zoom, level, dimming
 * curve and filter already applied), so the engines need no knowledge of the plot document.
 * lib/plot's resolveRig() builds it from a document.
 */
import type { Vec3 } from '../geometry/vector';
import type { AreaShape } from '../photometry/areaSource';
import type { BeamSpread } from '../photometry/beam';
import type { CandelaGrid } from '../formats/candelaGrid';

export type LightSource =
  /** A focusable unit modelled by its beam spread; peakCd is at the current level through its filter. */
  | { readonly kind: 'beam'; readonly spread: BeamSpread; readonly peakCd: number }
  /** A soft source: a Lambertian face of this shape and luminance (current level, through its filter). */
  | { readonly kind: 'soft'; readonly shape: AreaShape; readonly luminanceCdPerM2: number }
  /**
   * A unit with a measured candela distribution (absolute cd at full); `scale` is the fraction of full
   * it gives at its level through its filter. Axis convention: see measuredSource.ts.
   */
  | { readonly kind: 'measured'; readonly grid: CandelaGrid; readonly scale: number };

export interface RigFixture {
  readonly id: string;
  /** Where the light leaves the unit (lens or emitting face), world m. */
  readonly mount: Vec3;
  /** Where it is aimed, world m. */
  readonly focus: Vec3;
  readonly source: LightSource;
}
