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

/** A key that changes whenever anything about a fixture that affects its light changes. */
function fixtureKey(fixture: RigFixture): string {
  return JSON.stringify(fixture);
}

interface Entry {
  readonly fixture: RigFixture;
  /** fixtureKey(fixture), worked out only when a changed object has to be compared. */
  key: string | null;
  readonly prepared: PreparedSource;
}

function keyOf(entry: Entry): string {
  entry.key ??= fixtureKey(entry.fixture);
  return entry.key;
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
  // otherwise its key is compared with the last one's.
  let current = new Map<string, Entry>();
  let recomputed = 0;

  return {
    spec,
    update(fixtures) {
      const next = new Map<string, Entry>();
      const changes: { before?: PreparedSource; after?: PreparedSource }[] = [];
      for (const fixture of fixtures) {
        const previous = current.get(fixture.id);
        if (previous && previous.fixture === fixture) {
          next.set(fixture.id, previous);
          continue;
        }
        if (previous) {
          const key = fixtureKey(fixture);
          if (keyOf(previous) === key) {
            next.set(fixture.id, { fixture, key, prepared: previous.prepared });
            continue;
          }
        }
        const prepared = prepareSource(fixture, spec);
        next.set(fixture.id, { fixture, key: null, prepared });
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
