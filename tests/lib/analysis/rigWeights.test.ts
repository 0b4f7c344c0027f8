import { describe, expect, it } from 'vitest';
import {
  type WeightPositionInput,
  type WeightUnitInput,
  peakMomentKgM,
  positionWeights,
} from '@/lib/analysis';

const pipe = (
  ratedLoadKg: number | null,
  loadKind: 'uniform' | 'point' = 'uniform',
): WeightPositionInput => ({
  id: 'p',
  name: 'Pipe',
  ratedLoadKg,
  loadKind,
  // A 4 m run along x at y = 0.
  shape: { kind: 'line', start: { x: 0, y: 0 }, end: { x: 4, y: 0 } },
});

const hung = (id: string, weightKg: number | null, x: number, y = 0.3): WeightUnitInput => ({
  id,
  positionId: 'p',
  weightKg,
  at: { x, y },
});

describe('weight per position', () => {
  it('adds the allowance per unit to the units’ own weights, and gives kg per metre', () => {
    const [result] = positionWeights(
      [pipe(200)],
      [hung('a', 12, 1), hung('b', 8, 3), { ...hung('c', 5, 2), positionId: null }],
      1.5,
    );
    // By hand: 12 + 8 = 20 kg, 2 × 1.5 = 3 kg allowance, 23 kg in all over 4 m = 5.75 kg/m; 23 / 200 = 11.5 %.
    expect(result.unitIds).toEqual(['a', 'b']);
    expect(result.unitsKg).toBe(20);
    expect(result.allowanceKg).toBe(3);
    expect(result.totalKg).toBe(23);
    expect(result.kgPerM).toBeCloseTo(5.75, 12);
    expect(result.ratedKgPerM).toBeCloseTo(50, 12);
    expect(result.ratingPct).toBeCloseTo(11.5, 12);
    expect(result.flag).toBe('ok');
  });

  it('counts units of unknown weight as 0 kg plus the allowance, and names them', () => {
    const [result] = positionWeights(
      [pipe(null)],
      [hung('a', null, 1), hung('b', 0, 2), hung('c', 10, 3)],
      1,
    );
    expect(result.totalKg).toBe(13);
    expect(result.unknownWeightUnitIds).toEqual(['a', 'b']);
    expect(result.flag).toBe('no-rating');
    expect(result.ratingPct).toBeNull();
  });

  it('total exactly at the rating is within it; above it is over (point rating: one total)', () => {
    const at = positionWeights([pipe(50, 'point')], [hung('a', 24, 2), hung('b', 24, 2)], 1)[0];
    expect(at.totalKg).toBe(50);
    expect(at.flag).toBe('ok');
    const over = positionWeights([pipe(50, 'point')], [hung('a', 24, 2), hung('b', 24.01, 2)], 1)[0];
    expect(over.flag).toBe('over-rating');
    // A point rating is not checked for bunching.
    expect(over.peakMomentKgM).toBeNull();
  });

  it('a point position is checked as one total, with no length', () => {
    const [result] = positionWeights(
      [
        {
          id: 'p',
          name: 'Stand',
          ratedLoadKg: 30,
          loadKind: 'uniform',
          shape: { kind: 'point', at: { x: 0, y: 0 } },
        },
      ],
      [hung('a', 29, 0)],
      1,
    );
    expect(result.lengthM).toBeNull();
    expect(result.kgPerM).toBeNull();
    expect(result.flag).toBe('ok');
  });
});

describe('bunching on a uniformly rated run (bending moment of a simple span, textbook beam formulas)', () => {
  it('one load at mid-span: M = P·L/4 (simply supported beam, central point load)', () => {
    expect(peakMomentKgM([{ offsetM: 2, kg: 10 }], 4)).toBeCloseTo(10, 12);
  });

  it('two equal loads at the third points: M = P·L/3 (simply supported beam, two symmetric loads)', () => {
    expect(
      peakMomentKgM(
        [
          { offsetM: 2, kg: 9 },
          { offsetM: 4, kg: 9 },
        ],
        6,
      ),
    ).toBeCloseTo(18, 12);
  });

  it('an off-centre load: M = P·a·b/L under it (simply supported beam)', () => {
    // 12 kg at 1 m on a 4 m span: 12 · 1 · 3 / 4 = 9 kg·m.
    expect(peakMomentKgM([{ offsetM: 1, kg: 12 }], 4)).toBeCloseTo(9, 12);
  });

  it('a mid-span load of exactly half the uniform rating is at the limit (P·L/4 = W·L/8); more is flagged', () => {
    // 4 m pipe rated 100 kg spread evenly: W·L/8 = 50 kg·m. One unit 49 kg + 1 kg allowance at mid-span: 50 kg·m.
    const at = positionWeights([pipe(100)], [hung('a', 49, 2)], 1)[0];
    expect(at.ratedMomentKgM).toBeCloseTo(50, 12);
    expect(at.peakMomentKgM).toBeCloseTo(50, 12);
    expect(at.flag).toBe('ok');
    const over = positionWeights([pipe(100)], [hung('a', 49.01, 2)], 1)[0];
    expect(over.flag).toBe('bunched');
    // The same weight spread out as four units at 0.5, 1.5, 2.5, 3.5 m is fine: by hand the moment at 1.5 m
    // is R·1.5 − 12.5·1 = 25·1.5 − 12.5 = 25 kg·m.
    const spread = positionWeights(
      [pipe(100)],
      [hung('a', 11.5, 0.5), hung('b', 11.5, 1.5), hung('c', 11.5, 2.5), hung('d', 11.5, 3.5)],
      1,
    )[0];
    expect(spread.peakMomentKgM).toBeCloseTo(25, 12);
    expect(spread.flag).toBe('ok');
  });

  it('units past the ends of the run are placed at its ends (no moment there)', () => {
    const [result] = positionWeights([pipe(100)], [hung('a', 40, -1), hung('b', 40, 9)], 1);
    expect(result.peakMomentKgM).toBeCloseTo(0, 12);
    expect(result.flag).toBe('ok');
  });
});
