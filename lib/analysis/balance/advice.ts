/**
 * What would let a unit that is already at 100 % give the light a target needs, by two pieces of
 * arithmetic (on-axis approximation: the subject is taken to stay where the unit points):
 * - Throw: E ∝ 1/d² (inverse square), so the throw that gives E_needed is d·√(E_now / E_needed).
 * - Beam: a unit keeps its lumens when its beam narrows, so its peak ∝ 1 / (solid angle of the beam
 *   model); the beam angle whose peak is E_needed / E_now times the peak now is found by bisection,
 *   field angle scaled with it (the field/beam ratio kept; an oval scales both axes). Beam types only:
 *   soft and measured sources get the throw advice alone.
 */
import { type Vec3, distance } from '../../geometry/vector';
import { type BeamSpread, validateBeamSpread } from '../../photometry/beam';
import { beamSolidAngleSr } from '../../photometry/flux';

export interface UnitAdvice {
  readonly fixtureId: string;
  readonly subjectId: string;
  readonly role: 'key' | 'fill' | 'back';
  /** What the unit gives in this role at 100 %, lx. */
  readonly givesLx: number;
  /** What it would have to give for the target (taking the whole shortfall alone), lx. */
  readonly needsLx: number;
  /** Distance from the unit to the face now, and the distance that would give needsLx, m. */
  readonly throwNowM: number;
  readonly throwNeededM: number;
  /** Beam angle now and the one that would give needsLx (X axis of an oval), degrees; null for soft/measured. */
  readonly beam: {
    readonly beamNowDeg: number;
    readonly beamNeededDeg: number;
    readonly fieldNowDeg: number;
    readonly fieldNeededDeg: number;
  } | null;
}

function scaled(spread: BeamSpread, factor: number): BeamSpread {
  return spread.kind === 'round'
    ? { ...spread, beamAngleDeg: spread.beamAngleDeg * factor, fieldAngleDeg: spread.fieldAngleDeg * factor }
    : {
        ...spread,
        beamAngleXDeg: spread.beamAngleXDeg * factor,
        fieldAngleXDeg: spread.fieldAngleXDeg * factor,
        beamAngleYDeg: spread.beamAngleYDeg * factor,
        fieldAngleYDeg: spread.fieldAngleYDeg * factor,
      };
}

/**
 * The factor (0–1] on every angle of `spread` that raises its peak `gain` times at the same lumens:
 * Ω(spread·f) = Ω(spread)/gain, by bisection to 1e-4 of the factor. Null when even a 1 % spread will not do.
 */
export function narrowingForGain(spread: BeamSpread, gain: number): number | null {
  if (!(gain > 1)) return 1;
  const wanted = beamSolidAngleSr(spread) / gain;
  let low = 0.01;
  let high = 1;
  if (beamSolidAngleSr(scaled(spread, low)) > wanted) return null;
  while (high - low > 1e-4) {
    const middle = (low + high) / 2;
    if (beamSolidAngleSr(scaled(spread, middle)) > wanted) high = middle;
    else low = middle;
  }
  return (low + high) / 2;
}

export function adviseUnit(input: {
  fixtureId: string;
  subjectId: string;
  role: 'key' | 'fill' | 'back';
  givesLx: number;
  shortfallLx: number;
  mount: Vec3;
  facePoint: Vec3;
  beamSpread: BeamSpread | null;
}): UnitAdvice {
  const needsLx = input.givesLx + input.shortfallLx;
  const throwNowM = distance(input.mount, input.facePoint);
  const gain = needsLx / input.givesLx;
  let beam: UnitAdvice['beam'] = null;
  if (input.beamSpread) {
    validateBeamSpread(input.beamSpread);
    const factor = narrowingForGain(input.beamSpread, gain);
    if (factor !== null) {
      const spread = input.beamSpread;
      const beamNowDeg = spread.kind === 'round' ? spread.beamAngleDeg : spread.beamAngleXDeg;
      const fieldNowDeg = spread.kind === 'round' ? spread.fieldAngleDeg : spread.fieldAngleXDeg;
      beam = {
        beamNowDeg,
        beamNeededDeg: beamNowDeg * factor,
        fieldNowDeg,
        fieldNeededDeg: fieldNowDeg * factor,
      };
    }
  }
  return {
    fixtureId: input.fixtureId,
    subjectId: input.subjectId,
    role: input.role,
    givesLx: input.givesLx,
    needsLx,
    throwNowM,
    throwNeededM: throwNowM * Math.sqrt(input.givesLx / needsLx),
    beam,
  };
}
