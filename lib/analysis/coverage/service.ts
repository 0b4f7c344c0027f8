/**
 * One call that produces everything a light-map view or report needs: the grid of illuminance, the
 * statistics of each acting area and of the whole stage, hot spots and dark gaps, and isolux lines.
 * The browser runs it in a Web Worker; Node runs the same code for tests, the report and benchmarks.
 */
import type { RigFixture } from '../rig';
import { type CoverageEngine, type CoverageGrid, createCoverageEngine } from './engine';
import { type CoverageSpec, polygonMask } from './grid';
import { type IsoluxLine, isoluxLines, niceLevels } from './isolux';
import { type LightRegion, type RegionRules, findRegions } from './regions';
import type { ShareHelper } from './sharing';
import { type AreaStatistics, type TargetBand, areaStatistics } from './statistics';

export interface CoverageArea {
  readonly id: string;
  readonly name: string;
  readonly outline: readonly { readonly x: number; readonly y: number }[];
}

export interface CoverageRequest {
  readonly spec: CoverageSpec;
  readonly fixtures: readonly RigFixture[];
  /** The whole stage (statistics "over the stage"). */
  readonly stage: CoverageArea;
  /** Acting areas; hot spots and dark gaps are looked for inside them (or on the whole stage if none). */
  readonly areas: readonly CoverageArea[];
  readonly band: TargetBand;
  readonly rules: Omit<RegionRules, 'targetLx'>;
}

export interface CoverageResponse {
  readonly spec: CoverageSpec;
  readonly values: Float64Array;
  readonly statistics: readonly {
    readonly id: string;
    readonly name: string;
    readonly figures: AreaStatistics | null;
  }[];
  readonly regions: readonly LightRegion[];
  readonly isolux: readonly IsoluxLine[];
  readonly maxLx: number;
  /** Fixtures the engine recomputed for this answer. */
  readonly recomputed: number;
  /** Threads that computed the grid for this answer (more than 1 when a full recompute was shared out). */
  readonly threads: number;
  /** Whether full recomputes of this grid run the WebAssembly SIMD loop. */
  readonly simd: boolean;
  readonly elapsedMs: number;
}

export interface CoverageService {
  handle(request: CoverageRequest): CoverageResponse;
}

export interface SharedCoverageService {
  handle(request: CoverageRequest): Promise<CoverageResponse>;
}

/** Statistics, hot spots and dark gaps, and isolux lines of a computed grid, with masks kept per outline. */
function createDescriber() {
  let masks = new Map<string, Uint8Array>();
  let masksFor = '';
  return (
    request: CoverageRequest,
    grid: CoverageGrid,
  ): Omit<CoverageResponse, 'recomputed' | 'threads' | 'simd' | 'elapsedMs'> => {
    const gridKey = JSON.stringify(request.spec.grid);
    if (gridKey !== masksFor) {
      masks = new Map();
      masksFor = gridKey;
    }
    const maskOf = (area: CoverageArea) => {
      const areaKey = JSON.stringify(area.outline);
      let mask = masks.get(areaKey);
      if (!mask) {
        mask = polygonMask(request.spec.grid, area.outline);
        masks.set(areaKey, mask);
      }
      return mask;
    };
    const statistics = [request.stage, ...request.areas].map((area) => ({
      id: area.id,
      name: area.name,
      figures: areaStatistics(grid.values, maskOf(area), request.band),
    }));
    let searchMask = maskOf(request.stage);
    if (request.areas.length > 0) {
      searchMask = new Uint8Array(grid.values.length);
      for (const area of request.areas) {
        const mask = maskOf(area);
        for (let index = 0; index < mask.length; index += 1) if (mask[index]) searchMask[index] = 1;
      }
    }
    const regions = findRegions({
      spec: request.spec,
      values: grid.values,
      overlaps: grid.overlaps,
      mask: searchMask,
      rules: { ...request.rules, targetLx: request.band.targetLx },
      fixtures: request.fixtures,
    });
    let maxLx = 0;
    for (const value of grid.values) if (value > maxLx) maxLx = value;
    const isolux = isoluxLines(request.spec.grid, grid.values, niceLevels(request.band.targetLx / 8, maxLx));
    return { spec: request.spec, values: Float64Array.from(grid.values), statistics, regions, isolux, maxLx };
  };
}

/** The engine for a request's grid and plane, kept (with its incremental state) while they stay the same. */
function createEngineKeeper(): (spec: CoverageSpec) => CoverageEngine {
  let engine: CoverageEngine | null = null;
  let engineKey = '';
  return (spec) => {
    const key = JSON.stringify(spec);
    if (!engine || key !== engineKey) {
      engine = createCoverageEngine(spec);
      engineKey = key;
    }
    return engine;
  };
}

/** A service's answer: the described grid and how the engine came by it. */
function answerOf(
  described: Omit<CoverageResponse, 'recomputed' | 'threads' | 'simd' | 'elapsedMs'>,
  engine: CoverageEngine,
  elapsedMs: number,
): CoverageResponse {
  return {
    ...described,
    recomputed: engine.lastRecomputed(),
    threads: engine.lastThreads(),
    simd: engine.usesSimd(),
    elapsedMs,
  };
}

/** A service that keeps its engine (and so its incremental state) while the grid and plane stay the same. */
export function createCoverageService(now: () => number = () => performance.now()): CoverageService {
  const engineFor = createEngineKeeper();
  const describe = createDescriber();
  return {
    handle(request) {
      const started = now();
      const engine = engineFor(request.spec);
      const grid = engine.update(request.fixtures);
      return answerOf(describe(request, grid), engine, now() - started);
    },
  };
}

/**
 * The same service, sharing full recomputes with `helpers` on other threads (engine.ts,
 * updateSharing); the answers are the same to the last bit. Requests are answered one at a time, in order.
 */
export function createSharedCoverageService(
  helpers: readonly ShareHelper[],
  options: { readonly now?: () => number; readonly shareFromMs?: number } = {},
): SharedCoverageService {
  const now = options.now ?? (() => performance.now());
  const engineFor = createEngineKeeper();
  const describe = createDescriber();
  let queue: Promise<unknown> = Promise.resolve();
  const run = async (request: CoverageRequest): Promise<CoverageResponse> => {
    const started = now();
    const engine = engineFor(request.spec);
    const grid = await engine.updateSharing(request.fixtures, helpers, { shareFromMs: options.shareFromMs });
    return answerOf(describe(request, grid), engine, now() - started);
  };
  return {
    handle(request) {
      const next = queue.then(() => run(request));
      queue = next.catch(() => undefined);
      return next;
    },
  };
}
