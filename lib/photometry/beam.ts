/**
 * The beam model used when only beam and field angles are known.
 *
 * Beam angle: full angle where intensity falls to 50 % of peak; field angle: to 10 %
 * (REFERENCE-CHECKS §3). The profile I(θ) = I0 · exp(−ln2 · (θ / hb)^p), hb = beam/2,
 * hf = field/2, p = ln(ln10 / ln2) / ln(hf / hb) is smooth, falls monotonically and meets both points
 * exactly. The model ends where it falls to 0.1 % of peak (PROFILE_EDGE_FRACTION): beyond that edge,
 * and beyond 90° off axis (the housing), it emits nothing; so a beam lights a bounded region, which the
 * coverage engine relies on to skip cells exactly. Limits: no hard cut-off shape, no shutter cuts, no
 * off-axis peak. Measured photometry replaces it when a file is given.
 *
 * Oval beams: the 50 % and 10 % contours are ellipses in angle space. At azimuth φ about the axis
 * (from the beam's X direction) the half-angles are hb(φ) = 1/√(cos²φ/hbX² + sin²φ/hbY²) (and the
 * same for hf), and the round profile is used with those.
 */
import { degToRad, requireFinite } from '../numeric';
import { type Vec3, angleBetween, dot, normalize, perpendicularBasis } from '../geometry/vector';

/** ln(ln 10 / ln 2): the profile exponent times ln(hf/hb). */
const EXPONENT_NUMERATOR = Math.log(Math.LN10 / Math.LN2);

/** Beyond this angle off axis the model emits nothing (rad). */
export const MAX_EMISSION_ANGLE_RAD = Math.PI / 2;

/** The model's edge: where the profile falls below this fraction of peak it is taken as zero (0.1 %). */
export const PROFILE_EDGE_FRACTION = 1e-3;

export type BeamSpread =
  | { readonly kind: 'round'; readonly beamAngleDeg: number; readonly fieldAngleDeg: number }
  | {
      readonly kind: 'oval';
      /** Beam and field angles in the beam frame's X direction (horizontal at rotation 0). */
      readonly beamAngleXDeg: number;
      readonly fieldAngleXDeg: number;
      /** Beam and field angles in the beam frame's Y direction. */
      readonly beamAngleYDeg: number;
      readonly fieldAngleYDeg: number;
      /** Rotation of the oval about the beam axis, degrees, from the beam frame's horizontal. */
      readonly rotationDeg: number;
    };

/** Throws a RangeError unless 0 < beam < field < 180 (degrees, full angles). */
export function validateBeamAngles(beamAngleDeg: number, fieldAngleDeg: number): void {
  requireFinite(beamAngleDeg, 'beam angle');
  requireFinite(fieldAngleDeg, 'field angle');
  if (beamAngleDeg <= 0) throw new RangeError(`beam angle must be greater than 0° (got ${beamAngleDeg}°)`);
  if (fieldAngleDeg >= 180) {
    throw new RangeError(
      `field angle must be less than 180° (got ${fieldAngleDeg}°); use measured photometry for wider sources`,
    );
  }
  if (fieldAngleDeg <= beamAngleDeg) {
    throw new RangeError(
      `field angle (${fieldAngleDeg}°) must be wider than beam angle (${beamAngleDeg}°): intensity falls to 50 % before 10 %`,
    );
  }
}

/** Throws a RangeError for a spread whose angles are not valid (see validateBeamAngles). */
export function validateBeamSpread(spread: BeamSpread): void {
  if (spread.kind === 'round') {
    validateBeamAngles(spread.beamAngleDeg, spread.fieldAngleDeg);
    return;
  }
  validateBeamAngles(spread.beamAngleXDeg, spread.fieldAngleXDeg);
  validateBeamAngles(spread.beamAngleYDeg, spread.fieldAngleYDeg);
  requireFinite(spread.rotationDeg, 'oval rotation');
}

/** Profile exponent p for half-angles hb < hf (any unit, same for both). */
export function profileExponent(beamHalfAngle: number, fieldHalfAngle: number): number {
  return EXPONENT_NUMERATOR / Math.log(fieldHalfAngle / beamHalfAngle);
}

/** The smooth profile without its edge: exp(−ln2·(θ/hb)^p); for integrating up to the edge angle. */
export function profileShape(offAxisRad: number, beamHalfRad: number, fieldHalfRad: number): number {
  return Math.exp(-Math.LN2 * Math.pow(offAxisRad / beamHalfRad, profileExponent(beamHalfRad, fieldHalfRad)));
}

