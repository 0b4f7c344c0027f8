import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  areaSourceIlluminanceLx,
  discSourceIlluminanceLx,
  illuminanceLx,
  lambertianPeakCd,
  luminanceFromLumens,
  pointSourceWarning,
} from '@/lib/photometry';
import { vec3 } from '@/lib/geometry';

const down = vec3(0, 0, -1);
const up = vec3(0, 0, 1);

/**
 * Configuration factor from a small surface to a parallel rectangle a × b at distance c, the surface
 * on the normal through one corner: F = 1/(2π)·[A/√(1+A²)·atan(B/√(1+A²)) + B/√(1+B²)·atan(A/√(1+B²))],
 * A = a/c, B = b/c (radiative transfer handbooks' catalogue of view factors; from memory, and it meets
 * the on-axis disc and far-field limits checked below). E = π·L·F.
 */
function cornerFactor(a: number, b: number, c: number): number {
  const A = a / c;
  const B = b / c;
  const rootA = Math.sqrt(1 + A * A);
  const rootB = Math.sqrt(1 + B * B);
  return ((A / rootA) * Math.atan(B / rootA) + (B / rootB) * Math.atan(A / rootB)) / (2 * Math.PI);
}

/**
 * Configuration factor from a small surface parallel to a disc of radius r at height h, offset s from
 * its axis: H = h/s, R = r/s, Z = 1 + H² + R², F = ½·[1 − (Z − 2R²)/√(Z² − 4R²)] (from memory; it
 * reduces to r²/(r² + h²) as s → 0, the on-axis closed form).
 */
function offsetDiscFactor(r: number, h: number, s: number): number {
  const H = h / s;
  const R = r / s;
  const Z = 1 + H * H + R * R;
  return 0.5 * (1 - (Z - 2 * R * R) / Math.sqrt(Z * Z - 4 * R * R));
}

describe('disc source on axis (PHYSICS.md: E = π·L·r²/(r² + d²))', () => {
  it('a 1 m disc of 1000 cd/m² gives 628.32 lx at 1 m, and the numerical integral agrees at every distance', () => {
    // π·1000·0.25/(0.25 + 1) = 628.3185 lx
    expect(discSourceIlluminanceLx(1000, 0.5, 1)).toBeCloseTo(628.3185307, 6);
    for (const distance of [0.02, 0.1, 0.5, 1, 3, 10]) {
      const numeric = areaSourceIlluminanceLx({
        shape: { kind: 'disc', radiusM: 0.5 },
        centre: vec3(0, 0, 0),
        facing: up,
        luminanceCdPerM2: 1000,
        point: vec3(0, 0, distance),
        normal: down,
      });
      expect(numeric / discSourceIlluminanceLx(1000, 0.5, distance)).toBeCloseTo(1, 6);
    }
  });

  it('touching the disc gives π·L', () => {
    expect(discSourceIlluminanceLx(1000, 0.5, 0)).toBeCloseTo(Math.PI * 1000, 9);
  });

  it('far away it tends to the point-source value I0/d² with I0 = L·A (within 1 % past 5 × the size)', () => {
    const area = Math.PI * 0.25;
    const far = illuminanceLx(lambertianPeakCd(1000, area), 5, 0);
    expect(discSourceIlluminanceLx(1000, 0.5, 5) / far).toBeGreaterThan(0.99);
    // The point-source figure overstates by exactly (r² + d²)/d².
    expect(far / discSourceIlluminanceLx(1000, 0.5, 5)).toBeCloseTo((0.25 + 25) / 25, 12);
  });
});

