/**
 * Spread of a beam across its axis: D = 2·d·tan(angle/2) on a plane square to the axis, and its
 * inverse angle = 2·atan(D / 2d) (the trade's "beam × throw" factors, REFERENCE-CHECKS §3).
 */
import { degToRad, radToDeg, requireFinite, requirePositive } from '../numeric';

/** Diameter (m) of a beam of full `angleDeg` at `throwM` on a plane square to the axis. */
export function spreadDiameterM(throwM: number, angleDeg: number): number {
  requirePositive(throwM, 'throw');
  requireFinite(angleDeg, 'angle');
  if (angleDeg <= 0 || angleDeg >= 180) {
    throw new RangeError(`angle must be between 0° and 180° (got ${angleDeg}°)`);
  }
  return 2 * throwM * Math.tan(degToRad(angleDeg / 2));
}

/** Multiplying factor (diameter per metre of throw) for a full angle: 2·tan(angle/2). */
export function spreadFactor(angleDeg: number): number {
  return spreadDiameterM(1, angleDeg);
}

/** Full angle (degrees) that gives a pool of `diameterM` at `throwM`, square to the axis. */
export function angleForSpreadDeg(throwM: number, diameterM: number): number {
  requirePositive(throwM, 'throw');
  requirePositive(diameterM, 'pool diameter');
  return radToDeg(2 * Math.atan(diameterM / (2 * throwM)));
}

export interface AngleChoice {
  /** The angle that gives the wanted pool exactly, degrees. */
  readonly neededDeg: number;
  /** The available angle closest to it (null when none is available), degrees. */
  readonly nearestDeg: number | null;
  /** Pool diameter the nearest angle gives at the throw, m. */
  readonly nearestDiameterM: number | null;
  /** For a zoom range that contains the needed angle, true: it can be set exactly. */
  readonly exact: boolean;
}

/**
 * Lens picker: the angle needed for `diameterM` at `throwM`, and the nearest of the fixed `angles`
 * or the nearest point of a zoom `range` [min, max] (degrees).
 */
export function chooseAngle(
  throwM: number,
  diameterM: number,
  available: { readonly angles?: readonly number[]; readonly zoomRange?: readonly [number, number] },
): AngleChoice {
  const neededDeg = angleForSpreadDeg(throwM, diameterM);
  const candidates = (available.angles ?? [])
    .filter((angle) => Number.isFinite(angle) && angle > 0 && angle < 180)
    .map((angleDeg) => ({ angleDeg, exact: false }));
  if (available.zoomRange) {
    const low = Math.min(...available.zoomRange);
    const high = Math.max(...available.zoomRange);
    const inRange = neededDeg >= low && neededDeg <= high;
    candidates.push({ angleDeg: inRange ? neededDeg : neededDeg < low ? low : high, exact: inRange });
  }
  if (candidates.length === 0) {
    return { neededDeg, nearestDeg: null, nearestDiameterM: null, exact: false };
  }
  const nearest = candidates.reduce((best, candidate) =>
    Math.abs(candidate.angleDeg - neededDeg) < Math.abs(best.angleDeg - neededDeg) ? candidate : best,
  );
  return {
    neededDeg,
    nearestDeg: nearest.angleDeg,
    nearestDiameterM: spreadDiameterM(throwM, nearest.angleDeg),
    exact: nearest.exact,
  };
}
