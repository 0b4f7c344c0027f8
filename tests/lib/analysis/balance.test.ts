import { describe, expect, it } from 'vitest';
import { type BalanceUnit, type RigFixture, narrowingForGain, solveBalance } from '@/lib/analysis';
import { type Vec3, vec3 } from '@/lib/geometry';
import { peakCandelaFromLumens } from '@/lib/photometry';
import { keyOverFillFromLightingRatio, keyOverFillFromStops, parseRatioText } from '@/lib/units';

const subject = { id: 'p', mark: { x: 0, y: 0 }, faceHeightM: 1.7, facingDeg: 0 };
const placement = { placement: subject, roleOverrides: {} };
const face = vec3(0, 0, 1.7);
const house = vec3(0, -12, 1.7);

function unitAt(
  id: string,
  mount: Vec3,
  peakCdAtFull: number,
  levelPct: number,
  extra: Partial<BalanceUnit> = {},
): BalanceUnit {
  const atFull: RigFixture = {
    id,
    mount,
    focus: face,
    source: {
      kind: 'beam',
      spread: { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 },
      peakCd: peakCdAtFull,
    },
  };
  return {
    atFull,
    levelPct,
    dimmingCurve: 'linear',
    mayChange: true,
    beamSpread: { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 },
    ...extra,
  };
}

// 45° either side of the viewing axis, level with the face, 5 m away: E = I·cos 45°/25 on the face.
const side = 5 / Math.SQRT2;
const keyUnit = (level = 50) => unitAt('key', vec3(-side, -side, 1.7), 10000, level);
const fillUnit = (level = 50) => unitAt('fill', vec3(side, -side, 1.7), 8000, level);
const backUnit = (level = 50) => unitAt('back', vec3(0, 5, 1.7), 10000, level);

