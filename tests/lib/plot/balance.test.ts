import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { subjectLighting } from '@/lib/analysis';
import {
  balanceDocument,
  cameraNeedsLx,
  createPlotStore,
  defaultBalanceUnits,
  keyTargetLx,
  loadPlotText,
  mainViewpointPosition,
  resolveRig,
  setLevels,
  setRoleOverride,
  subjectExposure,
  type PlotDocument,
} from '@/lib/plot';
import { keyOverFillFromLightingRatio } from '@/lib/units';

function interview(): PlotDocument {
  const loaded = loadPlotText(readFileSync('public/demo/interview.json', 'utf8'));
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  return loaded.document;
}

function hostLighting(document: PlotDocument) {
  const host = document.subjects.find((person) => person.id === 'sub-host');
  if (!host) throw new Error('no host');
  return subjectLighting(host, mainViewpointPosition(document), resolveRig(document), host.roleOverrides);
}

describe('balancing the interview demo', () => {
  it('the camera target is what the camera needs: ISO 2720, 250·4²/((1/50)·800) = 250 lx for Cam A', () => {
    const document = interview();
    expect(keyTargetLx(document, { kind: 'camera', viewpointId: 'vp-cam-a' })).toBeCloseTo(250, 9);
    expect(keyTargetLx(document, { kind: 'camera', viewpointId: 'nobody' })).toBeNull();
    expect(keyTargetLx(document, { kind: 'lux', lx: -3 })).toBeNull();
  });

  it('the host, 2:1 at the camera’s exposure after the host fill is called fill: key 0 stops, key = fill, one undo', () => {
    const store = createPlotStore(interview());
    // By the rule the host's fill frame, on the key's side of the camera, counts as key.
    expect(hostLighting(store.getDocument()).sources.find((s) => s.fixtureId === 'fx-2')?.role).toBe('key');
    store.dispatch(setRoleOverride, { subjectId: 'sub-host', fixtureId: 'fx-2', role: 'fill' });
    const before = store.getDocument();
    const mayChange = defaultBalanceUnits(before, ['sub-host']);
    // Key, fill and back units on the host that light it: the keys, the fills and the host back light.
    expect(mayChange).toEqual(expect.arrayContaining(['fx-1', 'fx-2', 'fx-3', 'fx-4', 'fx-5']));
    const solved = balanceDocument(before, {
      subjectIds: ['sub-host'],
      key: { kind: 'camera', viewpointId: 'vp-cam-a' },
      keyOverFill: keyOverFillFromLightingRatio(2),
      backOverKeyStops: null,
      mayChange,
    });
    if (!solved.ok) throw new Error(solved.reason);
    expect(solved.result.allMet).toBe(true);
    for (const level of Object.values(solved.result.levels)) {
      expect(level).toBeGreaterThanOrEqual(0);
      expect(level).toBeLessThanOrEqual(100);
    }
    store.dispatch(setLevels, { levels: solved.result.levels, label: 'Balance 1 subject' });
    const after = hostLighting(store.getDocument());
    const camera = store.getDocument().viewpoints.find((view) => view.id === 'vp-cam-a')?.camera;
    if (!camera) throw new Error('no camera');
    // Within 0.05 stops (levels rounded to 0.1 %).
    expect(Math.abs(subjectExposure(camera, after.keyLx).keyStops ?? 99)).toBeLessThan(0.05);
    expect(after.keyLx).toBeCloseTo(cameraNeedsLx(camera), -1);
    expect(Math.abs(after.keyToFillStops ?? 99)).toBeLessThan(0.05);
    expect(after.lightingRatio).toBeCloseTo(2, 1);
    // The chosen level set follows; one undo puts every level back.
    expect(store.getDocument().levelSets[0].levels['fx-1']).toBe(solved.result.levels['fx-1']);
    store.undo();
    expect(store.getDocument().fixtures.map((unit) => unit.levelPct)).toEqual(
      before.fixtures.map((unit) => unit.levelPct),
    );
  });

  it('an impossible key says so, keeps every level at or under 100 %, and names the throw that would do', () => {
    const document = interview();
    const solved = balanceDocument(document, {
      subjectIds: ['sub-host', 'sub-guest'],
      key: { kind: 'lux', lx: 5000 },
      keyOverFill: null,
      backOverKeyStops: null,
      mayChange: ['fx-1', 'fx-4'],
    });
    if (!solved.ok) throw new Error(solved.reason);
    expect(solved.result.allMet).toBe(false);
    expect(solved.result.levels).toEqual({ 'fx-1': 100, 'fx-4': 100 });
    const key = solved.result.subjects[0].targets[0];
    expect(key.reason).toEqual({ kind: 'atFull' });
    for (const advice of key.advice) {
      // Inverse square: d·√(E_now/E_needed).
      expect(advice.throwNeededM).toBeCloseTo(
        advice.throwNowM * Math.sqrt(advice.givesLx / advice.needsLx),
        9,
      );
      // Soft boxes: no beam to narrow.
      expect(advice.beam).toBeNull();
    }
  });

  it('incomplete choices give a reason, not a result', () => {
    const document = interview();
    const choice = {
      subjectIds: [] as string[],
      key: { kind: 'lux', lx: 300 } as const,
      keyOverFill: 1,
      backOverKeyStops: null,
      mayChange: [],
    };
    expect(balanceDocument(document, choice)).toEqual({ ok: false, reason: 'Choose at least one subject.' });
    expect(balanceDocument(document, { ...choice, subjectIds: ['sub-host'], keyOverFill: 0 }).ok).toBe(false);
  });
});
