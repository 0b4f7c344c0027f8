/** A hand-checkable plot for the balance tests: two key-side units and one fill unit on one subject. */
import type { PlotDocument } from '@/lib/plot';
import { tinyPlot, unit } from './tinyPlot';

/**
 * Ada (tiny plot) seen from the house at (0, −8): the face at (0, 2, 1.6) looks along −y. Three
 * 20 000 cd profiles level with the face, each focused on it (so each gives its peak toward the face):
 * E = I·cos i / d² on the face (inverse square and cosine law, by hand):
 * - K1 at (−3, −2): d = 5, cos i = 4/5 → 20 000·0.8/25 = 640 lx at full, the viewer's left;
 * - K2 at (−4, −1): d = 5, cos i = 3/5 → 480 lx at full, the viewer's left;
 * - F at (3, −2): d = 5, cos i = 4/5 → 640 lx at full, the viewer's right.
 * Now K1 and K2 are at 100 % and F at 50 %: K1 (640 lx) is the brightest front unit, so K1 and K2 are
 * key and F fill. 2:1 at 512 lx wants key 512 lx and fill 512 lx: F at 512/640 = 80 %, and K1 + K2
 * sharing 512 lx, so each gives less than F: by the rule F would become the key at the new levels.
 */
export function twoKeysOneFill(): PlotDocument {
  const at = (id: string, x: number, y: number, levelPct: number) => ({
    ...unit,
    id,
    positionId: null,
    unit: null,
    mount: { x, y, z: 1.6 },
    focus: { x: 0, y: 2, z: 1.6 },
    levelPct,
  });
  return tinyPlot({ fixtures: [at('k1', -3, -2, 100), at('k2', -4, -1, 100), at('f', 3, -2, 50)] });
}
