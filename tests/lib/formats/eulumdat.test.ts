import { describe, expect, it } from 'vitest';
import { readPhotometryFile } from '@/lib/formats';
import {
  cosinePower,
  isotropic,
  lambertian,
  lopsided,
  oval,
  range,
  writeEulumdat,
  writeLm63,
} from './synthetic';

const cFull = range(0, 345, 15);

describe('EULUMDAT', () => {
  it('an isotropic source is 79.577 47 cd/klm: 79.577 cd with 1000 lm of lamp flux (REFERENCE-CHECKS §5b [DER])', () => {
    // Write the cd/klm value itself: 1000 lm / 4π sr per klm.
    const text = writeEulumdat({
      isym: 1,
      cAngles: [0],
      gammas: range(0, 180, 5),
      intensity: isotropic(79.57747),
    });
    const file = readPhotometryFile(text, 'iso.ldt');
    expect(file.formatVersion).toBe('EULUMDAT');
    expect(file.intensityCd(70, 200)).toBeCloseTo(79.57747, 5);
    expect(file.totalLumens).toBeCloseTo(1000, 1);
  });

  it('a Lambertian emitter is 318.309 89 cd/klm at nadir; with 2000 lm of lamps, 636.62 cd (§5b [DER])', () => {
    const text = writeEulumdat({
      isym: 1,
      cAngles: [0],
      gammas: range(0, 90, 5),
      lampFluxLm: 2000,
      intensity: lambertian(636.61977),
    });
    const file = readPhotometryFile(text, 'lambert.ldt');
    expect(file.intensityCd(0, 0)).toBeCloseTo(636.61977, 4);
    expect((file.intensityCd(0, 0) * 1000) / 2000).toBeCloseTo(318.30989, 4);
    expect(Math.abs(file.totalLumens / 2000 - 1)).toBeLessThan(0.005);
    expect(file.ratedLampLumens).toBe(2000);
  });

  it('applies the conversion factor and reads decimal commas', () => {
    const text = writeEulumdat({
      isym: 1,
      cAngles: [0],
      gammas: range(0, 90, 5),
      conversion: 2.5,
      decimalComma: true,
      intensity: lambertian(400),
    });
    expect(readPhotometryFile(text, 'comma.ldt').peakCd).toBeCloseTo(400, 4);
  });

  it('a negative number of lamps is absolute photometry', () => {
    const text = writeEulumdat({
      isym: 1,
      cAngles: [0],
      gammas: range(0, 90, 5),
      lamps: -1,
      intensity: lambertian(400),
    });
    expect(readPhotometryFile(text, 'abs.ldt').ratedLampLumens).toBeNull();
  });

  it.each([
    [0, 'none', lopsided],
    [1, 'rotational', cosinePower(2000, 8)],
    [2, 'c0-c180', oval],
    [3, 'c90-c270', oval],
    [4, 'quadrant', oval],
  ] as const)(
    'Isym %i (%s) agrees with the full distribution and with the LM-63 file of it',
    (isym, symmetry, intensity) => {
      const gammas = range(0, 180, 5);
      const part = readPhotometryFile(writeEulumdat({ isym, cAngles: cFull, gammas, intensity }), 'part.ldt');
      const whole = readPhotometryFile(
        writeEulumdat({ isym: 0, cAngles: cFull, gammas, intensity }),
        'whole.ldt',
      );
      const lm63 = readPhotometryFile(
        writeLm63({ vertical: gammas, horizontal: range(0, 360, 15), intensity }),
        'same.ies',
      );
      expect(part.grid.symmetry).toBe(symmetry);
      for (const [gamma, c] of [
        [0, 0],
        [12.5, 37],
        [40, 100],
        [63, 222],
        [85, 301],
      ]) {
        expect(part.intensityCd(gamma, c)).toBeCloseTo(whole.intensityCd(gamma, c), 4);
        expect(part.intensityCd(gamma, c)).toBeCloseTo(lm63.intensityCd(gamma, c), 4);
      }
      expect(part.totalLumens).toBeCloseTo(lm63.totalLumens, 2);
      expect(part.beamAngleDeg).toBeCloseTo(lm63.beamAngleDeg, 4);
      expect(part.fieldAngleCrossDeg).toBeCloseTo(lm63.fieldAngleCrossDeg, 4);
    },
  );
});
