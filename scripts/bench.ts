/**
 * Benchmarks (not tests): prints one JSON line per measurement with the median of repeated runs.
 * Run with `npm run bench`. The machine is shared and noisy, so compare medians and ratios; the
 * coverage lines also give the median CPU time, which waiting for a busy core does not inflate.
 */
import {
  type CoverageSpec,
  SHARE_FROM_MS,
  bruteForceCoverage,
  createCoverageEngine,
  gridOver,
} from '../lib/analysis';
import { areaSourceIlluminanceLx, beamIlluminanceLx, peakCandelaFromLumens } from '../lib/photometry';
import { footprintOnPlane, vec3 } from '../lib/geometry';
import { readFileSync } from 'node:fs';
import { loadPlotText, reportCoverage } from '../lib/plot';
import { frameRig, leanBruteForce, maxRelativeDifference, rig, startHelpers } from './benchCoverageParts';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

const round3 = (value: number) => Number(value.toFixed(3));

/**
 * Median wall-clock time (performance.now) and median CPU time of this process (process.cpuUsage,
 * user + system) over `runs` runs, after `warm` untimed ones. On a shared machine the wall clock
 * also counts time spent waiting for a core; the CPU time does not.
 */
function measure(
  runs: number,
  work: () => unknown,
  warm = Math.min(3, runs),
): { wallMs: number; cpuMs: number } {
  for (let run = 0; run < warm; run += 1) work();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let run = 0; run < runs; run += 1) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    work();
    wall.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  return { wallMs: round3(median(wall)), cpuMs: round3(median(cpu)) };
}

function time(runs: number, work: () => unknown): number {
  return measure(runs, work).wallMs;
}

/**
 * Median wall-clock times of several pieces of work measured in turn (A, B, C, A, B, C, …), so that
 * all of them meet the same noise.
 */
async function measureInTurn(runs: number, works: readonly (() => unknown)[]): Promise<number[]> {
  for (let run = 0; run < 3; run += 1) for (const work of works) await work();
  const times = works.map(() => [] as number[]);
  for (let run = 0; run < runs; run += 1) {
    for (const [index, work] of works.entries()) {
      const start = performance.now();
      await work();
      times[index].push(performance.now() - start);
    }
  }
  return times.map((list) => round3(median(list)));
}

function print(record: Record<string, unknown>): void {
  console.log(JSON.stringify(record));
}

// Coverage: 200 × 120 cells of 0.1 m over 20 m × 12 m = 24 000 cells, horizontal at face height.
const spec: CoverageSpec = {
  grid: gridOver({ minX: -10, maxX: 10, minY: 0, maxY: 12 }, 0.1),
  plane: { kind: 'horizontal', heightM: 1.6 },
};
const cells = spec.grid.columns * spec.grid.rows;

