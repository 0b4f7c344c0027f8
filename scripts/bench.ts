/**
 * Benchmarks (not tests): prints one JSON line per measurement with the median of repeated runs.
 * Run with `npm run bench`. The machine is shared and noisy, so compare medians and ratios.
 */
import { beamIlluminanceLx, areaSourceIlluminanceLx, peakCandelaFromLumens } from '../lib/photometry';
import { footprintOnPlane, vec3 } from '../lib/geometry';

interface Measurement {
  readonly name: string;
  readonly medianMs: number;
  readonly runs: number;
  readonly [extra: string]: unknown;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

function measure(
  name: string,
  runs: number,
  work: () => unknown,
  extra: Record<string, unknown> = {},
): Measurement {
  for (let warm = 0; warm < 3; warm += 1) work();
  const times: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  return { name, medianMs: Number(median(times).toFixed(4)), runs, ...extra };
}

const results: Measurement[] = [];

// One fixture over a 24 000-cell grid: 200 × 120 cells at 0.1 m (20 m × 12 m).
const columns = 200;
const rows = 120;
const mount = vec3(0, -3, 7);
const axis = vec3(0, 6, -5.3);
const spread = { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 } as const;
const up = vec3(0, 0, 1);
results.push(
  measure(
    'point-source beam, one fixture × 24 000 cells',
    30,
    () => {
      let sum = 0;
      for (let row = 0; row < rows; row += 1) {
        for (let column = 0; column < columns; column += 1) {
          const point = vec3(-10 + column * 0.1, row * 0.1, 1.6);
          sum += beamIlluminanceLx({ mount, axis, peakCd: 30000, spread, point, normal: up });
        }
      }
      return sum;
    },
    { cells: rows * columns },
  ),
);

results.push(
  measure('peak candela from lumens (one zoom step)', 200, () => peakCandelaFromLumens(12000, 19, 30)),
);

results.push(
  measure('footprint on the focus plane (closed form + 96-point outline)', 500, () =>
    footprintOnPlane(mount, vec3(0, 3, 1.6), 26, 1.6),
  ),
);

results.push(
  measure('soft box at 1.2 m, numerical area integral', 50, () =>
    areaSourceIlluminanceLx({
      shape: { kind: 'rectangle', widthM: 0.9, heightM: 1.2 },
      centre: vec3(1, -1, 1.7),
      facing: vec3(-1, 1, 0),
      luminanceCdPerM2: 4000,
      point: vec3(0, 0, 1.6),
      normal: vec3(0, -1, 0),
    }),
  ),
);

for (const result of results) console.log(JSON.stringify(result));
