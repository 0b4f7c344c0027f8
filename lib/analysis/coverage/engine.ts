/**
 * The coverage engine: the light on every cell of a grid, summed over a rig, kept up to date
 * incrementally. When one fixture changes, its old light is taken away and its new light added;
 * only the cells inside its beam are visited. Results are typed arrays.
 */
import type { RigFixture } from '../rig';
import { type CoverageSpec, EVERY_ROW, type RowShare, cellCount } from './grid';
import type { ProfileTable } from './profileTable';
import { type ShareHelper, copyShareRows, fitsGrid } from './sharing';
import { simdRowsAvailable, withSimdRows } from './simdRows';
import {
  type AccumulateTarget,
  type CellNormals,
  type PreparedSource,
  accumulateSource,
  cellNormals,
  prepareSource,
} from './kernel';

export interface CoverageGrid extends AccumulateTarget {
  readonly spec: CoverageSpec;
  /** Illuminance per cell, lx (row-major; see grid.ts). */
  readonly values: Float64Array;
  /** Per cell, how many round beams cover it inside their beam angle (50 % of peak). */
  readonly overlaps: Uint16Array;
}

/** A full recompute is shared out when it takes at least this long on one thread (ms). */
export const SHARE_FROM_MS = 4;
/** Before any full recompute has been timed, rigs of this many units or more are shared out. */
export const SHARE_FROM_UNITS = 100;

/** The least time a helper is given to answer after this thread has done its part (ms). */
export const HELPER_GRACE_MS = 2000;

/** Helpers that failed or did not answer in time: not asked again (by any engine). */
const failedHelpers = new WeakSet<ShareHelper>();

/** Settle every promise, rejecting those still pending after `ms`. */
async function settleWithin<T>(
  promises: readonly Promise<T>[],
  ms: number,
): Promise<PromiseSettledResult<T>[]> {
  const timers: ReturnType<typeof setTimeout>[] = [];
  const bounded = promises.map(
    (promise) =>
      new Promise<T>((resolve, reject) => {
        timers.push(setTimeout(() => reject(new Error(`no answer within ${Math.round(ms)} ms`)), ms));
        promise.then(resolve, reject);
      }),
  );
  try {
    return await Promise.allSettled(bounded);
  } finally {
    for (const timer of timers) clearTimeout(timer);
  }
}

export interface CoverageEngine {
  readonly spec: CoverageSpec;
  /**
   * Bring the grid up to date with `fixtures`; returns the engine's own arrays (copy before keeping).
   * `restart` computes every fixture again instead of only the changed ones.
   */
  update(fixtures: readonly RigFixture[], options?: { readonly restart?: boolean }): CoverageGrid;
  /**
   * The same, but when every fixture is to be computed again the grid's rows are shared out with
   * `helpers` (other threads; sharing.ts), each computing its rows while this thread does its own. The
   * grid is the same to the last bit: every cell is still summed over the same fixtures in the same
   * order. Small changes, and full recomputes that took less than `shareFromMs` (default SHARE_FROM_MS)
   * on one thread last time, are done here alone: messages would cost more than they save. Before the
   * first full recompute, rigs of SHARE_FROM_UNITS units or more are shared. One update at a time.
   */
  updateSharing(
    fixtures: readonly RigFixture[],
    helpers: readonly ShareHelper[],
    options?: { readonly shareFromMs?: number; readonly helperGraceMs?: number },
  ): Promise<CoverageGrid>;
  /** How many fixtures the last update had to (re)compute. */
  lastRecomputed(): number;
  /** How many threads computed the last update (1, or 1 + helpers when it was shared out). */
  lastThreads(): number;
  /**
   * Whether full recomputes run the round beams' inner loop in WebAssembly SIMD (simdRows.ts), here and
   * (as they reported at the last shared update) on the helpers.
   */
  usesSimd(): boolean;
}