describe('balancing levels', () => {
  it('one key unit on the axis, linear dimming: level = target / light at full (100 / 400 = 25 %)', () => {
    // 10 000 cd at 5 m straight in front, square to the face: 400 lx at full (inverse square, by hand).
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [unitAt('front', vec3(0, -5, 1.7), 10000, 60)],
      keyLx: 100,
      keyOverFill: null,
      backOverKeyStops: null,
    });
    expect(result.levels).toEqual({ front: 25 });
    expect(result.subjects[0].keyLx).toBeCloseTo(100, 6);
    expect(result.allMet).toBe(true);
    expect(result.worstStops).toBeCloseTo(0, 6);
  });

  it('square-law dimming: the same light needs level = 100·√0.25 = 50 %', () => {
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [unitAt('front', vec3(0, -5, 1.7), 10000, 0, { dimmingCurve: 'square' })],
      keyLx: 100,
      keyOverFill: null,
      backOverKeyStops: null,
    });
    expect(result.levels.front).toBeCloseTo(50, 9);
  });

  it('key, fill and back: each level by hand; 2:1 lighting ratio is key = fill (one stop lit to shaded side)', () => {
    // At full: key 10 000·cos45°/25 = 282.84 lx, fill 8000·cos45°/25 = 226.27 lx on the face; back
    // 10 000/25 = 400 lx on the back of the head. Targets: key 200, fill 200 (2:1), back 100 (−1 stop: 200/2).
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [keyUnit(), fillUnit(), backUnit()],
      keyLx: 200,
      keyOverFill: keyOverFillFromLightingRatio(2),
      backOverKeyStops: -1,
    });
    // Levels rounded to 0.1 %: 200/282.84 = 70.71 %, 200/226.27 = 88.39 %, 100/400 = 25 %.
    expect(result.levels.key).toBeCloseTo(70.7, 9);
    expect(result.levels.fill).toBeCloseTo(88.4, 9);
    expect(result.levels.back).toBeCloseTo(25, 9);
    const lit = result.subjects[0];
    expect(lit.roles).toMatchObject({ key: 'key', fill: 'fill', back: 'back' });
    expect(lit.keyLx).toBeCloseTo(0.707 * 282.843, 1);
    expect(lit.lightingRatio).toBeCloseTo(2, 2);
    expect(Math.log2(lit.lightingRatio ?? 0)).toBeCloseTo(1, 2);
    expect(lit.backToKeyStops).toBeCloseTo(-1, 2);
    expect(result.allMet).toBe(true);
  });

  it('a unit that may not change keeps its level and its light counts as given', () => {
    // Fill fixed at 50 %: 8000·cos45°/25·0.5 = 113.14 lx. Key = fill wanted at 200 lx: the fill row
    // misses (113 of 200 lx) and no fill unit may change.
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [keyUnit(), { ...fillUnit(), mayChange: false }],
      keyLx: 200,
      keyOverFill: 1,
      backOverKeyStops: null,
    });
    expect(Object.keys(result.levels)).toEqual(['key']);
    const fill = result.subjects[0].targets.find((target) => target.role === 'fill');
    expect(fill?.resultLx).toBeCloseTo(113.137, 2);
    expect(fill?.met).toBe(false);
    expect(fill?.reason).toEqual({ kind: 'noneMayChange' });
  });

  it('a role set by hand changes the sums: calling the fill unit "key" puts both in the key row', () => {
    // Both key: 282.84·x + 226.27·y = 200 with the pull toward the levels now (50 %, 50 %): any split
    // meets it; the sum is checked.
    const result = solveBalance({
      subjects: [{ placement: subject, roleOverrides: { fill: 'key' } }],
      viewpoint: house,
      units: [keyUnit(), fillUnit()],
      keyLx: 200,
      keyOverFill: null,
      backOverKeyStops: null,
    });
    expect(result.subjects[0].roles.fill).toBe('key');
    expect(result.subjects[0].fillLx).toBe(0);
    expect(result.subjects[0].keyLx).toBeCloseTo(200, 0);
  });

  it('an unreachable key: never above 100 %, and the throw and beam that would reach it', () => {
    // 10 000 cd at 5 m on axis gives 400 lx at full; 900 lx wanted.
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [unitAt('front', vec3(0, -5, 1.7), 10000, 60)],
      keyLx: 900,
      keyOverFill: null,
      backOverKeyStops: null,
    });
    expect(result.levels.front).toBe(100);
    const key = result.subjects[0].targets[0];
    expect(key.met).toBe(false);
    expect(key.reason).toEqual({ kind: 'atFull' });
    expect(key.offStops).toBeCloseTo(Math.log2(400 / 900), 6);
    const advice = key.advice[0];
    expect(advice.givesLx).toBeCloseTo(400, 6);
    expect(advice.needsLx).toBeCloseTo(900, 6);
    // Inverse square by hand: d·√(E/E_t) = 5·√(400/900) = 3.333 m.
    expect(advice.throwNowM).toBeCloseTo(5, 9);
    expect(advice.throwNeededM).toBeCloseTo(10 / 3, 6);
    // Same lumens, 2.25 × the peak: small-angle solid angle ∝ angle², so about 20°/1.5 = 13.3°.
    expect(advice.beam?.beamNeededDeg).toBeCloseTo(13.33, 0);
    // Checked through the flux formula: the peak at the new angles is 2.25 × the peak now (±0.1 %).
    const lumens = 1000;
    const gain =
      peakCandelaFromLumens(lumens, advice.beam?.beamNeededDeg ?? 0, advice.beam?.fieldNeededDeg ?? 0) /
      peakCandelaFromLumens(lumens, 20, 30);
    expect(gain).toBeCloseTo(2.25, 2);
    expect((advice.beam?.fieldNeededDeg ?? 0) / (advice.beam?.beamNeededDeg ?? 1)).toBeCloseTo(1.5, 9);
  });

  it('a key out of reach keeps the ratio: fill follows the key the units can give (3:1 → fill = key/2)', () => {
    // Key unit at full: 282.84 lx; 400 lx wanted. Fill then balances to 282.84/2 = 141.42 lx, which the
    // fill unit (226.27 lx at full) gives at 141.42/226.27 = 62.5 % (by hand), not the 88.4 % that
    // 400/2 = 200 lx would need.
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [keyUnit(), fillUnit()],
      keyLx: 400,
      keyOverFill: keyOverFillFromLightingRatio(3),
      backOverKeyStops: null,
    });
    expect(result.levels.key).toBe(100);
    expect(result.levels.fill).toBeCloseTo(62.5, 9);
    const lit = result.subjects[0];
    expect(lit.keyOutOfReach).toBe(true);
    expect(lit.lightingRatio).toBeCloseTo(3, 2);
    const [key, fill] = lit.targets;
    expect(key).toMatchObject({ role: 'key', targetLx: 400, met: false, reason: { kind: 'atFull' } });
    expect(key.offStops).toBeCloseTo(Math.log2(282.843 / 400), 4);
    expect(fill).toMatchObject({ role: 'fill', met: true });
    expect(fill.targetLx).toBeCloseTo(141.421, 2);
    // The advice takes the whole shortfall on the key unit: 5·√(282.84/400) = 4.204 m.
    expect(key.advice[0].throwNeededM).toBeCloseTo(5 * Math.sqrt(282.8427 / 400), 4);
  });

  it('soft and measured sources get the throw advice only', () => {
    const soft: BalanceUnit = {
      ...unitAt('soft', vec3(0, -5, 1.7), 0, 100),
      atFull: {
        id: 'soft',
        mount: vec3(0, -5, 1.7),
        focus: face,
        source: { kind: 'soft', shape: { kind: 'disc', radiusM: 0.2 }, luminanceCdPerM2: 10000 },
      },
      beamSpread: null,
    };
    const result = solveBalance({
      subjects: [placement],
      viewpoint: house,
      units: [soft],
      keyLx: 1000,
      keyOverFill: null,
      backOverKeyStops: null,
    });
    const advice = result.subjects[0].targets[0].advice[0];
    expect(advice.beam).toBeNull();
    // A lambertian disc facing the face on its axis: E = π·L·r²/(r² + h²) (the disc's closed form) =
    // π·10 000·0.04/25.04 = 50.184 lx at full; inverse square from there: 5·√(50.184/1000) = 1.1201 m.
    expect(advice.givesLx).toBeCloseTo(50.184, 2);
    expect(advice.throwNowM).toBeCloseTo(5, 9);
    expect(advice.throwNeededM).toBeCloseTo(1.1201, 3);
  });

  it('narrowing for a gain of 1 keeps the beam; an impossible gain says so', () => {
    expect(narrowingForGain({ kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 }, 1)).toBe(1);
    expect(narrowingForGain({ kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 }, 1e9)).toBeNull();
  });
});

