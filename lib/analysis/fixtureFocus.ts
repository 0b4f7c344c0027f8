/**
 * Focus figures for one fixture: throw, pan and tilt, beam and field spread at the throw, the true
 * pools on the focus plane, and the centre illuminance. What an electrician needs at the focus call.
 */
import { type Aim, aimFromPoints } from '../geometry/aim';
import {
  type Footprint,
  beamOutlineOnPlane,
  footprintFromOutline,
  footprintOnPlane,
} from '../geometry/footprint';
import { scale, subtract } from '../geometry/vector';
import { areaSourceIlluminanceLx } from '../photometry/areaSource';
import { type BeamSpread, ellipticalHalfAngle } from '../photometry/beam';
import { spreadDiameterM } from '../photometry/spread';
import { degToRad } from '../numeric';
import { contourAtDeg, gridFigures } from '../formats/gridFigures';
import { hasNoAim } from './fixtureLight';
import { azimuthToHorizontalDeg } from './measuredSource';
import type { RigFixture } from './rig';

export interface SpreadAngles {
  /** Beam and field angle, degrees (for an oval: along its X axis). */
  readonly beamAngleDeg: number;
  readonly fieldAngleDeg: number;
  /** For an oval, the angles along its Y axis; null for a round beam. */
  readonly beamAngleCrossDeg: number | null;
  readonly fieldAngleCrossDeg: number | null;
}

export interface FixtureFocus {
  readonly id: string;
  /** Why figures are missing (e.g. zero throw), or null when all is well. */
  readonly problem: string | null;
  readonly aim: Aim | null;
  /** null for soft sources, which have no beam edge. */
  readonly angles: SpreadAngles | null;
  /** Diameters on a plane square to the beam at the throw, m: 2·throw·tan(angle/2). */
  readonly beamDiameterM: number | null;
  readonly fieldDiameterM: number | null;
  /** Same across an oval's Y axis; null for round beams. */
  readonly beamDiameterCrossM: number | null;
  readonly fieldDiameterCrossM: number | null;
  /** The true pools on the focus plane (z = focusPlaneZ). */
  readonly beamPool: Footprint | null;
  readonly fieldPool: Footprint | null;
  /**
   * Illuminance at the focus point on a surface square to the beam, lx: peak/throw² for a beam
   * (the figure data sheets give), the area integral for a soft source.
   */
  readonly centreLx: number | null;
}

/** Angles of a spread (see SpreadAngles). */
export function spreadAngles(spread: BeamSpread): SpreadAngles {
  return spread.kind === 'round'
    ? {
        beamAngleDeg: spread.beamAngleDeg,
        fieldAngleDeg: spread.fieldAngleDeg,
        beamAngleCrossDeg: null,
        fieldAngleCrossDeg: null,
      }
    : {
        beamAngleDeg: spread.beamAngleXDeg,
        fieldAngleDeg: spread.fieldAngleXDeg,
        beamAngleCrossDeg: spread.beamAngleYDeg,
        fieldAngleCrossDeg: spread.fieldAngleYDeg,
      };
}

