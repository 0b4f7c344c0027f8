/**
 * Sharing a full recompute of a light map between threads (engine.ts, updateSharing): the grid's rows
 * are dealt out in turn (row r to part r mod n); the engine's thread computes part 0 and each helper
 * one other part, and the parts are put together row by row. Every cell is still summed over the same
 * fixtures in the same order, so the grid is the same to the last bit as on one thread. Helpers are
 * reached through messages (sharePorts.ts): Web Workers in the browser, worker threads in Node.
 */
import type { RigFixture } from '../rig';
import { type CoverageEngine, type CoverageGrid, createCoverageEngine } from './engine';
import type { CoverageSpec, RowShare } from './grid';

/** What a helper is asked: the light of `fixtures` on `share`'s rows of `spec`'s grid. */
export interface ShareRequest {
  readonly spec: CoverageSpec;
  readonly share: RowShare;
  readonly fixtures: readonly RigFixture[];
}

/** A helper's answer: whole-grid arrays in which only the share's rows are filled in. */
export interface ShareResult {
  readonly values: Float64Array;
  readonly overlaps: Uint16Array;
  /** Whether the helper ran the SIMD loop (simdRows.ts). */
  readonly simd?: boolean;
}

export type ShareHelper = (request: ShareRequest) => Promise<ShareResult>;

/** Whether a helper's answer has the grid's size (anything else is not used). */
export function fitsGrid(part: ShareResult, target: CoverageGrid): boolean {
  return part.values.length === target.values.length && part.overlaps.length === target.overlaps.length;
}

/** Copy `share`'s rows from `part` into `target` (same-sized arrays). */
export function copyShareRows(part: ShareResult, target: CoverageGrid, share: RowShare): void {
  const { columns, rows } = target.spec.grid;
  for (let row = share.from; row < rows; row += share.every) {
    const start = row * columns;
    target.values.set(part.values.subarray(start, start + columns), start);
    target.overlaps.set(part.overlaps.subarray(start, start + columns), start);
  }
}

/**
 * The helper's side: its engine is kept while the grid and share stay the same (prepared sources and
 * cell normals are reused); it is only asked when every fixture is computed again, and answers in
 * fresh arrays that can be handed over without copying again.
 */
export function createShareComputer(): (request: ShareRequest) => ShareResult {
  let engine: CoverageEngine | null = null;
  let engineKey = '';
  return (request) => {
    const key = JSON.stringify([request.spec, request.share]);
    if (!engine || key !== engineKey) {
      engine = createCoverageEngine(request.spec, { share: request.share });
      engineKey = key;
    }
    const grid = engine.update(request.fixtures, { restart: true });
    return {
      values: Float64Array.from(grid.values),
      overlaps: Uint16Array.from(grid.overlaps),
      simd: engine.usesSimd(),
    };
  };
}
