/**
 * The coverage engine: the light on every cell of a grid, summed over a rig, kept up to date
 * incrementally. When one fixture changes, its old light is taken away and its new light added;
 * only the cells inside its beam are visited. Results are typed arrays.
 */
import type { RigFixture } from '../rig';
import { type CoverageSpec, cellCount } from './grid';
import { type AccumulateTarget, type CellNormals, type PreparedSource, accumulateSource, cellNormals, prepareSource } from './kernel';

export interface CoverageGrid extends AccumulateTarget {
  readonly spec: CoverageSpec;
  /** Illuminance per cell, lx (row-major; see grid.ts). */
  readonly values: Float64Array;
  /** Per cell, how many round beams cover it inside their beam angle (50 % of peak). */
  readonly overlaps: Uint16Array;
}

export interface CoverageEngine {
  readonly spec: CoverageSpec;
  /** Bring the grid up to date with `fixtures`; returns the engine's own arrays (copy before keeping). */
  update(fixtures: readonly RigFixture[]): CoverageGrid;
  /** How many fixtures the last update had to (re)compute. */
  lastRecomputed(): number;
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

/** A fresh engine for one grid and plane. */
export function createCoverageEngine(spec: CoverageSpec): CoverageEngine {
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

  return {
    spec,
    update(fixtures) {
      const next = new Map<string, Entry>();
      const changes: { before?: PreparedSource; after?: PreparedSource }[] = [];
      for (const fixture of fixtures) {
        const previous = current.get(fixture.id);
        if (previous && (previous.fixture === fixture || samePlainData(previous.fixture, fixture))) {
          next.set(fixture.id, previous.fixture === fixture ? previous : { fixture, prepared: previous.prepared });
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
      if (changes.length > fixtures.length / 2) {
        grid.values.fill(0);
        grid.overlaps.fill(0);
        for (const entry of next.values()) accumulateSource(entry.prepared, spec, normals, grid, 1);
        recomputed = next.size;
      } else {
        for (const change of changes) {
          if (change.before) accumulateSource(change.before, spec, normals, grid, -1);
          if (change.after) accumulateSource(change.after, spec, normals, grid, 1);
        }
        recomputed = changes.length;
      }
      current = next;
      return grid;
    },
    lastRecomputed: () => recomputed,
  };
}
