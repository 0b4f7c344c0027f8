import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { beamIlluminanceLx, illuminanceAtPoint, illuminanceLx } from '@/lib/photometry';
import { vec3 } from '@/lib/geometry';

describe('illuminanceLx: inverse-square law × Lambert cosine law', () => {
  // SI Brochure: 1 cd at 1 m on a surface square to the light gives 1 lx.
  it('1 cd at 1 m, normal incidence, is 1 lx', () => {
    expect(illuminanceLx(1, 1, 0)).toBe(1);
  });

  // REFERENCE-CHECKS §2 [DER].
  it.each([
    [1000, 5, 0, 40],
    [1000, 5, 30, 34.641016],
    [1000, 3.048, 0, 107.639104],
    [1000, 5, 120, 0],
    [1000, 5, 90, 0],
  ])('%i cd at %f m and %i° incidence is %f lx', (intensity, distance, incidence, expected) => {
    expect(illuminanceLx(intensity, distance, incidence)).toBeCloseTo(expected, 6);
  });

  // REFERENCE-CHECKS §2 [DER]: horizontal plane, h = 5 m, 30° off vertical, I = 1000 cd → 25.980 762 lx (I·cos³θ/h²).
  it('a horizontal plane 5 m below at 30° off vertical gets 25.980 762 lx', () => {
    const point = vec3(5 * Math.tan(Math.PI / 6), 0, 0);
    expect(
      illuminanceAtPoint({ source: vec3(0, 0, 5), intensityCd: 1000, point, normal: vec3(0, 0, 1) }),
    ).toBeCloseTo(25.980762, 6);
  });

  // REFERENCE-CHECKS §2 [DER]: E_v = E_n · sin ε; I = 1000 cd, d = 5 m, ε = 45° → 28.284 271 lx.
  it('a vertical plane facing the source at 45° elevation gets 28.284 271 lx', () => {
    const offset = 5 / Math.SQRT2;
    const lux = illuminanceAtPoint({
      source: vec3(0, -offset, offset),
      intensityCd: 1000,
      point: vec3(0, 0, 0),
      normal: vec3(0, -1, 0),
    });
    expect(lux).toBeCloseTo(28.284271, 6);
  });

  it('light from behind the surface is 0, never negative', () => {
    expect(
      illuminanceAtPoint({
        source: vec3(0, 0, -2),
        intensityCd: 500,
        point: vec3(0, 0, 0),
        normal: vec3(0, 0, 1),
      }),
    ).toBe(0);
  });

  it('illuminance falls with distance and adds linearly over sources', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 50, noNaN: true }),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        (d, more) => {
          expect(illuminanceLx(1000, d + more, 0)).toBeLessThan(illuminanceLx(1000, d, 0));
          expect(illuminanceLx(700, d, 10) + illuminanceLx(300, d, 10)).toBeCloseTo(
            illuminanceLx(1000, d, 10),
            9,
          );
        },
      ),
    );
  });

  it.each([
    [1000, 0, 0, /distance must be greater than zero/],
    [1000, -1, 0, /distance/],
    [-5, 1, 0, /intensity must not be negative/],
    [Number.NaN, 1, 0, /intensity must be a finite number/],
    [1000, 1, Number.NaN, /incidence angle/],
  ])('illuminanceLx(%s, %s, %s) is refused', (intensity, distance, incidence, message) => {
    expect(() => illuminanceLx(intensity, distance, incidence)).toThrow(message);
  });

  it('a point at the source is refused', () => {
    expect(() =>
      illuminanceAtPoint({
        source: vec3(1, 1, 1),
        intensityCd: 1,
        point: vec3(1, 1, 1),
        normal: vec3(0, 0, 1),
      }),
    ).toThrow(/distance from the source/);
  });
});

describe('two-fixture front light (REFERENCE-CHECKS §11)', () => {
  // [DER]: two 20 000 cd units at 45° up and ±45° to the side, throw 8.4853 m: 138.89 lx each on the
  // vertical plane facing the audience and 196.42 lx each on the horizontal.
  const offset = 4.242641;
  const focus = vec3(0, 0, 1.7);
  const units = [vec3(-offset, -offset, 7.7), vec3(offset, -offset, 7.7)];
  const spread = { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 } as const;
  const total = (normal: ReturnType<typeof vec3>) =>
    units.reduce(
      (sum, mount) =>
        sum +
        beamIlluminanceLx({
          mount,
          axis: { x: focus.x - mount.x, y: focus.y - mount.y, z: focus.z - mount.z },
          peakCd: 20000,
          spread,
          point: focus,
          normal,
        }),
      0,
    );

  it('the face toward the audience gets 277.78 lx', () => {
    expect(total(vec3(0, -1, 0))).toBeCloseTo(277.78, 2);
  });
  it('the horizontal plane gets 392.84 lx', () => {
    expect(total(vec3(0, 0, 1))).toBeCloseTo(392.84, 2);
  });
});