describe('ratios as users give them', () => {
  it('photographic lighting ratio 2:1 is key = fill, one stop between the lit and shaded sides (REFERENCE-CHECKS §6, common practice)', () => {
    expect(keyOverFillFromLightingRatio(2)).toBe(1);
    expect(Math.log2(2)).toBe(1);
    // 3:1 means key = 2 × fill (1.585 stops).
    expect(keyOverFillFromLightingRatio(3)).toBe(2);
    expect(keyOverFillFromLightingRatio(1)).toBeNull();
  });

  it('below 2:1 the fill would outshine the key, so it is refused: the key is the brighter side by definition', () => {
    // 1.5:1 would be key = 0.5 × fill (common practice: key ≥ fill, 2:1 is the even light).
    expect(keyOverFillFromLightingRatio(1.5)).toBeNull();
    expect(keyOverFillFromLightingRatio(1.99)).toBeNull();
    expect(keyOverFillFromLightingRatio(Number.NaN)).toBeNull();
    expect(keyOverFillFromStops(-0.5)).toBeNull();
    expect(() =>
      solveBalance({
        subjects: [placement],
        viewpoint: house,
        units: [keyUnit(), fillUnit()],
        keyLx: 200,
        keyOverFill: 0.5,
        backOverKeyStops: null,
      }),
    ).toThrow(/key over fill must be 1 or more/);
  });

  it('key:fill in stops: 1 stop is key = 2 × fill', () => {
    expect(keyOverFillFromStops(1)).toBe(2);
    expect(keyOverFillFromStops(0)).toBe(1);
  });

  it('reads ratio text', () => {
    expect(parseRatioText('2:1')).toBe(2);
    expect(parseRatioText(' 3 : 2 ')).toBe(1.5);
    expect(parseRatioText('4')).toBe(4);
    expect(parseRatioText('2:0')).toBeNull();
    expect(parseRatioText('two')).toBeNull();
  });
});
