/**
 * Hot spots and dark gaps: connected groups of cells over the target by more than a set number of
 * stops (or lit by more than a set number of overlapping beams), and under it by more than a set
 * number of stops, each with where it is, its size, its extreme value and the fixtures behind it.
 */
import { vec3 } from '../../geometry/vector';
import type { RigFixture } from '../rig';
import { type CoverageSpec, cellCentreX, cellCentreY } from './grid';
import { cellwiseIlluminance } from './kernel';

export interface RegionRules {
  readonly targetLx: number;
  /** A hot spot is over the target by more than this many stops. */
  readonly hotStops: number;
  /** …or covered by more than this many beams at once. */
  readonly maxOverlaps: number;
  /** A dark gap is under the target by more than this many stops. */
  readonly darkStops: number;
  /** Regions smaller than this are not reported (m²). */
  readonly minimumAreaM2: number;
}

export interface LightRegion {
  readonly kind: 'hot' | 'dark';
  /** Why it is listed. */
  readonly reason: 'over target' | 'beams pile up' | 'under target';
  /** Centre of the region in plan (mean of its cells), m. */
  readonly centre: { readonly x: number; readonly y: number };
  readonly bounds: {
    readonly minX: number;
    readonly maxX: number;
    readonly minY: number;
    readonly maxY: number;
  };
  readonly areaM2: number;
  /** The brightest (hot) or darkest (dark) cell's illuminance, lx, and where it is. */
  readonly extremeLx: number;
  readonly extremeAt: { readonly x: number; readonly y: number };
  /** Fixtures lighting the extreme cell, largest contribution first (for a dark gap: those reaching it at all). */
  readonly fixtures: readonly { readonly fixtureId: string; readonly lx: number }[];
}

/** Find hot spots and dark gaps in a light map; `mask` limits the search (e.g. to the acting areas). */
export function findRegions(input: {
  readonly spec: CoverageSpec;
  readonly values: Float64Array;
  readonly overlaps: Uint16Array;
  readonly mask: Uint8Array | null;
  readonly rules: RegionRules;
  readonly fixtures: readonly RigFixture[];
}): LightRegion[] {
  const { spec, values, overlaps, mask, rules } = input;
  const hotLimit = rules.targetLx * 2 ** rules.hotStops;
  const darkLimit = rules.targetLx * 2 ** -rules.darkStops;
  const count = values.length;
  const flag = new Uint8Array(count); // 1 over, 2 piled up, 3 under
  for (let index = 0; index < count; index += 1) {
    if (mask && mask[index] === 0) continue;
    if (values[index] > hotLimit) flag[index] = 1;
    else if (overlaps[index] > rules.maxOverlaps) flag[index] = 2;
    else if (values[index] < darkLimit) flag[index] = 3;
  }
  const regions: LightRegion[] = [];
  const seen = new Uint8Array(count);
  const { columns, rows, spacingM } = spec.grid;
  const stack: number[] = [];
  for (let start = 0; start < count; start += 1) {
    if (flag[start] === 0 || seen[start]) continue;
    const kindFlag = flag[start];
    const cells: number[] = [];
    stack.push(start);
    seen[start] = 1;
    while (stack.length > 0) {
      const index = stack.pop() as number;
      cells.push(index);
      const column = index % columns;
      const row = (index - column) / columns;
      const neighbours = [
        column > 0 ? index - 1 : -1,
        column < columns - 1 ? index + 1 : -1,
        row > 0 ? index - columns : -1,
        row < rows - 1 ? index + columns : -1,
      ];
      for (const neighbour of neighbours) {
        if (neighbour >= 0 && !seen[neighbour] && flag[neighbour] === kindFlag) {
          seen[neighbour] = 1;
          stack.push(neighbour);
        }
      }
    }
    const areaM2 = cells.length * spacingM * spacingM;
    if (areaM2 < rules.minimumAreaM2) continue;
    regions.push(describeRegion(cells, kindFlag, areaM2, input));
  }
  return regions.sort((a, b) => b.areaM2 - a.areaM2);
}

function describeRegion(
  cells: readonly number[],
  kindFlag: number,
  areaM2: number,
  input: Parameters<typeof findRegions>[0],
): LightRegion {
  const { spec, values, fixtures } = input;
  const { columns } = spec.grid;
  const hot = kindFlag !== 3;
  let sumX = 0;
  let sumY = 0;
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  let extremeIndex = cells[0];
  for (const index of cells) {
    const x = cellCentreX(spec.grid, index % columns);
    const y = cellCentreY(spec.grid, Math.floor(index / columns));
    sumX += x;
    sumY += y;
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
    if (hot ? values[index] > values[extremeIndex] : values[index] < values[extremeIndex])
      extremeIndex = index;
  }
  const extremeAt = {
    x: cellCentreX(spec.grid, extremeIndex % columns),
    y: cellCentreY(spec.grid, Math.floor(extremeIndex / columns)),
  };
  const plane = spec.plane;
  const point = vec3(extremeAt.x, extremeAt.y, plane.heightM);
  let normal = vec3(0, 0, 1);
  if (plane.kind === 'toward') {
    const dx = plane.viewpoint.x - point.x;
    const dy = plane.viewpoint.y - point.y;
    const length = Math.hypot(dx, dy) || 1;
    normal = vec3(dx / length, dy / length, 0);
  }
  const contributions = fixtures
    .map((fixture) => ({ fixtureId: fixture.id, lx: cellwiseIlluminance(fixture, point, normal) }))
    .filter((entry) => entry.lx > 0)
    .sort((a, b) => b.lx - a.lx);
  const half = spec.grid.spacingM / 2;
  return {
    kind: hot ? 'hot' : 'dark',
    reason: kindFlag === 1 ? 'over target' : kindFlag === 2 ? 'beams pile up' : 'under target',
    centre: { x: sumX / cells.length, y: sumY / cells.length },
    bounds: { minX: minX - half, maxX: maxX + half, minY: minY - half, maxY: maxY + half },
    areaM2,
    extremeLx: Math.max(0, values[extremeIndex]),
    extremeAt,
    fixtures: contributions,
  };
}
