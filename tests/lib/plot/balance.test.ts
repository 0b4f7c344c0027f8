import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { subjectLighting } from '@/lib/analysis';
import {
  balanceDocument,
  balanceRolePins,
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
import { expectUndoableChange } from './commandHarness';
import { twoKeysOneFill } from './twoKeysOneFill';

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
    expect(key.advice.length).toBeGreaterThan(0);
    // The throw itself is checked against hand-worked numbers in tests/lib/analysis/balance.test.ts
    // (5·√(400/900) = 3.333 m); here only that the soft boxes get no beam to narrow.
    for (const advice of key.advice) expect(advice.beam).toBeNull();
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
    // Key below fill (e.g. 1.5:1, key = 0.5 × fill) is refused: the key is the brighter side by definition.
    expect(balanceDocument(document, { ...choice, subjectIds: ['sub-host'], keyOverFill: 0.5 })).toEqual({
      ok: false,
      reason: expect.stringContaining('the key is the brighter side by definition'),
    });
  });
});

function adaLighting(document: PlotDocument) {
  const ada = document.subjects[0];
  return subjectLighting(ada, mainViewpointPosition(document), resolveRig(document), ada.roleOverrides);
}

describe('applying a balance keeps the roles it used', () => {
  const choice = {
    subjectIds: ['sub-1'],
    key: { kind: 'lux', lx: 512 } as const,
    keyOverFill: keyOverFillFromLightingRatio(2),
    backOverKeyStops: null,
    mayChange: ['k1', 'k2', 'f'],
  };

  it('the roles before: K1 and K2 key, F fill (K1 640 lx is the brightest front unit)', () => {
    const roles = Object.fromEntries(adaLighting(twoKeysOneFill()).sources.map((s) => [s.fixtureId, s.role]));
    expect(roles).toEqual({ k1: 'key', k2: 'key', f: 'fill' });
  });

  it('two key units and one fill at 2:1: after Apply the panel shows the promised key and fill with the same roles', () => {
    const document = twoKeysOneFill();
    const solved = balanceDocument(document, choice);
    if (!solved.ok) throw new Error(solved.reason);
    const { result } = solved;
    expect(result.allMet).toBe(true);
    expect(result.subjects[0].roles).toMatchObject({ k1: 'key', k2: 'key', f: 'fill' });
    // F alone carries the fill: 512/640 = 80 %.
    expect(result.levels.f).toBeCloseTo(80, 9);
    // K1 and K2 share the key (640·a + 480·b = 512 lx), both lit, so each gives less than F's 512 lx.
    expect(result.levels.k1).toBeGreaterThan(0);
    expect(result.levels.k2).toBeGreaterThan(0);
    expect((640 * result.levels.k1) / 100 + (480 * result.levels.k2) / 100).toBeCloseTo(512, -1);

    // Control: levels alone, and the rule calls F the key at the new levels.
    const levelsOnly = createPlotStore(document);
    levelsOnly.dispatch(setLevels, { levels: result.levels });
    const flipped = adaLighting(levelsOnly.getDocument());
    expect(flipped.sources.find((source) => source.fixtureId === 'f')?.role).toBe('key');

    // The pins: every unit whose rule role would change, kept as the solve used it.
    const pins = balanceRolePins(document, result);
    expect(pins).toEqual([
      { subjectId: 'sub-1', fixtureId: 'k1', role: 'key' },
      { subjectId: 'sub-1', fixtureId: 'k2', role: 'key' },
      { subjectId: 'sub-1', fixtureId: 'f', role: 'fill' },
    ]);

    // Through the store, as the panel's Apply does it: one undo step for levels and roles.
    const store = createPlotStore(document);
    expect(store.dispatch(setLevels, { levels: result.levels, roles: pins })).toEqual({
      ok: true,
      changed: true,
    });
    const after = adaLighting(store.getDocument());
    expect(Object.fromEntries(after.sources.map((source) => [source.fixtureId, source.role]))).toEqual({
      k1: 'key',
      k2: 'key',
      f: 'fill',
    });
    // Key 512 lx and fill 512 lx within 0.05 stops (levels rounded to 0.1 %): key = fill, 2:1.
    expect(Math.abs(Math.log2(after.keyLx / 512))).toBeLessThan(0.05);
    expect(Math.abs(Math.log2(after.fillLx / 512))).toBeLessThan(0.05);
    expect(after.keyLx).toBeCloseTo(result.subjects[0].keyLx, 9);
    expect(after.fillLx).toBeCloseTo(result.subjects[0].fillLx, 9);
    expect(Math.abs(after.keyToFillStops ?? 99)).toBeLessThan(0.05);
    expect(after.lightingRatio).toBeCloseTo(2, 1);
    expect(store.undo()).toBe(true);
    expect(store.getDocument()).toEqual(document);
    expect(store.canUndo()).toBe(false);
  });

  it('no pins where the rule keeps the roles at the new levels (4:1: the key side stays the brighter)', () => {
    // 4:1 at 512 lx: fill 512/3 = 170.7 lx from F alone; K1 + K2 give 512 lx, so one of them gives at
    // least 256 lx, more than F: the brightest front unit stays on the key side and no role changes.
    const document = twoKeysOneFill();
    const solved = balanceDocument(document, { ...choice, keyOverFill: keyOverFillFromLightingRatio(4) });
    if (!solved.ok) throw new Error(solved.reason);
    expect(solved.result.allMet).toBe(true);
    expect(balanceRolePins(document, solved.result)).toEqual([]);
  });

  it('setLevels with roles is one undo step', () => {
    const changed = expectUndoableChange(twoKeysOneFill(), setLevels, {
      levels: { f: 93.8 },
      roles: [{ subjectId: 'sub-1', fixtureId: 'f', role: 'fill' }],
    });
    expect(changed.fixtures.find((item) => item.id === 'f')?.levelPct).toBe(93.8);
    expect(changed.subjects[0].roleOverrides).toEqual({ f: 'fill' });
  });
});