/**
 * Whether two pieces of plain data (numbers, strings, booleans, null, arrays, objects) are equal in
 * every field: how the engine tells that a fixture's light has not changed. It stops at the first
 * difference, and a measured grid that is the same object is not walked.
 */
function samePlainData(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a === 'number' && typeof b === 'number') return Number.isNaN(a) && Number.isNaN(b);
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return false;
    for (let index = 0; index < a.length; index += 1) if (!samePlainData(a[index], b[index])) return false;
    return true;
  }
  const left = a as Record<string, unknown>;
  const right = b as Record<string, unknown>;
  const keys = Object.keys(left);
  if (keys.length !== Object.keys(right).length) return false;
  for (const key of keys) if (!(key in right) || !samePlainData(left[key], right[key])) return false;
  return true;
}

interface Entry {
  readonly fixture: RigFixture;
  readonly prepared: PreparedSource;
}

export interface CoverageEngineOptions {
  /** Only these rows (the others stay 0); all rows by default. */
  readonly share?: RowShare;
  /**
   * Full recomputes on a horizontal plane run the round beams' inner loop in WebAssembly SIMD where
   * the platform has it (simdRows.ts; the same bits as the JavaScript loop). On by default.
   */
  readonly simd?: boolean;
}

/**
 * A fresh engine for one grid and plane. With a `share`, it computes only those rows (the others stay
 * 0): parts of one grid computed on different threads (sharing.ts) are put together row by row.
 */