describe('off-axis disc and rectangles against closed-form view factors', () => {
  it('an offset point under a disc matches the parallel-disc view factor', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 3, noNaN: true }),
        fc.double({ min: 0.01, max: 3, noNaN: true }),
        (height, offset) => {
          const numeric = areaSourceIlluminanceLx({
            shape: { kind: 'disc', radiusM: 0.6 },
            centre: vec3(0, 0, 0),
            facing: up,
            luminanceCdPerM2: 2000,
            point: vec3(offset, 0, height),
            normal: down,
          });
          const exact = Math.PI * 2000 * offsetDiscFactor(0.6, height, offset);
          expect(numeric / exact).toBeCloseTo(1, 6);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('any point facing a rectangle matches the corner view factors added up', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.03, max: 4, noNaN: true }),
        fc.double({ min: -0.45, max: 0.45, noNaN: true }),
        fc.double({ min: -0.25, max: 0.25, noNaN: true }),
        (height, x, y) => {
          // 1.0 m × 0.6 m panel; a point above its face splits it into four corner rectangles.
          const numeric = areaSourceIlluminanceLx({
            shape: { kind: 'rectangle', widthM: 1, heightM: 0.6 },
            centre: vec3(0, 0, 0),
            facing: up,
            widthDirection: vec3(1, 0, 0),
            luminanceCdPerM2: 1500,
            point: vec3(x, y, height),
            normal: down,
          });
          const factor =
            cornerFactor(0.5 - x, 0.3 - y, height) +
            cornerFactor(0.5 + x, 0.3 - y, height) +
            cornerFactor(0.5 - x, 0.3 + y, height) +
            cornerFactor(0.5 + x, 0.3 + y, height);
          expect(numeric / (Math.PI * 1500 * factor)).toBeCloseTo(1, 6);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a receiver facing away from the source gets nothing, and one beside a panel gets only grazing light', () => {
    const panel = {
      shape: { kind: 'rectangle', widthM: 1, heightM: 1 } as const,
      centre: vec3(0, 0, 0),
      facing: up,
      luminanceCdPerM2: 1000,
    };
    expect(areaSourceIlluminanceLx({ ...panel, point: vec3(0, 0, 1), normal: up })).toBe(0);
    expect(areaSourceIlluminanceLx({ ...panel, point: vec3(0, 0, -1), normal: up })).toBe(0);
  });

  it('a rectangle turned on edge lights a vertical face the same as one lying flat lights a horizontal one', () => {
    const flat = areaSourceIlluminanceLx({
      shape: { kind: 'rectangle', widthM: 1.2, heightM: 0.9 },
      centre: vec3(0, 0, 0),
      facing: up,
      luminanceCdPerM2: 800,
      point: vec3(0.1, 0.2, 1.5),
      normal: down,
    });
    const standing = areaSourceIlluminanceLx({
      shape: { kind: 'rectangle', widthM: 1.2, heightM: 0.9 },
      centre: vec3(0, 0, 2),
      facing: vec3(0, -1, 0),
      widthDirection: vec3(-1, 0, 0),
      luminanceCdPerM2: 800,
      point: vec3(-0.1, -1.5, 2.2),
      normal: vec3(0, 1, 0),
    });
    expect(standing).toBeCloseTo(flat, 9);
  });
});

describe('soft source helpers', () => {
  it('a Lambertian emitter of 1000 lm over 0.5 m² has L = Φ/(π·A) = 636.62 cd/m²', () => {
    expect(luminanceFromLumens(1000, 0.5)).toBeCloseTo(636.6197724, 6);
  });

  // Common practice: point-source figures hold beyond about 5 × the largest source dimension.
  it('warns closer than 5 × the source size and not beyond', () => {
    expect(pointSourceWarning(2, 0.6)).toMatch(/5 × its size/);
    expect(pointSourceWarning(3, 0.6)).toBeNull();
    expect(pointSourceWarning(Number.NaN, 0.6)).toBeNull();
  });

  it('refuses shapes without size', () => {
    expect(() =>
      areaSourceIlluminanceLx({
        shape: { kind: 'disc', radiusM: 0 },
        centre: vec3(0, 0, 0),
        facing: up,
        luminanceCdPerM2: 1,
        point: vec3(0, 0, 1),
        normal: down,
      }),
    ).toThrow(/disc radius/);
    expect(() => discSourceIlluminanceLx(100, 0.5, -1)).toThrow(/distance/);
  });
});

describe('the coarse rule for light maps', () => {
  it('stays within 1e-3 of the closed forms from a quarter of the source size out', () => {
    let worst = 0;
    for (const height of [0.3, 0.5, 1, 2, 4]) {
      for (const [x, y] of [
        [0, 0],
        [-0.45, 0.2],
        [0.3, -0.25],
      ]) {
        const exact =
          Math.PI *
          1500 *
          (cornerFactor(0.5 - x, 0.3 - y, height) +
            cornerFactor(0.5 + x, 0.3 - y, height) +
            cornerFactor(0.5 - x, 0.3 + y, height) +
            cornerFactor(0.5 + x, 0.3 + y, height));
        const coarse = areaSourceIlluminanceLx(
          {
            shape: { kind: 'rectangle', widthM: 1, heightM: 0.6 },
            centre: vec3(0, 0, 0),
            facing: up,
            widthDirection: vec3(1, 0, 0),
            luminanceCdPerM2: 1500,
            point: vec3(x, y, height),
            normal: down,
          },
          'coarse',
        );
        worst = Math.max(worst, Math.abs(coarse / exact - 1));
      }
    }
    expect(worst).toBeLessThan(1e-3);
  });
});
