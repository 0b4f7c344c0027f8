import { describe, expect, it } from 'vitest';
import { aimFixture, createPlotStore, moveSubject, setFixtureLevel } from '@/lib/plot';
import { tinyPlot } from './tinyPlot';

describe('the plot store', () => {
  it('undoes and redoes a sequence of changes in order', () => {
    const store = createPlotStore(tinyPlot());
    const original = store.getDocument();
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 50 });
    store.dispatch(moveSubject, { id: 'sub-1', mark: { x: 1, y: 1 } });
    const last = store.getDocument();
    expect(store.undoLabels()).toEqual(['Set level to 50 %', 'Move subject']);
    store.undo();
    expect(store.getDocument().subjects[0].mark).toEqual({ x: 0, y: 2 });
    expect(store.getDocument().fixtures[0].levelPct).toBe(50);
    store.undo();
    expect(store.getDocument()).toEqual(original);
    expect(store.undo()).toBe(false);
    store.redo();
    store.redo();
    expect(store.getDocument()).toEqual(last);
    expect(store.redo()).toBe(false);
  });

  it('a drag is one undo step, and undo after it restores the point before the drag', () => {
    const store = createPlotStore(tinyPlot());
    const before = store.getDocument();
    store.beginGesture('Drag focus point');
    for (let step = 1; step <= 30; step += 1) {
      store.dispatch(aimFixture, { id: 'fx-1', focus: { x: step * 0.1, y: 2, z: 1.6 } });
    }
    store.endGesture();
    expect(store.getDocument().fixtures[0].focus.x).toBeCloseTo(3, 12);
    expect(store.undoLabels()).toEqual(['Drag focus point']);
    store.undo();
    expect(store.getDocument()).toEqual(before);
    store.redo();
    expect(store.getDocument().fixtures[0].focus.x).toBeCloseTo(3, 12);
  });

  it('Escape during a drag reverts to the mark and records nothing', () => {
    const store = createPlotStore(tinyPlot());
    const before = store.getDocument();
    store.beginGesture('Drag');
    store.dispatch(aimFixture, { id: 'fx-1', focus: { x: 2, y: 2, z: 1.6 } });
    store.cancelGesture();
    expect(store.getDocument()).toBe(before);
    expect(store.canUndo()).toBe(false);
  });

  it('a new change clears redo', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 50 });
    store.undo();
    expect(store.canRedo()).toBe(true);
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 70 });
    expect(store.canRedo()).toBe(false);
  });

  it('a change that changes nothing is not recorded, and listeners hear only real changes', () => {
    const store = createPlotStore(tinyPlot());
    let heard = 0;
    const stop = store.subscribe(() => (heard += 1));
    expect(store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 100 })).toEqual({
      ok: true,
      changed: false,
    });
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 10 });
    stop();
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 20 });
    expect(heard).toBe(1);
    expect(store.undoLabels()).toHaveLength(2);
  });

  it('documents stay frozen: editing outside a command is impossible', () => {
    const store = createPlotStore(tinyPlot());
    store.dispatch(setFixtureLevel, { ids: ['fx-1'], levelPct: 10 });
    expect(Object.isFrozen(store.getDocument().fixtures[0])).toBe(true);
  });
});
