import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  type CandelaGrid,
  candelaGridProblems,
  foldHorizontalDeg,
  gridFigures,
  gridIntensityCd,
  gridTotalLumens,
  polarCurves,
  zoneSolidAngleSr,
} from '@/lib/formats';
import { cosinePower, isotropic, lambertian, range } from './synthetic';

function gridOf(
  intensity: (gamma: number, c: number) => number,
  vertical: number[],
  horizontal: number[],
  symmetry: CandelaGrid['symmetry'],
): CandelaGrid {
  return {
    symmetry,
    verticalAnglesDeg: vertical,
    horizontalAnglesDeg: horizontal,
    candelaCd: horizontal.map((c) => vertical.map((gamma) => intensity(gamma, c))),
  };
}

describe('zonal lumens', () => {
  it('ten-degree zonal constants are 0.0955 … 1.0911 and sum to 4π over 0–180° (REFERENCE-CHECKS §4 [DER])', () => {
    const constants = range(0, 80, 10).map((from) => zoneSolidAngleSr(from, from + 10));
    expect(constants.map((value) => Number(value.toFixed(4)))).toEqual([
      0.0955, 0.2835, 0.4629, 0.6282, 0.7744, 0.8972, 0.9926, 1.0579, 1.0911,
    ]);
    const all = range(0, 170, 10).reduce((sum, from) => sum + zoneSolidAngleSr(from, from + 10), 0);
    expect(all).toBeCloseTo(4 * Math.PI, 12);
  });

  it('Lambertian 1000 cd with 10° zones at midpoint intensities is 3153.59 lm (REFERENCE-CHECKS §4 [DER])', () => {
    const flux = range(0, 80, 10).reduce(
      (sum, from) => sum + 1000 * Math.cos(((from + 5) * Math.PI) / 180) * zoneSolidAngleSr(from, from + 10),
      0,
    );
    expect(flux).toBeCloseTo(3153.59, 2);
  });

  it('an isotropic 1000 cd grid over 0…180° gives 4π·1000 = 12 566.37 lm exactly (SI: 1 lm = 1 cd·sr)', () => {
    const grid = gridOf(isotropic(1000), range(0, 180, 10), [0], 'rotational');
    expect(gridTotalLumens(grid)).toBeCloseTo(12566.370614, 5);
  });

  it('a Lambertian grid on 5° gives π·I0 = 3141.59 lm within 0.5 % (REFERENCE-CHECKS §4 tolerance)', () => {
    const grid = gridOf(lambertian(1000), range(0, 90, 5), [0, 90], 'quadrant');
    expect(Math.abs(gridTotalLumens(grid) / (Math.PI * 1000) - 1)).toBeLessThan(0.005);
  });

  it('cos²⁰ with I0 = 10 000 cd on a 1° grid is 2991.993 lm, beam 29.995°, field 53.938° (REFERENCE-CHECKS §4)', () => {
    const figures = gridFigures(gridOf(cosinePower(10000, 20), range(0, 90, 1), [0], 'rotational'));
    expect(Math.abs(figures.totalLumens / 2991.993 - 1)).toBeLessThan(0.005);
    expect(figures.c0.beamAngleDeg).toBeCloseTo(29.995, 1);
    expect(figures.c0.fieldAngleDeg).toBeCloseTo(53.938, 1);
    expect(figures.beamEdgeReached).toBe(true);
  });

  it('a distribution with no symmetry sums its planes by the trapezoid rule in C', () => {
    // I = 1000 + 500·cos C everywhere: the cos C part integrates to 0 over the circle [DER].
    const grid = gridOf(
      (_gamma, c) => 1000 + 500 * Math.cos((c * Math.PI) / 180),
      range(0, 180, 5),
      range(0, 345, 15),
      'none',
    );
    expect(gridTotalLumens(grid)).toBeCloseTo(4 * Math.PI * 1000, 6);
  });
});

describe('interpolation and symmetry', () => {
  it('folds C into each stored range', () => {
    expect(foldHorizontalDeg('quadrant', 135)).toBe(45);
    expect(foldHorizontalDeg('quadrant', 250)).toBe(70);
    expect(foldHorizontalDeg('quadrant', -30)).toBe(30);
    expect(foldHorizontalDeg('c0-c180', 300)).toBe(60);
    expect(foldHorizontalDeg('c90-c270', 30)).toBe(150);
    expect(foldHorizontalDeg('c90-c270', 300)).toBe(240);
    expect(foldHorizontalDeg('none', 370)).toBe(10);
  });

  it('is exact at the samples and linear between them', () => {
    const grid = gridOf((gamma, c) => gamma * 10 + c, [0, 10, 20], [0, 90, 180], 'c0-c180');
    expect(gridIntensityCd(grid, 10, 90)).toBe(190);
    expect(gridIntensityCd(grid, 5, 45)).toBeCloseTo(50 + 45, 12);
    expect(gridIntensityCd(grid, 5, 315)).toBeCloseTo(95, 12);
    expect(gridIntensityCd(grid, 25, 0)).toBe(0);
  });

  it('wraps from the last plane back to C0 when there is no symmetry', () => {
    const grid = gridOf((_gamma, c) => (c === 0 ? 100 : 200), [0, 90], [0, 90, 180, 270], 'none');
    expect(gridIntensityCd(grid, 0, 315)).toBeCloseTo(150, 12);
  });

  it('is never negative and never NaN for any direction (property)', () => {
    const grid = gridOf((gamma, c) => (gamma < 90 ? 100 + c : 0), range(0, 180, 15), [0, 90], 'quadrant');
    fc.assert(
      fc.property(
        fc.double({ min: -400, max: 400, noNaN: true }),
        fc.double({ min: -1000, max: 1000, noNaN: true }),
        (gamma, c) => {
          const value = gridIntensityCd(grid, gamma, c);
          return Number.isFinite(value) && value >= 0;
        },
      ),
    );
  });

  it('names what is wrong with a broken grid', () => {
    const base = gridOf(isotropic(1), [0, 90], [0], 'rotational');
    expect(candelaGridProblems(base)).toEqual([]);
    expect(candelaGridProblems({ ...base, verticalAnglesDeg: [90, 0] })[0]).toMatch(/ascending/);
    expect(candelaGridProblems({ ...base, candelaCd: [[1, -1]] })[0]).toMatch(/candelaCd\[0\]\[1\]/);
    expect(
      candelaGridProblems({
        ...base,
        symmetry: 'quadrant',
        horizontalAnglesDeg: [0, 45],
        candelaCd: [
          [1, 1],
          [1, 1],
        ],
      })[0],
    ).toMatch(/symmetry/);
  });
});

describe('polar plot points', () => {
  it('an isotropic grid draws two unit circles', () => {
    const curves = polarCurves(gridOf(isotropic(5), range(0, 180, 10), [0], 'rotational'), 10);
    expect(curves.map((curve) => curve.label)).toEqual(['C0–C180', 'C90–C270']);
    for (const point of curves[0].points) expect(Math.hypot(point.x, point.y)).toBeCloseTo(1, 12);
  });
});
