/**
 * Camera exposure from incident light, ISO 2720 / APEX: N² / t = E · S / C, with an incident-meter
 * calibration constant C (250 for a flat receptor, typical; 330 for a hemispherical one). So the
 * illuminance a normal exposure needs is E = C · N² / (t · S), and EV = log2(N² / t) = log2(E · S / C).
 * Cine: t = shutter angle / (360 · fps).
 */
import { requireFinite, requirePositive } from '../numeric';

/** Incident-meter constant for a flat receptor (ISO 2720, typical value). */
export const FLAT_METER_CONSTANT = 250;

/** Incident-meter constant for a hemispherical receptor (ISO 2720, typical value). */
export const DOME_METER_CONSTANT = 330;

export interface ExposureSettings {
  /** ISO arithmetic speed S. */
  readonly iso: number;
  /** Exposure time t, s. */
  readonly shutterS: number;
  /** Aperture f-number N. */
  readonly fNumber: number;
  /** Incident-meter constant C; default 250. */
  readonly meterConstant?: number;
}

/** Illuminance (lx) that gives a normal exposure at these settings: E = C · N² / (t · S). */
export function luxForExposure(settings: ExposureSettings): number {
  const iso = requirePositive(settings.iso, 'ISO');
  const shutterS = requirePositive(settings.shutterS, 'shutter time');
  const fNumber = requirePositive(settings.fNumber, 'f-number');
  const constant = requirePositive(settings.meterConstant ?? FLAT_METER_CONSTANT, 'meter constant');
  return (constant * fNumber * fNumber) / (shutterS * iso);
}

/** Exposure value EV = log2(E · S / C) that `lux` calls for at `iso` (EV 0 at ISO 100 is 2.5 lx, C = 250). */
export function exposureValue(input: { lux: number; iso: number; meterConstant?: number }): number {
  const lux = requirePositive(input.lux, 'illuminance');
  const iso = requirePositive(input.iso, 'ISO');
  const constant = requirePositive(input.meterConstant ?? FLAT_METER_CONSTANT, 'meter constant');
  return Math.log2((lux * iso) / constant);
}

/** Exposure value of camera settings: EV = log2(N² / t). */
export function exposureValueOfSettings(fNumber: number, shutterS: number): number {
  return Math.log2(requirePositive(fNumber, 'f-number') ** 2 / requirePositive(shutterS, 'shutter time'));
}

/** Illuminance (lx) for an exposure value at `iso`: E = C · 2^EV / S. */
export function luxForExposureValue(input: { ev: number; iso: number; meterConstant?: number }): number {
  const ev = requireFinite(input.ev, 'exposure value');
  const iso = requirePositive(input.iso, 'ISO');
  const constant = requirePositive(input.meterConstant ?? FLAT_METER_CONSTANT, 'meter constant');
  return (constant * 2 ** ev) / iso;
}

/** f-number that `lux` gives a normal exposure at `iso` and `shutterS`: N = √(E · t · S / C). */
export function fNumberForLux(input: {
  lux: number;
  iso: number;
  shutterS: number;
  meterConstant?: number;
}): number {
  const lux = requirePositive(input.lux, 'illuminance');
  const iso = requirePositive(input.iso, 'ISO');
  const shutterS = requirePositive(input.shutterS, 'shutter time');
  const constant = requirePositive(input.meterConstant ?? FLAT_METER_CONSTANT, 'meter constant');
  return Math.sqrt((lux * shutterS * iso) / constant);
}

/** Exposure time (s) of a rotary shutter: t = angle / (360 · fps). */
export function shutterSecondsFromAngle(shutterAngleDeg: number, framesPerSecond: number): number {
  requirePositive(shutterAngleDeg, 'shutter angle');
  if (shutterAngleDeg > 360)
    throw new RangeError(`shutter angle cannot exceed 360° (got ${shutterAngleDeg}°)`);
  return shutterAngleDeg / (360 * requirePositive(framesPerSecond, 'frame rate'));
}

/** Stops by which `lux` is over (+) or under (−) the `neededLux` for a normal exposure. */
export function stopsFromNormal(lux: number, neededLux: number): number {
  requirePositive(neededLux, 'needed illuminance');
  requireFinite(lux, 'illuminance');
  if (lux <= 0) return -Infinity;
  return Math.log2(lux / neededLux);
}

/** Marked f-numbers in third stops, as engraved on lenses (common practice, no source). */
export const THIRD_STOP_F_NUMBERS: readonly number[] = [
  1, 1.1, 1.2, 1.4, 1.6, 1.8, 2, 2.2, 2.5, 2.8, 3.2, 3.5, 4, 4.5, 5, 5.6, 6.3, 7.1, 8, 9, 10, 11, 13, 14, 16,
  18, 20, 22, 25, 29, 32,
];

/** The marked third-stop f-number nearest to `fNumber` in stops (log scale). */
export function nearestMarkedFNumber(fNumber: number): number {
  requirePositive(fNumber, 'f-number');
  return THIRD_STOP_F_NUMBERS.reduce((best, marked) =>
    Math.abs(Math.log2(marked / fNumber)) < Math.abs(Math.log2(best / fNumber)) ? marked : best,
  );
}
