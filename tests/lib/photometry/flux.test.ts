import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  beamSolidAngleSr,
  lumensFromPeakCandela,
  peakCandelaFromLumens,
  peakCandelaForSpread,
  rotationalFluxLm,
  simpson,
  compositeGauss,
  gaussLegendre,
} from '@/lib/photometry';

const rad = (deg: number) => (deg * Math.PI) / 180;

describe('flux from intensity: closed forms', () => {
  // SI Brochure: 1 lm = 1 cd·sr, so an isotropic 1 cd source emits 4π lm (REFERENCE-CHECKS §1).
  it('an isotropic 1 cd source emits 4π = 12.566 370 6 lm', () => {
    expect(rotationalFluxLm(() => 1)).toBeCloseTo(4 * Math.PI, 9);
  });

  // REFERENCE-CHECKS §4 [DER]: uniform cone Φ = 2π·I·(1 − cos α).
  it('10 000 cd uniform in a 13° half-angle cone is 1610.376 lm', () => {
    expect(rotationalFluxLm(() => 10000, rad(13))).toBeCloseTo(1610.376, 3);
    expect(rotationalFluxLm(() => 1000, rad(90))).toBeCloseTo(6283.185, 3);
  });

  // REFERENCE-CHECKS §4 [DER]: Lambertian I0·cos θ over one hemisphere is π·I0.
  it('a Lambertian 1000 cd emitter gives 3141.593 lm', () => {
    expect(rotationalFluxLm((theta) => 1000 * Math.cos(theta), Math.PI / 2)).toBeCloseTo(3141.593, 3);
  });

  // REFERENCE-CHECKS §4 [DER]: cos^n θ gives 2π·I0/(n + 1); n = 20, I0 = 10 000 cd → 2991.993 lm.
  it('a cos²⁰ distribution of 10 000 cd gives 2991.993 lm', () => {
    expect(rotationalFluxLm((theta) => 10000 * Math.cos(theta) ** 20, Math.PI / 2)).toBeCloseTo(2991.993, 3);
  });

  // REFERENCE-CHECKS §4 [DER]: a Gaussian beam of 26° (σ = 11.0412°) and 10 000 cd is exactly 2304.61 lm.
  it('a Gaussian of σ = 11.0412° and 10 000 cd integrates to 2304.61 lm', () => {
    const sigma = rad(11.0412);
    expect(rotationalFluxLm((theta) => 10000 * Math.exp(-(theta ** 2) / (2 * sigma ** 2)))).toBeCloseTo(
      2304.61,
      2,
    );
  });

  it('the beam model with a Gaussian field/beam ratio is that Gaussian, ending where it falls to 0.1 % of peak', () => {
    const field = 26 * Math.sqrt(Math.LN10 / Math.LN2); // 47.388°
    expect(field).toBeCloseTo(47.388, 3);
    // Half-width at half maximum 13° → σ = 13°/√(2 ln 2); the Gaussian is 0.1 % at σ·√(2 ln 1000).
    const sigma = rad(13) / Math.sqrt(2 * Math.LN2);
    const edge = sigma * Math.sqrt(2 * Math.log(1000));
    const gaussianToEdge = rotationalFluxLm(
      (theta) => 10000 * Math.exp(-(theta ** 2) / (2 * sigma ** 2)),
      edge,
    );
    expect(lumensFromPeakCandela(10000, 26, field)).toBeCloseTo(gaussianToEdge, 6);
    // What the edge leaves out is about 0.1 % of the flux (small-angle: exactly ε for a Gaussian).
    expect(gaussianToEdge / 2304.61).toBeGreaterThan(0.998);
    expect(gaussianToEdge / 2304.61).toBeLessThan(0.9995);
  });
});

describe('lumens and peak candela', () => {
  it('lumens → peak → lumens round-trips', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 100000, noNaN: true }),
        fc.double({ min: 2, max: 90, noNaN: true }),
        fc.double({ min: 1.05, max: 1.9, noNaN: true }),
        (lumens, beam, ratio) => {
          const field = Math.min(beam * ratio, 170);
          fc.pre(field > beam);
          const peak = peakCandelaFromLumens(lumens, beam, field);
          expect(lumensFromPeakCandela(peak, beam, field)).toBeCloseTo(lumens, 6);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('a zoom keeps its lumens: narrowing from 50° to 25° raises the peak about fourfold', () => {
    const wide = peakCandelaFromLumens(10000, 50, 70);
    const narrow = peakCandelaFromLumens(10000, 25, 35);
    // Small-angle scaling: solid angle ∝ angle², so peak ∝ 1/angle² → ≈ 4× (not exact for wide beams).
    expect(narrow / wide).toBeGreaterThan(3.7);
    expect(narrow / wide).toBeLessThan(4.1);
  });

  it('an oval beam with equal axes has the round beam’s solid angle', () => {
    const round = beamSolidAngleSr({ kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 });
    const oval = beamSolidAngleSr({
      kind: 'oval',
      beamAngleXDeg: 20,
      fieldAngleXDeg: 30,
      beamAngleYDeg: 20,
      fieldAngleYDeg: 30,
      rotationDeg: 17,
    });
    expect(oval).toBeCloseTo(round, 8);
  });

  it('a narrow oval holds about the product of its two angles (small-angle check)', () => {
    // Small-angle: solid angle ∝ product of the two half-angles for elliptical contours, so a 10°×40°
    // oval holds about as much as a 20° round beam of the same shape (geometric mean).
    const oval = beamSolidAngleSr({
      kind: 'oval',
      beamAngleXDeg: 10,
      fieldAngleXDeg: 16,
      beamAngleYDeg: 40,
      fieldAngleYDeg: 64,
      rotationDeg: 0,
    });
    const round = beamSolidAngleSr({ kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 32 });
    expect(oval / round).toBeGreaterThan(0.97);
    expect(oval / round).toBeLessThan(1.03);
    expect(peakCandelaForSpread(1000, { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 32 })).toBeCloseTo(
      1000 / round,
      9,
    );
  });

  it('refuses negative lumens and candela', () => {
    expect(() => peakCandelaFromLumens(-1, 20, 30)).toThrow(/lumens must not be negative/);
    expect(() => lumensFromPeakCandela(-1, 20, 30)).toThrow(/peak intensity must not be negative/);
    expect(() => peakCandelaFromLumens(Number.NaN, 20, 30)).toThrow(RangeError);
  });
});

describe('quadrature rules', () => {
  // REFERENCE-CHECKS §4 [DER]: Lambertian data at 5° steps, Simpson's rule → 3141.61 lm.
  it("Simpson's rule on 5° samples of a 1000 cd Lambertian gives 3141.61 lm", () => {
    expect(
      simpson((theta) => 2 * Math.PI * 1000 * Math.cos(theta) * Math.sin(theta), 0, Math.PI / 2, 18),
    ).toBeCloseTo(3141.61, 2);
  });

  it('Gauss–Legendre with n points is exact for x^(2n−1)', () => {
    const rule = gaussLegendre(8);
    const sumWeights = rule.weights.reduce((sum, weight) => sum + weight, 0);
    expect(sumWeights).toBeCloseTo(2, 14);
    expect(compositeGauss((x) => x ** 15 + x ** 14, 0, 1, 1)).toBeCloseTo(1 / 16 + 1 / 15, 14);
  });
});
