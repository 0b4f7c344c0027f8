import { describe, expect, it } from 'vitest';
import { HANG_DROP_M, hangingPlacement, itemsInBox } from '@/components/canvas/hanging';
import { tinyPlot } from '../../lib/plot/tinyPlot';

// The tiny plot: a pipe 6 m up along y = −2 from x −4 to 4; the stage runs from y 0 to 6.
const plot = tinyPlot({
  positions: [
    ...tinyPlot().positions,
    {
      id: 'pos-stand',
      name: 'Stand',
      kind: 'stand',
      shape: { kind: 'point', at: { x: 5, y: 3 } },
      heightM: 2.5,
      ratedLoadKg: null,
      loadKind: 'point',
      notes: '',
    },
  ],
});

describe('hanging a unit where the user clicks', () => {
  it('snaps to the nearest point of a pipe, the lens under the pipe, aimed 45° toward the stage', () => {
    // 50 px/m: a click 0.2 m (10 px) off the pipe is within reach.
    const placement = hangingPlacement(plot, { x: 1.3, y: -1.8 }, 50, 'type-profile');
    expect(placement?.positionId).toBe('pos-1');
    expect(placement?.mount.x).toBeCloseTo(1.3, 12);
    expect(placement?.mount.y).toBeCloseTo(-2, 12);
    expect(placement?.mount.z).toBeCloseTo(6 - HANG_DROP_M, 12);
    // 45°: as far upstage as the lens is above the 1.6 m focus plane (6 − 0.4 − 1.6 = 4 m).
    expect(placement?.focus.y).toBeCloseTo(2, 12);
    expect(placement?.focus.z).toBe(1.6);
  });

  it('puts a unit on a stand at the stand’s height, aimed downstage when upstage of the middle', () => {
    const placement = hangingPlacement(plot, { x: 5.1, y: 3.1 }, 50, 'type-profile');
    expect(placement?.mount).toEqual({ x: 5, y: 3, z: 2.5 });
    expect(placement?.focus.y).toBeCloseTo(3 - 1, 12); // rise at least 1 m, toward the setting line
  });

  it('refuses a click out of reach of every position', () => {
    expect(hangingPlacement(plot, { x: 0, y: 1 }, 50, 'type-profile')).toBeNull();
  });

  it('box selection takes units by their mounts and subjects by their marks', () => {
    expect(itemsInBox(plot, { x: -1, y: -3 }, { x: 1, y: 3 })).toEqual(['fx-1', 'sub-1']);
    expect(itemsInBox(plot, { x: -1, y: 0 }, { x: 1, y: 3 })).toEqual(['sub-1']);
  });
});
