import { describe, expect, it } from 'vitest';
import { fitPlanView, gridLinesM, planToScreen } from '@/components/planView';

const stage = { widthM: 8, depthM: 6 };

describe('fitPlanView', () => {
  it('is limited by the width on a wide-enough-to-be-tall canvas: 500 px / (8 + 2) m = 50 px/m', () => {
    const view = fitPlanView({ widthPx: 500, heightPx: 1000, stage, marginM: 1 });
    expect(view.pixelsPerM).toBe(50);
  });

  it('is limited by the height on a wide canvas: 400 px / (6 + 2) m = 50 px/m', () => {
    const view = fitPlanView({ widthPx: 2000, heightPx: 400, stage, marginM: 1 });
    expect(view.pixelsPerM).toBe(50);
  });

  it('centres the stage: the centre line is mid-canvas and the stage middle is mid-height', () => {
    const view = fitPlanView({ widthPx: 1000, heightPx: 400, stage, marginM: 1 });
    expect(planToScreen(view, { xM: 0, yM: 0 }).x).toBe(500);
    expect(planToScreen(view, { xM: 0, yM: stage.depthM / 2 }).y).toBe(200);
  });

  it('puts the setting line below and upstage above (audience at the bottom)', () => {
    const view = fitPlanView({ widthPx: 1000, heightPx: 400, stage, marginM: 1 });
    const settingLine = planToScreen(view, { xM: 0, yM: 0 });
    const upstage = planToScreen(view, { xM: 0, yM: stage.depthM });
    // 400 px canvas, 50 px/m, 1 m margin: setting line at 400 - 50 = 350, back wall at 50.
    expect(settingLine.y).toBe(350);
    expect(upstage.y).toBe(50);
  });

  it('puts stage left (+x) to the right of the screen', () => {
    const view = fitPlanView({ widthPx: 1000, heightPx: 400, stage, marginM: 1 });
    expect(planToScreen(view, { xM: 4, yM: 0 }).x).toBe(700);
    expect(planToScreen(view, { xM: -4, yM: 0 }).x).toBe(300);
  });

  it.each([
    [0, 0],
    [-10, 300],
  ])('gives scale 0 for a %i × %i px canvas', (widthPx, heightPx) => {
    expect(fitPlanView({ widthPx, heightPx, stage, marginM: 1 }).pixelsPerM).toBe(0);
  });
});

describe('gridLinesM', () => {
  it('gives 9 lines across an 8 m stage and 7 lines over a 6 m depth at 1 m', () => {
    const grid = gridLinesM(stage);
    expect(grid.xM).toEqual([-4, -3, -2, -1, 0, 1, 2, 3, 4]);
    expect(grid.yM).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });

  it('keeps the edge line when the spacing does not divide exactly in floating point (0.1 m)', () => {
    const grid = gridLinesM({ widthM: 0.6, depthM: 0.3 }, 0.1);
    expect(grid.xM).toHaveLength(7);
    expect(grid.yM).toHaveLength(4);
    expect(grid.xM[6]).toBeCloseTo(0.3, 12);
    expect(grid.yM[3]).toBeCloseTo(0.3, 12);
  });

  it('keeps the centre line on a stage whose half-width is not a whole number of squares (7 m)', () => {
    const grid = gridLinesM({ widthM: 7, depthM: 2 });
    expect(grid.xM).toEqual([-3, -2, -1, 0, 1, 2, 3]);
  });
});