export function createCoverageEngine(
  spec: CoverageSpec,
  options: CoverageEngineOptions = {},
): CoverageEngine {
  const share = options.share ?? EVERY_ROW;
  // The SIMD loop serves round beams lit from above: only a horizontal plane has them.
  const simd = (options.simd ?? true) && spec.plane.kind === 'horizontal' && simdRowsAvailable();
  const normals: CellNormals = cellNormals(spec);
  const grid: CoverageGrid = {
    spec,
    values: new Float64Array(cellCount(spec.grid)),
    overlaps: new Uint16Array(cellCount(spec.grid)),
  };
  // A fixture whose object is the same as last time is unchanged (rig fixtures are never mutated);
  // otherwise it is compared field by field with the last one.
  let current = new Map<string, Entry>();
  let recomputed = 0;
  let threads = 1;
  let sharing = false;
  // How long the last full recompute took, or would have taken, on one thread (ms); null before the first.
  let fullMs: number | null = null;
  // Whether every helper of the last shared update ran the SIMD loop too.
  let helpersSimd = true;

  /** Run a change of the grid; if it throws, the grid is unfinished, so the next update starts again. */
  const keepingStateSafe = (change: () => CoverageGrid): CoverageGrid => {
    try {
      return change();
    } catch (error) {
      current = new Map();
      throw error;
    }
  };

  /** The entries for `fixtures` and the changes since the last update (prepared sources to take away and add). */
  const plan = (fixtures: readonly RigFixture[]) => {
    if (sharing)
      throw new Error('the light map engine was asked for a new grid before the last one was put together');
    const next = new Map<string, Entry>();
    const changes: { before?: PreparedSource; after?: PreparedSource }[] = [];
    for (const fixture of fixtures) {
      const previous = current.get(fixture.id);
      if (previous && (previous.fixture === fixture || samePlainData(previous.fixture, fixture))) {
        next.set(
          fixture.id,
          previous.fixture === fixture ? previous : { fixture, prepared: previous.prepared },
        );
        continue;
      }
      const prepared = prepareSource(fixture, spec);
      next.set(fixture.id, { fixture, prepared });
      changes.push({ before: previous?.prepared, after: prepared });
    }
    for (const [id, previous] of current) {
      if (!next.has(id)) changes.push({ before: previous.prepared });
    }
    // Past half the rig, starting again is as quick and sheds any rounding left by subtraction.
    return { next, changes, restart: changes.length > fixtures.length / 2 };
  };

  const restart = (next: Map<string, Entry>, rows: RowShare) => {
    const started = performance.now();
    grid.values.fill(0);
    grid.overlaps.fill(0);
    const tables: ProfileTable[] = [];
    if (simd)
      for (const { prepared } of next.values()) if (prepared.kind === 'round') tables.push(prepared.table);
    const accumulateAll = (target: AccumulateTarget) => {
      for (const entry of next.values()) accumulateSource(entry.prepared, spec, normals, target, 1, rows);
    };
    if (tables.length === 0) accumulateAll(grid);
    else
      withSimdRows(grid.values, spec.grid.rows, tables, (batch) =>
        accumulateAll(batch ? { values: batch.values, overlaps: grid.overlaps, simd: batch } : grid),
      );
    if (rows.every === 1) fullMs = performance.now() - started;
  };

  const incremental = (changes: readonly { before?: PreparedSource; after?: PreparedSource }[]) => {
    for (const change of changes) {
      if (change.before) accumulateSource(change.before, spec, normals, grid, -1, share);
      if (change.after) accumulateSource(change.after, spec, normals, grid, 1, share);
    }
  };

  return {
    spec,
    usesSimd: () => simd && helpersSimd,
    update(fixtures, options) {
      const { next, changes, restart: startAgain } = plan(fixtures);
      return keepingStateSafe(() => {
        if (startAgain || options?.restart) restart(next, share);
        else incremental(changes);
        recomputed = startAgain || options?.restart ? next.size : changes.length;
        threads = 1;
        current = next;
        return grid;
      });
    },
    async updateSharing(fixtures, helpers, options) {
      const { next, changes, restart: startAgain } = plan(fixtures);
      const expectedMs = fullMs ?? (next.size >= SHARE_FROM_UNITS ? Infinity : 0);
      const worthSharing = expectedMs >= (options?.shareFromMs ?? SHARE_FROM_MS);
      const working = helpers.filter((helper) => !failedHelpers.has(helper));
      if (!startAgain || working.length === 0 || share.every !== 1 || !worthSharing) {
        return keepingStateSafe(() => {
          if (startAgain) restart(next, share);
          else incremental(changes);
          recomputed = startAgain ? next.size : changes.length;
          threads = 1;
          current = next;
          return grid;
        });
      }
      // Rows dealt out in turn: part 0 here, part k to helper k, asked first so that they work meanwhile.
      const every = working.length + 1;
      const shareOf = (index: number): RowShare => ({ every, from: index + 1 });
      const parts = working.map((helper, index) => helper({ spec, share: shareOf(index), fixtures }));
      // Failures are read below (or dropped if this thread fails first), never left unhandled.
      for (const part of parts) part.catch(() => undefined);
      sharing = true;
      try {
        const started = performance.now();
        restart(next, { every, from: 0 });
        const ownMs = performance.now() - started;
        // A helper has ten times this thread's time (and at least the grace) to answer; after that it is
        // taken as gone (its worker crashed or was stopped) and is not asked again.
        const answers = await settleWithin(
          parts,
          Math.max(options?.helperGraceMs ?? HELPER_GRACE_MS, 10 * ownMs),
        );
        helpersSimd = true;
        answers.forEach((answer, index) => {
          if (answer.status === 'fulfilled' && fitsGrid(answer.value, grid)) {
            copyShareRows(answer.value, grid, shareOf(index));
            if (answer.value.simd !== true) helpersSimd = false;
            return;
          }
          // A helper that failed, answered wrongly or not in time costs time, never the map: its rows are done here.
          failedHelpers.add(working[index]);
          for (const entry of next.values())
            accumulateSource(entry.prepared, spec, normals, grid, 1, shareOf(index));
        });
        fullMs = ownMs * every;
        recomputed = next.size;
        threads = every;
        current = next;
        return grid;
      } catch (error) {
        current = new Map(); // the grid is unfinished: the next update computes every unit again
        throw error;
      } finally {
        sharing = false;
      }
    },
    lastRecomputed: () => recomputed,
    lastThreads: () => threads,
  };
}