async function coverageBenchmarks(): Promise<void> {
  const sharing = startHelpers();
  for (const count of [50, 300, 1000]) {
    const fixtures = rig(count, count);
    // The first computation (on the 50-unit line this also builds the profile tables of the 18 beam types
    // and warms up the JIT; the larger rigs reuse them).
    const coldStart = performance.now();
    const engine = createCoverageEngine(spec);
    const culled = Float64Array.from(engine.update(fixtures).values);
    const culledOverlaps = Uint16Array.from(engine.update(fixtures).overlaps);
    const coldMs = round3(performance.now() - coldStart);
    // Full recompute: every unit changed (all levels nudged, as a master fader would), on the engine
    // that is kept between updates as the app's service keeps it.
    const nudged = fixtures.map((fixture) =>
      fixture.source.kind === 'beam'
        ? { ...fixture, source: { ...fixture.source, peakCd: fixture.source.peakCd * 1.000001 } }
        : fixture,
    );
    let flip = false;
    const full = measure(count >= 1000 ? 11 : 31, () => {
      flip = !flip;
      engine.update(flip ? nudged : fixtures);
      if (engine.lastRecomputed() !== count)
        throw new Error('the full recompute did not recompute every unit');
    });
    engine.update(fixtures);
    // A new engine (its arrays allocated) computing every unit, for comparison.
    const fresh = measure(count >= 1000 ? 7 : 15, () => createCoverageEngine(spec).update(fixtures));
    // The same full recompute shared with the helper threads, as the app's light-map worker does,
    // measured in turn with the one-thread engine so that both meet the same noise.
    const threads = sharing.helpers.length + 1;
    const oneThread = createCoverageEngine(spec);
    const scalar = createCoverageEngine(spec, { simd: false });
    const shared = createCoverageEngine(spec);
    const flips = { one: false, scalar: false, shared: false };
    const [oneThreadMs, scalarMs, sharedMs] = await measureInTurn(count >= 1000 ? 11 : 31, [
      () => {
        flips.one = !flips.one;
        oneThread.update(flips.one ? nudged : fixtures);
      },
      () => {
        flips.scalar = !flips.scalar;
        scalar.update(flips.scalar ? nudged : fixtures);
      },
      async () => {
        flips.shared = !flips.shared;
        // Shared whatever its size (the app shares only from SHARE_FROM_MS), to show what sharing costs.
        await shared.updateSharing(flips.shared ? nudged : fixtures, sharing.helpers, { shareFromMs: 0 });
        if (shared.lastThreads() !== threads) throw new Error('the full recompute was not shared out');
      },
    ]);
    let scalarSameToTheBit = true;
    const scalarGrid = createCoverageEngine(spec, { simd: false }).update(fixtures);
    for (let index = 0; index < cells; index += 1) {
      if (
        !Object.is(scalarGrid.values[index], culled[index]) ||
        scalarGrid.overlaps[index] !== culledOverlaps[index]
      )
        scalarSameToTheBit = false;
    }
    const sharedGrid = await createCoverageEngine(spec).updateSharing(fixtures, sharing.helpers, {
      shareFromMs: 0,
    });
    let sharedSameToTheBit = true;
    for (let index = 0; index < cells; index += 1) {
      if (
        !Object.is(sharedGrid.values[index], culled[index]) ||
        sharedGrid.overlaps[index] !== culledOverlaps[index]
      )
        sharedSameToTheBit = false;
    }
    let step = 0;
    const incremental = measure(41, () => {
      step += 1;
      const moved = fixtures.map((fixture, index) =>
        index === 0
          ? { ...fixture, focus: vec3(fixture.focus.x + 0.01 * (step % 7), fixture.focus.y, 1.6) }
          : fixture,
      );
      engine.update(moved);
    });
    // The same, with every unit a new object of equal values, as the Web Worker receives the rig
    // (the copies are made before timing).
    const copies = Array.from({ length: 44 }, () => structuredClone(fixtures));
    let copy = 0;
    const incrementalCloned = measure(41, () => {
      step += 1;
      const moved = copies[copy++].map((fixture, index) =>
        index === 0
          ? { ...fixture, focus: vec3(fixture.focus.x + 0.01 * (step % 7), fixture.focus.y, 1.6) }
          : fixture,
      );
      engine.update(moved);
    });
    // One moved unit through the shared path (as the app's worker asks): done on its own thread, no helpers.
    const sharedSteps: number[] = [];
    for (let run = 0; run < 44; run += 1) {
      step += 1;
      const moved = fixtures.map((fixture, index) =>
        index === 0
          ? { ...fixture, focus: vec3(fixture.focus.x + 0.01 * (step % 7), fixture.focus.y, 1.6) }
          : fixture,
      );
      const start = performance.now();
      await shared.updateSharing(moved, sharing.helpers);
      if (run >= 3) sharedSteps.push(performance.now() - start);
      if (shared.lastThreads() !== 1) throw new Error('a one-unit change was shared out');
    }
    const afterIncremental = Float64Array.from(engine.update(fixtures).values);
    // The reference takes seconds per run (about 2 µs per unit × cell), so few runs and no warm-up.
    let brute = bruteForceCoverage(spec, []);
    const bruteForce = measure(count <= 50 ? 3 : 1, () => (brute = bruteForceCoverage(spec, fixtures)), 0);
    let lean: Float64Array = new Float64Array(0);
    const leanBrute = measure(3, () => (lean = leanBruteForce(spec, fixtures)), 1);
    const difference = maxRelativeDifference(culled, brute.values);
    let overlapsEqual = true;
    for (let index = 0; index < cells; index += 1)
      if (culledOverlaps[index] !== brute.overlaps[index]) overlapsEqual = false;
    print({
      name: 'coverage',
      fixtures: count,
      cells,
      firstUpdateMs: coldMs,
      fullRecomputeMedianMs: full.wallMs,
      fullRecomputeCpuMedianMs: full.cpuMs,
      newEngineMedianMs: fresh.wallMs,
      newEngineCpuMedianMs: fresh.cpuMs,
      incrementalMedianMs: incremental.wallMs,
      incrementalCpuMedianMs: incremental.cpuMs,
      incrementalClonedRigMedianMs: incrementalCloned.wallMs,
      incrementalSharedPathMedianMs: round3(median(sharedSteps)),
      threads,
      simd: engine.usesSimd(),
      fullRecomputeSharedMedianMs: sharedMs,
      fullRecomputeOneThreadInTurnMedianMs: oneThreadMs,
      fullRecomputeJavaScriptLoopInTurnMedianMs: scalarMs,
      simdSpeedup: Number((scalarMs / oneThreadMs).toFixed(2)),
      sharedSpeedup: Number((oneThreadMs / sharedMs).toFixed(2)),
      appSharesIt: oneThreadMs >= SHARE_FROM_MS,
      javaScriptLoopSameToTheBit: scalarSameToTheBit,
      sharedSameToTheBit,
      bruteForceMedianMs: bruteForce.wallMs,
      bruteForceRuns: count <= 50 ? 3 : 1,
      speedupOverBruteForce: Number((bruteForce.wallMs / full.wallMs).toFixed(1)),
      speedupOverBruteForceShared: Number((bruteForce.wallMs / sharedMs).toFixed(1)),
      leanBruteForceMedianMs: leanBrute.wallMs,
      speedupOverLeanBruteForce: Number((leanBrute.wallMs / full.wallMs).toFixed(1)),
      maxRelativeDifference: difference.max,
      maxRelativeDifferenceAfterIncremental: maxRelativeDifference(afterIncremental, brute.values).max,
      maxRelativeDifferenceLean: maxRelativeDifference(lean, brute.values).max,
      cellsCompared: difference.cellsCompared,
      overlapsEqual,
      targets:
        count === 300
          ? { fullRecomputeMs: 16, incrementalMs: 2, speedup: 10, maxRelativeDifference: 1e-9 }
          : undefined,
    });
  }
  await sharing.stop();
}

