import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  exposureValue,
  exposureValueOfSettings,
  fNumberForLux,
  luxForExposure,
  luxForExposureValue,
  nearestMarkedFNumber,
  shutterSecondsFromAngle,
  stopsFromNormal,
} from '@/lib/photometry';

describe('exposure (ISO 2720 / APEX, C = 250 unless stated)', () => {
  // REFERENCE-CHECKS §6 [DER]: ISO 100, f/2.8, 1/60 s → 1176 lx; exact f/2√2 → 1200 lx.
  it('ISO 100 at f/2.8 and 1/60 s needs 1176 lx', () => {
    expect(luxForExposure({ iso: 100, shutterS: 1 / 60, fNumber: 2.8 })).toBeCloseTo(1176, 9);
    expect(luxForExposure({ iso: 100, shutterS: 1 / 60, fNumber: 2 * Math.SQRT2 })).toBeCloseTo(1200, 9);
    expect(exposureValueOfSettings(2.8, 1 / 60)).toBeCloseTo(8.878, 3);
  });

  // REFERENCE-CHECKS §6 [DER]: ISO 800, f/2.8, 1/50 s → 122.5 lx.
  it('ISO 800 at f/2.8 and 1/50 s needs 122.5 lx', () => {
    expect(luxForExposure({ iso: 800, shutterS: 1 / 50, fNumber: 2.8 })).toBeCloseTo(122.5, 9);
  });

  // REFERENCE-CHECKS §6 [DER]: EV 0 at ISO 100 is 2.5 lx (3.3 lx with C = 330); EV 5 → 80, 10 → 2560, 15 → 81 920 lx.
  it.each([
    [0, 2.5],
    [5, 80],
    [10, 2560],
    [15, 81920],
  ])('EV %i at ISO 100 is %f lx', (ev, lux) => {
    expect(luxForExposureValue({ ev, iso: 100 })).toBeCloseTo(lux, 9);
    expect(exposureValue({ lux, iso: 100 })).toBeCloseTo(ev, 12);
  });

  it('a dome meter (C = 330) needs 3.3 lx for EV 0 at ISO 100', () => {
    expect(luxForExposureValue({ ev: 0, iso: 100, meterConstant: 330 })).toBeCloseTo(3.3, 12);
  });

  // APEX (ASA PH2.5-1960): Ev = Av + Tv; the incident form gives EV = log2(E·S/C) — the two agree.
  it('settings and light agree: the f-number found for a light level gives back that light level', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 100000, noNaN: true }),
        fc.constantFrom(100, 200, 400, 800, 1600),
        fc.constantFrom(1 / 25, 1 / 50, 1 / 60, 1 / 125),
        (lux, iso, shutterS) => {
          const fNumber = fNumberForLux({ lux, iso, shutterS });
          expect(luxForExposure({ iso, shutterS, fNumber })).toBeCloseTo(lux, 6);
          expect(exposureValueOfSettings(fNumber, shutterS)).toBeCloseTo(exposureValue({ lux, iso }), 9);
        },
      ),
    );
  });

  // Common practice, no source: 180° at 24 fps is 1/48 s; 172.8° at 25 fps is 1/52.08 s.
  it('a 180° shutter at 24 fps is 1/48 s', () => {
    expect(shutterSecondsFromAngle(180, 24)).toBeCloseTo(1 / 48, 15);
    expect(shutterSecondsFromAngle(172.8, 25)).toBeCloseTo(0.0192, 12);
  });

  it('says how many stops a level is over or under', () => {
    expect(stopsFromNormal(2352, 1176)).toBeCloseTo(1, 12);
    expect(stopsFromNormal(294, 1176)).toBeCloseTo(-2, 12);
    expect(stopsFromNormal(0, 1176)).toBe(-Infinity);
  });

  // Common practice, no source: lens markings in third stops.
  it('rounds to the nearest marked f-number in stops', () => {
    expect(nearestMarkedFNumber(2.83)).toBe(2.8);
    expect(nearestMarkedFNumber(5.2)).toBe(5);
    expect(nearestMarkedFNumber(10.6)).toBe(11);
  });

  it.each([
    [{ iso: 0, shutterS: 1 / 60, fNumber: 2.8 }, /ISO/],
    [{ iso: 100, shutterS: 0, fNumber: 2.8 }, /shutter time/],
    [{ iso: 100, shutterS: 1 / 60, fNumber: Number.NaN }, /f-number/],
    [{ iso: 100, shutterS: 1 / 60, fNumber: 2.8, meterConstant: -1 }, /meter constant/],
  ])('bad settings are refused with a message (%#)', (settings, message) => {
    expect(() => luxForExposure(settings)).toThrow(message);
  });

  it('refuses shutter angles over 360° and zero frame rates', () => {
    expect(() => shutterSecondsFromAngle(400, 24)).toThrow(/360/);
    expect(() => shutterSecondsFromAngle(180, 0)).toThrow(/frame rate/);
  });
});
