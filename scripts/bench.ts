/**
 * Benchmarks (not tests): prints one JSON line per measurement with the median of repeated runs.
 * Run with `npm run bench`. The machine is shared and noisy, so compare medians and ratios.
 */
import {
  type CoverageSpec,
  type RigFixture,
  bruteForceCoverage,
  createCoverageEngine,
  gridOver,
} from '../lib/analysis';
import { areaSourceIlluminanceLx, beamIlluminanceLx, peakCandelaFromLumens } from '../lib/photometry';
import { footprintOnPlane, vec3 } from '../lib/geometry';
import { seededRandom } from '../lib/seededRandom';
import { readFileSync } from 'node:fs';
import { loadPlotText, reportCoverage } from '../lib/plot';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

function time(runs: number, work: () => unknown): number {
  for (let warm = 0; warm < Math.min(3, runs); warm += 1) work();
  const times: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  return Number(median(times).toFixed(3));
}

function print(record: Record<string, unknown>): void {
  console.log(JSON.stringify(record));
}

/**
 * An invented rig: units on five pipes over a 20 m × 12 m stage, each focused at face height within
 * reach of its pipe (up to 50° from straight down, as front, top and back light are), on the stage.
 */
function rig(count: number, seed: number): RigFixture[] {
  const next = seededRandom(seed);
  const pipes = [-3, 0.5, 3.5, 6.5, 9.5];
  // A catalogue of types: six beam angles, three field/beam ratios (spot, profile, wash-like).
  const beams = [10, 14, 19, 26, 36, 50];
  const ratios = [1.35, 1.5, 1.7];
  return Array.from({ length: count }, (_, index) => {
    const beam = beams[Math.floor(next() * beams.length)];
    const ratio = ratios[Math.floor(next() * ratios.length)];
    const mount = vec3(-9.5 + 19 * next(), pipes[index % pipes.length], 6.5 + next() * 1.5);
    const reach = (mount.z - 1.6) * Math.tan((50 * Math.PI) / 180) * next();
    const bearing = 2 * Math.PI * next();
    const focus = vec3(
      Math.min(9.5, Math.max(-9.5, mount.x + reach * Math.sin(bearing))),
      Math.min(11.5, Math.max(0.5, mount.y + reach * Math.cos(bearing))),
      1.6,
    );
    return {
      id: `u${index}`,
      mount,
      focus,
      source: {
        kind: 'beam' as const,
        spread: { kind: 'round' as const, beamAngleDeg: beam, fieldAngleDeg: beam * ratio },
        peakCd: 10000 + 70000 * next(),
      },
    };
  });
}

// Coverage: 200 × 120 cells of 0.1 m over 20 m × 12 m = 24 000 cells, horizontal at face height.
const spec: CoverageSpec = {
  grid: gridOver({ minX: -10, maxX: 10, minY: 0, maxY: 12 }, 0.1),
  plane: { kind: 'horizontal', heightM: 1.6 },
};
const cells = spec.grid.columns * spec.grid.rows;
for (const count of [50, 300, 1000]) {
  const fixtures = rig(count, count);
  const fullMs = time(count >= 1000 ? 7 : 15, () => createCoverageEngine(spec).update(fixtures));
  const engine = createCoverageEngine(spec);
  const culled = Float64Array.from(engine.update(fixtures).values);
  let step = 0;
  const incrementalMs = time(40, () => {
    step += 1;
    const moved = fixtures.map((fixture, index) =>
      index === 0
        ? { ...fixture, focus: vec3(fixture.focus.x + 0.01 * (step % 7), fixture.focus.y, 1.6) }
        : fixture,
    );
    engine.update(moved);
  });
  let brute: Float64Array = new Float64Array(0);
  const bruteMs = time(count >= 1000 ? 1 : 3, () => {
    brute = bruteForceCoverage(spec, fixtures).values;
  });
  let maxRelative = 0;
  for (let index = 0; index < cells; index += 1) {
    if (brute[index] > 0.1)
      maxRelative = Math.max(maxRelative, Math.abs(culled[index] - brute[index]) / brute[index]);
  }
  print({
    name: 'coverage',
    fixtures: count,
    cells,
    fullRecomputeMedianMs: fullMs,
    incrementalMedianMs: incrementalMs,
    bruteForceMedianMs: bruteMs,
    speedupOverBruteForce: Number((bruteMs / fullMs).toFixed(1)),
    maxRelativeDifference: maxRelative,
    targets:
      count === 300
        ? { fullRecomputeMs: 16, incrementalMs: 2, speedup: 10, maxRelativeDifference: 1e-9 }
        : undefined,
  });
}

// The demo shows' light maps (0.1 m grid, focus plane): soft sources near faces take the area integral.
for (const file of ['studio-theatre.json', 'interview.json', 'conference.json']) {
  const loaded = loadPlotText(readFileSync(`public/demo/${file}`, 'utf8'));
  if (!loaded.ok) throw new Error(`${file}: ${loaded.errors.join('; ')}`);
  const document = loaded.document;
  print({
    name: 'demo light map, full recompute',
    show: file,
    fixtures: document.fixtures.length,
    softTypes: document.fixtureTypes.filter((type) => type.photometry.kind === 'soft').length,
    medianMs: time(5, () => reportCoverage(document)),
  });
}

// Single evaluations of the photometry core.
const mount = vec3(0, -3, 7);
const spread = { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 } as const;
print({
  name: 'point-source beam at one point (exact profile)',
  medianMsPer1000: time(50, () => {
    for (let index = 0; index < 1000; index += 1) {
      beamIlluminanceLx({
        mount,
        axis: vec3(0, 6, -5.3),
        peakCd: 30000,
        spread,
        point: vec3(index * 0.001, 3, 1.6),
        normal: vec3(0, 0, 1),
      });
    }
  }),
});
print({
  name: 'peak candela from lumens (one zoom step, memoised after the first)',
  medianMs: time(200, () => peakCandelaFromLumens(12000, 19, 30)),
});
print({
  name: 'footprint on the focus plane (closed form + 96-point outline)',
  medianMs: time(500, () => footprintOnPlane(mount, vec3(0, 3, 1.6), 26, 1.6)),
});
print({
  name: 'soft box 1.2 m from a face, numerical area integral',
  medianMs: time(50, () =>
    areaSourceIlluminanceLx({
      shape: { kind: 'rectangle', widthM: 0.9, heightM: 1.2 },
      centre: vec3(1, -1, 1.7),
      facing: vec3(-1, 1, 0),
      luminanceCdPerM2: 4000,
      point: vec3(0, 0, 1.6),
      normal: vec3(0, -1, 0),
    }),
  ),
});
