import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  fitView,
  gridSpacingM,
  nearestOnSegment,
  panBy,
  scaleBar,
  screenToWorld,
  worldToScreen,
  zoomAt,
} from '@/components/canvas/viewTransform';
import { glyphRotationDeg } from '@/components/canvas/glyphs';

describe('the plan view transform', () => {
  it('puts the audience at the bottom: upstage is up the screen, stage left to the right', () => {
    const view = { scale: 50, origin: { x: 400, y: 500 } };
    expect(worldToScreen(view, { x: 2, y: 3 })).toEqual({ x: 500, y: 350 });
  });

  it('screen → world → screen round-trips under any zoom and pan', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 2000, noNaN: true }),
        fc.double({ min: -1e4, max: 1e4, noNaN: true }),
        fc.double({ min: -1e4, max: 1e4, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        (scale, ox, oy, x, y) => {
          const view = { scale, origin: { x: ox, y: oy } };
          const back = screenToWorld(view, worldToScreen(view, { x, y }));
          expect(back.x).toBeCloseTo(x, 9);
          expect(back.y).toBeCloseTo(y, 9);
        },
      ),
    );
  });

  it('fitting an 8 m × 6 m stage in 1000 × 800 px with 24 px margins gives 119 px/m, centred', () => {
    // min((1000 − 48)/8, (800 − 48)/6) = min(119, 125.33) = 119 px/m
    const view = fitView({ minX: -4, maxX: 4, minY: 0, maxY: 6 }, 1000, 800);
    expect(view.scale).toBeCloseTo(119, 9);
    expect(worldToScreen(view, { x: 0, y: 3 })).toEqual({ x: 500, y: 400 });
  });

  it('zooming keeps the point under the pointer still; panning moves everything', () => {
    const view = { scale: 40, origin: { x: 300, y: 400 } };
    const anchor = { x: 123, y: 77 };
    const before = screenToWorld(view, anchor);
    const zoomed = zoomAt(view, anchor, 1.7);
    const after = screenToWorld(zoomed, anchor);
    expect(after.x).toBeCloseTo(before.x, 12);
    expect(after.y).toBeCloseTo(before.y, 12);
    expect(zoomed.scale).toBeCloseTo(68, 12);
    expect(panBy(view, 10, -5).origin).toEqual({ x: 310, y: 395 });
  });

  it('grid spacing keeps lines apart and is a round number of metres or feet', () => {
    expect(gridSpacingM(100, 'metric')).toBe(0.25);
    expect(gridSpacingM(40, 'metric')).toBe(0.5);
    expect(gridSpacingM(40, 'imperial')).toBeCloseTo(0.6096, 12); // 2 ft
    expect(scaleBar(100, 'metric')).toEqual({ lengthM: 1, label: '1 m' });
  });

  it('the nearest point on a pipe is clamped to its ends', () => {
    const a = { x: -4, y: -2 };
    const b = { x: 4, y: -2 };
    expect(nearestOnSegment({ x: 1, y: 0 }, a, b)).toMatchObject({ point: { x: 1, y: -2 }, distanceM: 2 });
    expect(nearestOnSegment({ x: 9, y: -2 }, a, b).point).toEqual({ x: 4, y: -2 });
  });
});

describe('fixture glyphs turn with the pan', () => {
  it.each([
    [0, 90], // toward the audience: screen down
    [90, 0], // toward stage left: screen right
    [180, -90], // upstage: screen up
    [-90, 180], // stage right: screen left
  ])('pan %i° draws the glyph at %i°', (pan, rotation) => {
    expect(glyphRotationDeg(pan)).toBe(rotation);
  });
});
