import { describe, expect, it } from 'vitest';
import {
  chooseLevelSet,
  createPlotStore,
  deleteFixtures,
  deleteLevelSet,
  hangFixture,
  plotDocument,
  renameLevelSet,
  setFixtureLevel,
  setLevels,
  setRoleOverride,
  storeLevelSet,
} from '@/lib/plot';
import { expectRefused, expectUndoableChange } from './commandHarness';
import { tinyPlot } from './tinyPlot';

const unitId = tinyPlot().fixtures[0].id;

describe('level sets', () => {
  it('keeping the levels makes a set of every unit at its level and chooses it', () => {
    const changed = expectUndoableChange(tinyPlot(), storeLevelSet, { name: 'Scene 1', id: 'look-1' });
    expect(changed.levelSets).toEqual([{ id: 'look-1', name: 'Scene 1', levels: { [unitId]: 100 } }]);
    expect(changed.activeLevelSetId).toBe('look-1');
  });

  it('a level changed while a set is chosen is written into that set in the same undo step', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(storeLevelSet, { name: 'Scene 1', id: 'look-1' });
    store.dispatch(setFixtureLevel, { ids: [unitId], levelPct: 40 });
    expect(store.getDocument().levelSets[0].levels[unitId]).toBe(40);
    store.undo();
    expect(store.getDocument().levelSets[0].levels[unitId]).toBe(100);
    expect(store.getDocument().fixtures[0].levelPct).toBe(100);
  });

  it('choosing another set loads its levels; units it does not list go to 0 %', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(storeLevelSet, { name: 'Full', id: 'look-1' });
    store.dispatch(chooseLevelSet, { id: null });
    store.dispatch(setFixtureLevel, { ids: [unitId], levelPct: 30 });
    store.dispatch(storeLevelSet, { name: 'Low', id: 'look-2' });
    store.dispatch(hangFixture, {
      id: 'fx-new',
      typeId: 'type-profile',
      positionId: null,
      mount: { x: 0, y: 0, z: 5 },
      focus: { x: 0, y: 2, z: 1.6 },
    });
    // Hung while "Low" is chosen: it is recorded in Low at its level, and is not in Full.
    expect(store.getDocument().levelSets[1].levels['fx-new']).toBe(100);
    store.dispatch(chooseLevelSet, { id: 'look-1' });
    const document = store.getDocument();
    expect(document.fixtures.find((unit) => unit.id === unitId)?.levelPct).toBe(100);
    expect(document.fixtures.find((unit) => unit.id === 'fx-new')?.levelPct).toBe(0);
    expect(plotDocument.safeParse(document).success).toBe(true);
  });

  it('deleting a unit removes it from every set and every subject’s overrides', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(storeLevelSet, { name: 'Scene 1', id: 'look-1' });
    store.dispatch(setRoleOverride, { subjectId: 'sub-1', fixtureId: unitId, role: 'fill' });
    expect(store.getDocument().subjects[0].roleOverrides).toEqual({ [unitId]: 'fill' });
    store.dispatch(deleteFixtures, { ids: [unitId] });
    const document = store.getDocument();
    expect(document.levelSets[0].levels).toEqual({});
    expect(document.subjects[0].roleOverrides).toEqual({});
    expect(plotDocument.safeParse(document).success).toBe(true);
  });

  it('rename and delete; deleting the chosen set chooses none and keeps the levels', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(storeLevelSet, { name: 'Scene 1', id: 'look-1' });
    const renamed = expectUndoableChange(store.getDocument(), renameLevelSet, {
      id: 'look-1',
      name: 'Interview',
    });
    expect(renamed.levelSets[0].name).toBe('Interview');
    const deleted = expectUndoableChange(store.getDocument(), deleteLevelSet, { id: 'look-1' });
    expect(deleted.levelSets).toEqual([]);
    expect(deleted.activeLevelSetId).toBeNull();
    expect(deleted.fixtures[0].levelPct).toBe(100);
  });

  it('refuses an empty name, an unknown set, and a level over 100 % with the document unchanged', () => {
    expectRefused(tinyPlot(), storeLevelSet, { name: '  ' }, /level set name.*must not be empty/);
    expectRefused(tinyPlot(), chooseLevelSet, { id: 'look-9' }, /no level set with id "look-9"/);
    expectRefused(tinyPlot(), setLevels, { levels: { [unitId]: 120 } }, /levels\..*between 0 and 100/);
    expectRefused(tinyPlot(), setLevels, { levels: { 'fx-none': 20 } }, /no fixture with id "fx-none"/);
  });

  it('setting several levels is one undo step', () => {
    const changed = expectUndoableChange(tinyPlot(), setLevels, { levels: { [unitId]: 55.5 } });
    expect(changed.fixtures[0].levelPct).toBe(55.5);
  });

  it('levels with roles refuse an unknown subject, an unknown unit or a role that does not exist, changing nothing', () => {
    const roles = (subjectId: string, fixtureId: string, role: string) =>
      [{ subjectId, fixtureId, role }] as unknown as { subjectId: string; fixtureId: string; role: 'key' }[];
    const levels = { [unitId]: 40 };
    expectRefused(
      tinyPlot(),
      setLevels,
      { levels, roles: roles('sub-none', unitId, 'key') },
      /roles\[0\]\.subjectId: there is no subject with id "sub-none"/,
    );
    expectRefused(
      tinyPlot(),
      setLevels,
      { levels, roles: roles('sub-1', 'fx-none', 'key') },
      /roles\[0\]\.fixtureId: there is no fixture with id "fx-none"/,
    );
    expectRefused(
      tinyPlot(),
      setLevels,
      { levels, roles: roles('sub-1', unitId, 'rim') },
      /roles\[0\]\.role: must be one of key, fill, back, side, top/,
    );
  });

  it('levels with a role are one undo step: the level and the subject’s role together', () => {
    const changed = expectUndoableChange(tinyPlot(), setLevels, {
      levels: { [unitId]: 30 },
      roles: [{ subjectId: 'sub-1', fixtureId: unitId, role: 'fill' }],
    });
    expect(changed.fixtures[0].levelPct).toBe(30);
    expect(changed.subjects[0].roleOverrides).toEqual({ [unitId]: 'fill' });
  });

  it('a role override can be set and cleared', () => {
    const set = expectUndoableChange(tinyPlot(), setRoleOverride, {
      subjectId: 'sub-1',
      fixtureId: unitId,
      role: 'back',
    });
    expect(set.subjects[0].roleOverrides[unitId]).toBe('back');
    const cleared = expectUndoableChange(set, setRoleOverride, {
      subjectId: 'sub-1',
      fixtureId: unitId,
      role: null,
    });
    expect(cleared.subjects[0].roleOverrides).toEqual({});
  });

  it('the file refuses a set or an override naming a unit that does not exist, by path', () => {
    const bad = {
      ...tinyPlot(),
      levelSets: [{ id: 'look-1', name: 'A', levels: { ghost: 10 } }],
      activeLevelSetId: 'look-2',
    };
    const result = plotDocument.safeParse(bad);
    expect(result.success).toBe(false);
    const messages = result.error?.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`) ?? [];
    expect(messages).toContain('levelSets.0.levels.ghost: names a fixture "ghost" that does not exist');
    expect(messages).toContain('activeLevelSetId: names a level set "look-2" that does not exist');
  });

  it('a file whose chosen set disagrees with the units’ levels is refused by path, not silently rewritten', () => {
    const plot = tinyPlot();
    const differs = {
      ...plot,
      levelSets: [{ id: 'look-1', name: 'A', levels: { [unitId]: 40 } }],
      activeLevelSetId: 'look-1',
    };
    const messages = (plotDocument.safeParse(differs).error?.issues ?? []).map(
      (issue) => `${issue.path.join('.')}: ${issue.message}`,
    );
    expect(messages).toEqual([
      `levelSets.0.levels.${unitId}: is 40 % but fixtures[0].levelPct is 100 % while this set is chosen`,
    ]);
    const missing = { ...differs, levelSets: [{ id: 'look-1', name: 'A', levels: {} }] };
    const missingMessages = (plotDocument.safeParse(missing).error?.issues ?? []).map(
      (issue) => issue.message,
    );
    expect(missingMessages).toEqual([
      `leaves out fixtures[0] "${unitId}" (at 100 %) while this set is chosen`,
    ]);
    // The same set, not chosen, is a stored look like any other.
    expect(plotDocument.safeParse({ ...differs, activeLevelSetId: null }).success).toBe(true);
  });
});