/** Focus figures of one fixture with the focus plane at height `focusPlaneZ` (m). */
export function fixtureFocus(fixture: RigFixture, focusPlaneZ: number): FixtureFocus {
  const empty = {
    id: fixture.id,
    aim: null,
    angles: null,
    beamDiameterM: null,
    fieldDiameterM: null,
    beamDiameterCrossM: null,
    fieldDiameterCrossM: null,
    beamPool: null,
    fieldPool: null,
    centreLx: null,
  };
  if (hasNoAim(fixture)) {
    return { ...empty, problem: 'The focus point is at the unit itself (zero throw): aim it somewhere.' };
  }
  const aim = aimFromPoints(fixture.mount, fixture.focus);
  const source = fixture.source;
  if (source.kind === 'soft') {
    const axis = subtract(fixture.focus, fixture.mount);
    const centreLx = areaSourceIlluminanceLx({
      shape: source.shape,
      centre: fixture.mount,
      facing: axis,
      luminanceCdPerM2: source.luminanceCdPerM2,
      point: fixture.focus,
      normal: scale(axis, -1),
    });
    return { ...empty, problem: null, aim, centreLx };
  }
  if (source.kind === 'measured') return { ...empty, ...measuredFocus(fixture, source, focusPlaneZ), aim };
  const angles = spreadAngles(source.spread);
  const pool = (kind: 'beam' | 'field'): Footprint => {
    if (source.spread.kind === 'round') {
      const angle = kind === 'beam' ? source.spread.beamAngleDeg : source.spread.fieldAngleDeg;
      return footprintOnPlane(fixture.mount, fixture.focus, angle, focusPlaneZ);
    }
    const spread = source.spread;
    const halfX = degToRad((kind === 'beam' ? spread.beamAngleXDeg : spread.fieldAngleXDeg) / 2);
    const halfY = degToRad((kind === 'beam' ? spread.beamAngleYDeg : spread.fieldAngleYDeg) / 2);
    const rotation = degToRad(spread.rotationDeg);
    const outline = beamOutlineOnPlane(
      fixture.mount,
      fixture.focus,
      (azimuth) => ellipticalHalfAngle(halfX, halfY, azimuth - rotation),
      focusPlaneZ,
    );
    return footprintFromOutline(fixture.mount, fixture.focus, outline);
  };
  return {
    id: fixture.id,
    problem: null,
    aim,
    angles,
    beamDiameterM: spreadDiameterM(aim.throwM, angles.beamAngleDeg),
    fieldDiameterM: spreadDiameterM(aim.throwM, angles.fieldAngleDeg),
    beamDiameterCrossM:
      angles.beamAngleCrossDeg === null ? null : spreadDiameterM(aim.throwM, angles.beamAngleCrossDeg),
    fieldDiameterCrossM:
      angles.fieldAngleCrossDeg === null ? null : spreadDiameterM(aim.throwM, angles.fieldAngleCrossDeg),
    // A unit hanging in the focus plane itself gets pools in state 'apex-on-plane'.
    beamPool: pool('beam'),
    fieldPool: pool('field'),
    centreLx: source.peakCd / (aim.throwM * aim.throwM),
  };
}

type MeasuredFigures = Omit<FixtureFocus, 'id' | 'aim'>;

/**
 * Focus figures of a measured unit: angles across the C0–C180 pair (and C90–C270 unless the
 * distribution is rotationally symmetric), pools bounded by the real 50 % and 10 % iso-candela
 * contours (edge γ every 5° of C, see gridFigures), centre illuminance from the intensity on the axis.
 * A spread that reaches 180° or more has no diameter at the throw (null).
 */
function measuredFocus(
  fixture: RigFixture,
  source: Extract<RigFixture['source'], { kind: 'measured' }>,
  focusPlaneZ: number,
): MeasuredFigures {
  const figures = gridFigures(source.grid);
  const round = source.grid.symmetry === 'rotational';
  const angles: SpreadAngles = {
    beamAngleDeg: figures.c0.beamAngleDeg,
    fieldAngleDeg: figures.c0.fieldAngleDeg,
    beamAngleCrossDeg: round ? null : figures.c90.beamAngleDeg,
    fieldAngleCrossDeg: round ? null : figures.c90.fieldAngleDeg,
  };
  const throwM = aimFromPoints(fixture.mount, fixture.focus).throwM;
  const diameter = (angleDeg: number | null) =>
    angleDeg === null || angleDeg <= 0 || angleDeg >= 180 ? null : spreadDiameterM(throwM, angleDeg);
  const pool = (contourDeg: readonly number[]): Footprint =>
    footprintFromOutline(
      fixture.mount,
      fixture.focus,
      beamOutlineOnPlane(
        fixture.mount,
        fixture.focus,
        (azimuthRad) => degToRad(contourAtDeg(contourDeg, azimuthToHorizontalDeg(azimuthRad))),
        focusPlaneZ,
      ),
    );
  return {
    problem: null,
    angles,
    beamDiameterM: diameter(angles.beamAngleDeg),
    fieldDiameterM: diameter(angles.fieldAngleDeg),
    beamDiameterCrossM: diameter(angles.beamAngleCrossDeg),
    fieldDiameterCrossM: diameter(angles.fieldAngleCrossDeg),
    beamPool: pool(figures.beamContourDeg),
    fieldPool: pool(figures.fieldContourDeg),
    centreLx: (source.scale * figures.axialCd) / (throwM * throwM),
  };
}