/** Relative intensity (0–1) at `offAxisRad` for half-angles in radians; no validation (hot path). */
export function roundProfile(offAxisRad: number, beamHalfRad: number, fieldHalfRad: number): number {
  if (offAxisRad >= MAX_EMISSION_ANGLE_RAD) return 0;
  const value = profileShape(offAxisRad, beamHalfRad, fieldHalfRad);
  return value < PROFILE_EDGE_FRACTION ? 0 : value;
}

/**
 * Off-axis angle (rad) of the model's edge for half-angles in radians: where the profile reaches
 * PROFILE_EDGE_FRACTION, hb·(ln(1/ε)/ln 2)^(1/p), capped at 90°.
 */
export function profileEdgeAngleRad(beamHalfRad: number, fieldHalfRad: number): number {
  const exponent = profileExponent(beamHalfRad, fieldHalfRad);
  const edge = beamHalfRad * Math.pow(Math.log(1 / PROFILE_EDGE_FRACTION) / Math.LN2, 1 / exponent);
  return Math.min(edge, MAX_EMISSION_ANGLE_RAD);
}

/**
 * Relative intensity (fraction of peak, 0–1) `offAxisDeg` off the axis of a round beam with the given
 * full beam and field angles. Symmetric in the sign of offAxisDeg. Throws a RangeError for invalid
 * angles or |offAxisDeg| > 180.
 */
export function relativeIntensity(offAxisDeg: number, beamAngleDeg: number, fieldAngleDeg: number): number {
  validateBeamAngles(beamAngleDeg, fieldAngleDeg);
  requireFinite(offAxisDeg, 'off-axis angle');
  const offAxis = Math.abs(offAxisDeg);
  if (offAxis > 180) throw new RangeError(`off-axis angle must be within 180° (got ${offAxisDeg}°)`);
  return roundProfile(degToRad(offAxis), degToRad(beamAngleDeg / 2), degToRad(fieldAngleDeg / 2));
}

/** Half-angle (rad) of an elliptical angle contour with half-angles aX, aY at azimuth φ from X. */
export function ellipticalHalfAngle(halfXRad: number, halfYRad: number, azimuthRad: number): number {
  const cosine = Math.cos(azimuthRad);
  const sine = Math.sin(azimuthRad);
  return 1 / Math.sqrt((cosine * cosine) / (halfXRad * halfXRad) + (sine * sine) / (halfYRad * halfYRad));
}

/** Beam (50 %) and field (10 %) half-angles in radians at an azimuth about the axis (from the frame's u). */
export function spreadHalfAnglesAt(
  spread: BeamSpread,
  azimuthRad: number,
): { beamHalfRad: number; fieldHalfRad: number } {
  if (spread.kind === 'round') {
    return {
      beamHalfRad: degToRad(spread.beamAngleDeg / 2),
      fieldHalfRad: degToRad(spread.fieldAngleDeg / 2),
    };
  }
  const relative = azimuthRad - degToRad(spread.rotationDeg);
  return {
    beamHalfRad: ellipticalHalfAngle(
      degToRad(spread.beamAngleXDeg / 2),
      degToRad(spread.beamAngleYDeg / 2),
      relative,
    ),
    fieldHalfRad: ellipticalHalfAngle(
      degToRad(spread.fieldAngleXDeg / 2),
      degToRad(spread.fieldAngleYDeg / 2),
      relative,
    ),
  };
}

/** Relative intensity (0–1) of a round or oval spread at off-axis angle and azimuth (rad); no validation. */
export function spreadProfile(spread: BeamSpread, offAxisRad: number, azimuthRad: number): number {
  const { beamHalfRad, fieldHalfRad } = spreadHalfAnglesAt(spread, azimuthRad);
  return roundProfile(offAxisRad, beamHalfRad, fieldHalfRad);
}

/**
 * Off-axis angle and azimuth (rad) of a world direction in the beam frame of `axis`. Azimuth is
 * measured from the frame's horizontal u (axis × up) toward v (axis × u): (u, v, axis) is right-handed.
 */
export function directionInBeamFrame(
  axis: Vec3,
  direction: Vec3,
): { offAxisRad: number; azimuthRad: number } {
  const unitAxis = normalize(axis);
  const unitDirection = normalize(direction);
  const { u, v } = perpendicularBasis(unitAxis);
  return {
    offAxisRad: angleBetween(unitAxis, unitDirection),
    azimuthRad: Math.atan2(dot(unitDirection, v), dot(unitDirection, u)),
  };
}
