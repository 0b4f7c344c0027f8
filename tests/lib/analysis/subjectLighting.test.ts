import { describe, expect, it } from 'vitest';
import { type RigFixture, subjectLighting } from '@/lib/analysis';
import { type Vec3, vec3 } from '@/lib/geometry';

const subject = { id: 'p', mark: { x: 0, y: 0 }, faceHeightM: 1.7, facingDeg: 0 };
const face = vec3(0, 0, 1.7);
const house = vec3(0, -12, 1.7);

function aimedAtFace(id: string, mount: Vec3, peakCd: number): RigFixture {
  return {
    id,
    mount,
    focus: face,
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 }, peakCd },
  };
}

describe('light on a subject and the roles of its sources', () => {
  // REFERENCE-CHECKS §11 [DER]: two 20 000 cd units 45° up and 45° either side of the centre line,
  // throw 8.4853 m: 138.89 lx each on the face toward the audience.
  const offset = 4.242641;
  const pair = [
    aimedAtFace('sr', vec3(-offset, -offset, 7.7), 20000),
    aimedAtFace('sl', vec3(offset, -offset, 7.7), 20000),
  ];

  it('the 45°/45° pair gives 277.78 lx on the face, one key and one fill, a 2:1 lighting ratio (1 stop)', () => {
    const light = subjectLighting(subject, house, pair);
    expect(light.totals.faceLx).toBeCloseTo(277.78, 2);
    expect(light.sources.map((source) => source.role).sort()).toEqual(['fill', 'key']);
    expect(light.keyToFillStops).toBeCloseTo(0, 9);
    // Photographers' (key + fill) : fill with key = fill is 2:1 (REFERENCE-CHECKS §6, common practice).
    expect(light.lightingRatio).toBeCloseTo(2, 9);
    // Each unit is 45° to one side: azimuth ±45°, elevation 45°.
    expect(light.sources.map((source) => Math.abs(source.azimuthDeg))).toEqual([
      expect.closeTo(45, 6),
      expect.closeTo(45, 6),
    ]);
    expect(light.sources[0].elevationDeg).toBeCloseTo(45, 4); // 4.242 641 m offsets: 45° to 1e-5
  });

  it("a user's role replaces the rule's, and the key and fill sums follow it", () => {
    // The pair alone: 138.89 lx each (REFERENCE-CHECKS §11 [DER]); the rule makes one key, one fill.
    const byRule = subjectLighting(subject, house, pair);
    const ruleFill = byRule.sources.find((source) => source.role === 'fill');
    if (!ruleFill) throw new Error('the rule gave no fill');
    expect(byRule.sources.every((source) => !source.overridden)).toBe(true);
    // Calling the rule's fill "key" puts both on the key side: key 277.78 lx, fill 0 (by hand: 2 × 138.89).
    const bothKey = subjectLighting(subject, house, pair, { [ruleFill.fixtureId]: 'key' });
    expect(bothKey.keyLx).toBeCloseTo(277.78, 2);
    expect(bothKey.fillLx).toBe(0);
    expect(bothKey.keyToFillStops).toBeNull();
    const changed = bothKey.sources.find((source) => source.fixtureId === ruleFill.fixtureId);
    expect(changed).toMatchObject({ role: 'key', ruleRole: 'fill', overridden: true });
    // Calling it back light moves its light out of the face sums: back light is on the back of the head,
    // which a unit in front does not reach (0 lx).
    const asBack = subjectLighting(subject, house, pair, { [ruleFill.fixtureId]: 'back' });
    expect(asBack.keyLx).toBeCloseTo(138.89, 2);
    expect(asBack.fillLx).toBe(0);
    expect(asBack.backLightLx).toBe(0);
    // An override naming a unit that is not in the rig changes nothing.
    expect(subjectLighting(subject, house, pair, { ghost: 'fill' }).keyLx).toBeCloseTo(138.89, 2);
  });

  it('the side facing a unit gets more than the far side: the cheek turned to stage left is lit by the stage-left unit', () => {
    const light = subjectLighting(subject, house, [pair[1]]);
    // Viewer in the house looks upstage: their right is stage left (+x).
    expect(light.totals.rightLx).toBeGreaterThan(light.totals.leftLx);
    // Normal 45° toward stage left from the axis points straight at the unit in plan: cos i = cos 45° (elevation only).
    expect(light.totals.rightLx).toBeCloseTo((20000 / 72) * Math.cos(Math.PI / 4), 4);
  });

  // REFERENCE-CHECKS §2 [DER]: I = 1000 cd, d = 5 m, ε = 45°: E_z 9.003 163 lx, E_sz (α = 0) 18.006 326 lx.
  it('cylindrical and semi-cylindrical figures of a point source match the worked case', () => {
    const up = 5 / Math.SQRT2;
    const light = subjectLighting(subject, house, [aimedAtFace('front', vec3(0, -up, 1.7 + up), 1000)]);
    expect(light.totals.cylindricalLx).toBeCloseTo(9.003163, 6);
    expect(light.totals.semiCylindricalLx).toBeCloseTo(18.006326, 6);
  });

  it('a unit behind is back light: back:key in stops from the light on the back of the head', () => {
    const backUnit = aimedAtFace('back', vec3(0, 4, 5.7), 20000); // 45° up, straight behind: d² = 32
    const light = subjectLighting(subject, house, [...pair, backUnit]);
    const back = light.sources.find((source) => source.fixtureId === 'back');
    expect(back?.role).toBe('back');
    expect(Math.abs(back?.azimuthDeg ?? 0)).toBeCloseTo(180, 6);
    expect(light.backLightLx).toBeCloseTo((20000 / 32) * Math.cos(Math.PI / 4), 6); // 441.94 lx
    expect(light.backToKeyStops).toBeCloseTo(Math.log2(441.941738 / 138.888889), 4);
  });

  it('units straight above are top light; units square to the side are side light', () => {
    const light = subjectLighting(subject, house, [
      aimedAtFace('top', vec3(0, 0.3, 6.7), 20000),
      aimedAtFace('side', vec3(5, 0, 3.7), 20000),
    ]);
    expect(light.sources.find((source) => source.fixtureId === 'top')?.role).toBe('top');
    expect(light.sources.find((source) => source.fixtureId === 'side')?.role).toBe('side');
    expect(light.keyToFillStops).toBeNull();
    expect(light.lightingRatio).toBeNull();
  });

  it('a soft source far away gives the point-source cylindrical figure (Lambertian, I = L·A·cos θ)', () => {
    // A 0.2 m disc of 100 000 cd/m², 6 m away at 45°, facing the face: I = L·π·r² = 12 566 cd on axis.
    const up = 6 / Math.SQRT2;
    const soft: RigFixture = {
      id: 'soft',
      mount: vec3(0, -up, 1.7 + up),
      focus: face,
      source: { kind: 'soft', shape: { kind: 'disc', radiusM: 0.1 }, luminanceCdPerM2: 100000 },
    };
    const intensity = 100000 * Math.PI * 0.01;
    const expectedCylindrical = ((intensity / 36) * Math.sin(Math.PI / 4)) / Math.PI;
    const light = subjectLighting(subject, house, [soft]);
    expect(light.totals.cylindricalLx / expectedCylindrical).toBeCloseTo(1, 2);
    expect(light.totals.semiCylindricalLx / (2 * expectedCylindrical)).toBeCloseTo(1, 2);
  });

  it('a unit with zero throw gives nothing, never NaN', () => {
    const stuck: RigFixture = { ...pair[0], focus: pair[0].mount };
    const light = subjectLighting(subject, house, [stuck]);
    expect(Object.values(light.totals).every((value) => value === 0)).toBe(true);
  });
});
