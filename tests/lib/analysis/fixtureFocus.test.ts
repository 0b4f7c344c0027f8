import { describe, expect, it } from 'vitest';
import { type RigFixture, fixtureFocus, fixtureIlluminanceLx, subjectFaceLight } from '@/lib/analysis';
import { discSourceIlluminanceLx, spreadDiameterM } from '@/lib/photometry';
import { vec3 } from '@/lib/geometry';

const roundUnit: RigFixture = {
  id: 'a',
  mount: vec3(0, 0, 6),
  focus: vec3(0, -6, 0),
  source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 }, peakCd: 10000 },
};

describe('fixtureFocus', () => {
  it('gives the REFERENCE-CHECKS §3 worked pool on the floor', () => {
    const focus = fixtureFocus(roundUnit, 0);
    expect(focus.aim?.throwM).toBeCloseTo(8.485281, 6);
    expect(focus.beamPool?.nearM).toBeCloseTo(3.749216, 6);
    expect(focus.beamPool?.farM).toBeCloseTo(9.602007, 6);
    expect(focus.centreLx).toBeCloseTo(10000 / 72, 9); // I/d², d² = 72 m²
  });

  it('an oval with equal axes gives the round pool (numerical outline within 0.2 %)', () => {
    const oval: RigFixture = {
      ...roundUnit,
      source: {
        kind: 'beam',
        peakCd: 10000,
        spread: {
          kind: 'oval',
          beamAngleXDeg: 26,
          fieldAngleXDeg: 40,
          beamAngleYDeg: 26,
          fieldAngleYDeg: 40,
          rotationDeg: 30,
        },
      },
    };
    const round = fixtureFocus(roundUnit, 0).beamPool;
    const measured = fixtureFocus(oval, 0).beamPool;
    expect(measured?.nearM).toBeCloseTo(round?.nearM ?? 0, 2);
    expect((measured?.areaM2 ?? 0) / (round?.areaM2 ?? 1)).toBeGreaterThan(0.998);
    expect((measured?.areaM2 ?? 0) / (round?.areaM2 ?? 1)).toBeLessThanOrEqual(1);
  });

  it('an oval straight down spans 2·h·tan of each half-angle on the floor', () => {
    const oval: RigFixture = {
      id: 'o',
      mount: vec3(0, 0, 5),
      focus: vec3(0, 0, 0),
      source: {
        kind: 'beam',
        peakCd: 1000,
        spread: {
          kind: 'oval',
          beamAngleXDeg: 40,
          fieldAngleXDeg: 60,
          beamAngleYDeg: 12,
          fieldAngleYDeg: 20,
          rotationDeg: 0,
        },
      },
    };
    const focus = fixtureFocus(oval, 0);
    expect(focus.beamDiameterM).toBeCloseTo(spreadDiameterM(5, 40), 12);
    expect(focus.beamDiameterCrossM).toBeCloseTo(spreadDiameterM(5, 12), 12);
    const spans = [focus.beamPool?.lengthM ?? 0, focus.beamPool?.widthM ?? 0].sort((a, b) => a - b);
    expect(spans[0]).toBeCloseTo(spreadDiameterM(5, 12), 3);
    expect(spans[1]).toBeCloseTo(spreadDiameterM(5, 40), 3);
  });

  it('a soft source has no beam edge but a centre level from its area integral', () => {
    const soft: RigFixture = {
      id: 's',
      mount: vec3(0, 0, 1.6),
      focus: vec3(0, -2, 1.6),
      source: { kind: 'soft', shape: { kind: 'disc', radiusM: 0.5 }, luminanceCdPerM2: 3000 },
    };
    const focus = fixtureFocus(soft, 1.6);
    expect(focus.beamPool).toBeNull();
    expect(focus.centreLx).toBeCloseTo(discSourceIlluminanceLx(3000, 0.5, 2), 6); // π·L·r²/(r²+d²)
  });

  it('zero throw gives a problem and no figures, never NaN', () => {
    const stuck = { ...roundUnit, focus: roundUnit.mount };
    const focus = fixtureFocus(stuck, 0);
    expect(focus.problem).toMatch(/zero throw/);
    expect(focus.centreLx).toBeNull();
    expect(fixtureIlluminanceLx(stuck, vec3(0, 0, 0), vec3(0, 0, 1))).toBe(0);
  });
});

describe('subjectFaceLight', () => {
  const subject = { id: 'p', mark: { x: 0, y: 0 }, faceHeightM: 1.6, facingDeg: 0 };
  const frontUnit: RigFixture = {
    id: 'front',
    mount: vec3(0, -4, 5.6),
    focus: vec3(0, 0, 1.6),
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 }, peakCd: 32000 },
  };
  const backUnit: RigFixture = { ...frontUnit, id: 'back', mount: vec3(0, 4, 5.6) };

  it('a front unit at 45° on a face turned to the house: I·cos45°/d² = 32 000 × 0.7071 / 32 = 707.1 lx', () => {
    const light = subjectFaceLight(subject, vec3(0, -10, 1.2), [frontUnit, backUnit]);
    expect(light.sources[0]).toEqual({ fixtureId: 'front', faceLx: expect.closeTo(707.107, 3) });
    expect(light.sources[1]).toEqual({ fixtureId: 'back', faceLx: 0 }); // behind the face: 0, not negative
    expect(light.judgedToward).toBe('viewpoint');
  });

  it('without a viewpoint the face is judged along the subject’s facing', () => {
    const turned = { ...subject, facingDeg: 180 }; // facing upstage
    const light = subjectFaceLight(turned, null, [frontUnit, backUnit]);
    expect(light.judgedToward).toBe('facing');
    expect(light.sources[0].fixtureId).toBe('back');
  });
});

describe('fixtureFocus: a unit hanging at focus-plane height', () => {
  it('reports its pools as lying in the plane, not as a fault', () => {
    const level = fixtureFocus({ ...roundUnit, mount: vec3(0, 0, 1.6), focus: vec3(0, -3, 1.6) }, 1.6);
    expect(level.problem).toBeNull();
    expect(level.beamPool?.state).toBe('apex-on-plane');
    expect(level.centreLx).toBeCloseTo(10000 / 9, 9);
  });
});
