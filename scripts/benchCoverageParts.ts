/**
 * Pieces of the coverage benchmarks in bench.ts: the invented rigs, a lean brute force to compare
 * with, the comparison with the reference, and the helper worker threads.
 */
import { availableParallelism } from 'node:os';
import path from 'node:path';
import { MessageChannel, Worker } from 'node:worker_threads';
import {
  type CoverageSpec,
  type RigFixture,
  type ShareHelper,
  type SharePort,
  shareHelperOverPort,
} from '../lib/analysis';
import type { CandelaGrid } from '../lib/formats';
import { PROFILE_EDGE_FRACTION, profileExponent } from '../lib/photometry';
import { vec3 } from '../lib/geometry';
import { seededRandom } from '../lib/seededRandom';

/**
 * Worker threads that take a share of the rows of a full recompute, as the app's helper Web Workers do:
 * one per core beyond the first, at most three (components/coverage/useCoverage.ts).
 */
export function startHelpers(): { helpers: ShareHelper[]; stop: () => Promise<void> } {
  const count = Math.min(3, Math.max(0, availableParallelism() - 1));
  const started = Array.from({ length: count }, () => {
    const channel = new MessageChannel();
    const worker = new Worker(path.join(__dirname, 'coverageShareThread.cjs'), {
      workerData: { port: channel.port2 },
      transferList: [channel.port2],
    });
    return { worker, port: channel.port1 };
  });
  return {
    helpers: started.map(({ port }) => shareHelperOverPort(port as unknown as SharePort)),
    stop: async () => {
      for (const { worker, port } of started) {
        port.close();
        await worker.terminate();
      }
    },
  };
}

/**
 * An invented rig: units on five pipes over a 20 m × 12 m stage, each focused at face height within
 * reach of its pipe (up to 50° from straight down, as front, top and back light are), on the stage.
 */
export function rig(count: number, seed: number): RigFixture[] {
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

/**
 * A second, leaner brute force for comparison: the same model written as one plain loop (no culling,
 * no table, no allocation): θ = atan2(|a × d|, a · d), f = exp(−ln2·(θ/hb)^p) down to 0.1 % of peak,
 * E = I0·f·cos i / d² on a horizontal plane. It shows how much of the speed-up over the reference is
 * the general functions' overhead rather than the engine's culling and table.
 */
export function leanBruteForce(spec: CoverageSpec, fixtures: readonly RigFixture[]): Float64Array {
  const { grid } = spec;
  const values = new Float64Array(grid.columns * grid.rows);
  for (const fixture of fixtures) {
    const source = fixture.source;
    if (source.kind !== 'beam' || source.spread.kind !== 'round')
      throw new Error('lean brute force: round beams only');
    const beamHalf = (source.spread.beamAngleDeg / 2) * (Math.PI / 180);
    const fieldHalf = (source.spread.fieldAngleDeg / 2) * (Math.PI / 180);
    const exponent = profileExponent(beamHalf, fieldHalf);
    const ax0 = fixture.focus.x - fixture.mount.x;
    const ay0 = fixture.focus.y - fixture.mount.y;
    const az0 = fixture.focus.z - fixture.mount.z;
    const size = Math.hypot(ax0, ay0, az0);
    const [ax, ay, az] = [ax0 / size, ay0 / size, az0 / size];
    const dz = spec.plane.heightM - fixture.mount.z;
    for (let row = 0; row < grid.rows; row += 1) {
      const dy = grid.minY + (row + 0.5) * grid.spacingM - fixture.mount.y;
      for (let column = 0; column < grid.columns; column += 1) {
        const dx = grid.minX + (column + 0.5) * grid.spacingM - fixture.mount.x;
        const distanceSquared = dx * dx + dy * dy + dz * dz;
        if (distanceSquared < 1e-12) continue;
        const cx = ay * dz - az * dy;
        const cy = az * dx - ax * dz;
        const cz = ax * dy - ay * dx;
        const theta = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ax * dx + ay * dy + az * dz);
        if (theta >= Math.PI / 2) continue;
        const relative = Math.exp(-Math.LN2 * Math.pow(theta / beamHalf, exponent));
        if (relative < PROFILE_EDGE_FRACTION) continue;
        const distance = Math.sqrt(distanceSquared);
        const cosIncidence = -dz / distance;
        if (cosIncidence <= 0) continue;
        values[row * grid.columns + column] += (source.peakCd * relative * cosIncidence) / distanceSquared;
      }
    }
  }
  return values;
}

export function maxRelativeDifference(
  values: Float64Array,
  reference: Float64Array,
): { max: number; cellsCompared: number } {
  let max = 0;
  let cellsCompared = 0;
  for (let index = 0; index < reference.length; index += 1) {
    if (reference[index] <= 0.1) continue;
    cellsCompared += 1;
    max = Math.max(max, Math.abs(values[index] - reference[index]) / reference[index]);
  }
  return { max, cellsCompared };
}

/** An invented candela grid (quadrant symmetry, γ every 5°): a lopsided spot for the benchmarks. */
function inventedCandelaGrid(): CandelaGrid {
  const verticalAnglesDeg = Array.from({ length: 37 }, (_, index) => index * 5);
  const horizontalAnglesDeg = [0, 30, 60, 90];
  const candelaCd = horizontalAnglesDeg.map((c) =>
    verticalAnglesDeg.map((gamma) =>
      gamma > 60
        ? 0
        : 20000 * Math.cos((gamma * Math.PI) / 125) ** 4 * (1 + 0.3 * Math.cos((c * Math.PI) / 90)),
    ),
  );
  return { symmetry: 'quadrant', verticalAnglesDeg, horizontalAnglesDeg, candelaCd };
}

/**
 * An invented rig of oval and measured units (the beam-frame loop): `count` units on the same five
 * pipes, every other one an oval wash turned by up to 90°, the rest a measured spot.
 */
export function frameRig(count: number, seed: number): RigFixture[] {
  const next = seededRandom(seed);
  const pipes = [-3, 0.5, 3.5, 6.5, 9.5];
  const grid = inventedCandelaGrid();
  return Array.from({ length: count }, (_, index) => {
    const mount = vec3(-9.5 + 19 * next(), pipes[index % pipes.length], 6.5 + next() * 1.5);
    const focus = vec3(-8 + 16 * next(), 1 + 10 * next(), 1.6);
    const beam = 15 + 30 * next();
    return {
      id: `f${index}`,
      mount,
      focus,
      source:
        index % 2 === 0
          ? {
              kind: 'beam' as const,
              spread: {
                kind: 'oval' as const,
                beamAngleXDeg: beam,
                fieldAngleXDeg: beam * 1.5,
                beamAngleYDeg: beam / 2,
                fieldAngleYDeg: beam * 0.8,
                rotationDeg: 90 * next(),
              },
              peakCd: 10000 + 40000 * next(),
            }
          : { kind: 'measured' as const, grid, scale: 0.5 + next() },
    };
  });
}
