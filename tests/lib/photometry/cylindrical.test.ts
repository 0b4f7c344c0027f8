import { describe, expect, it } from 'vitest';
import {
  cylindricalIlluminanceLx,
  illuminanceAtPoint,
  semiCylindricalIlluminanceLx,
  simpson,
} from '@/lib/photometry';
import { vec3 } from '@/lib/geometry';

// Worked case (REFERENCE-CHECKS §2 [DER]): I = 1000 cd, d = 5 m, ε = 45° from the vertical.
const offset = 5 / Math.SQRT2;
const source = vec3(0, -offset, offset); // downstage of the point, 45° up
const point = vec3(0, 0, 0);

/** Vertical illuminance on a plane facing plan azimuth φ (from +x), by the point-source law. */
function verticalAt(azimuth: number): number {
  return illuminanceAtPoint({
    source,
    intensityCd: 1000,
    point,
    normal: vec3(Math.cos(azimuth), Math.sin(azimuth), 0),
  });
}

describe('cylindrical illuminance', () => {
  it('is 9.003 163 lx for the worked case', () => {
    expect(cylindricalIlluminanceLx({ source, intensityCd: 1000, point })).toBeCloseTo(9.003163, 6);
  });

  it('equals the average of vertical illuminance around the point (its definition)', () => {
    const average = simpson(verticalAt, 0, 2 * Math.PI, 20000) / (2 * Math.PI);
    expect(cylindricalIlluminanceLx({ source, intensityCd: 1000, point })).toBeCloseTo(average, 5);
  });

  it('is zero for light from straight above', () => {
    expect(cylindricalIlluminanceLx({ source: vec3(0, 0, 4), intensityCd: 1000, point })).toBe(0);
  });
});

describe('semi-cylindrical illuminance', () => {
  it.each([
    [0, 18.006326],
    [60, 13.504745],
  ])('facing %i° away from the source it is %f lx', (alphaDeg, expected) => {
    // The semi-cylinder faces the source's plan direction (−y) turned by α.
    const alpha = (alphaDeg * Math.PI) / 180;
    const facing = { x: Math.sin(alpha), y: -Math.cos(alpha) };
    expect(semiCylindricalIlluminanceLx({ source, intensityCd: 1000, point, facing })).toBeCloseTo(
      expected,
      6,
    );
  });

  it('equals the average of vertical illuminance over the half turn facing the direction (its definition)', () => {
    const facingAzimuth = -Math.PI / 2 + 0.7;
    const average =
      simpson(verticalAt, facingAzimuth - Math.PI / 2, facingAzimuth + Math.PI / 2, 20000) / Math.PI;
    const facing = { x: Math.cos(facingAzimuth), y: Math.sin(facingAzimuth) };
    // Semi-cylinder: mean over the curved half surface = (1/π)∫ E_v(φ) dφ over the half turn.
    expect(semiCylindricalIlluminanceLx({ source, intensityCd: 1000, point, facing })).toBeCloseTo(
      average,
      5,
    );
  });

  it('refuses a zero facing', () => {
    expect(() =>
      semiCylindricalIlluminanceLx({ source, intensityCd: 1000, point, facing: { x: 0, y: 0 } }),
    ).toThrow(/facing/);
  });
});