// Oval and measured units (the beam-frame loop) on the same grid, against the same reference.
function frameBenchmarks(): void {
  for (const count of [20, 60]) {
    const fixtures = frameRig(count, count + 7);
    createCoverageEngine(spec).update(fixtures);
    const full = measure(7, () => createCoverageEngine(spec).update(fixtures));
    let brute = bruteForceCoverage(spec, []);
    const reference = measure(1, () => (brute = bruteForceCoverage(spec, fixtures)), 0);
    const values = createCoverageEngine(spec).update(fixtures).values;
    const difference = maxRelativeDifference(values, brute.values);
    print({
      name: 'coverage, oval and measured units',
      fixtures: count,
      cells,
      fullRecomputeMedianMs: full.wallMs,
      bruteForceMs: reference.wallMs,
      speedupOverBruteForce: Number((reference.wallMs / full.wallMs).toFixed(1)),
      maxRelativeDifference: difference.max,
      cellsCompared: difference.cellsCompared,
    });
  }
}

// The demo shows' light maps (0.1 m grid, focus plane): soft sources near faces take the area integral.
function demoBenchmarks(): void {
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
}

// Single evaluations of the photometry core.
function coreBenchmarks(): void {
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
}

void (async () => {
  await coverageBenchmarks();
  frameBenchmarks();
  demoBenchmarks();
  coreBenchmarks();
})();
