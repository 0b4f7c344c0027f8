/**
 * The grid a light map is computed on: cell centres on a plane at a height, over a rectangle of the
 * plan. Cell (column, row) has its centre at (minX + (column + ½)·spacing, minY + (row + ½)·spacing);
 * its index in every array is row·columns + column.
 */
import type { Vec3 } from '../../geometry/vector';

export interface GridSpec {
  readonly minX: number;
  readonly minY: number;
  readonly spacingM: number;
  readonly columns: number;
  readonly rows: number;
}

/** Where the light is measured: a horizontal plane, or vertical faces turned toward a viewpoint. */
export type CoveragePlane =
  | { readonly kind: 'horizontal'; readonly heightM: number }
  | { readonly kind: 'toward'; readonly heightM: number; readonly viewpoint: Vec3 };

export interface CoverageSpec {
  readonly grid: GridSpec;
  readonly plane: CoveragePlane;
}

/**
 * Which rows of a grid one part of a computation takes: rows r with r mod every = from. The rows are
 * dealt out in turn, so parts sharing a grid get about the same work wherever the beams fall.
 */
export interface RowShare {
  readonly every: number;
  readonly from: number;
}

export const EVERY_ROW: RowShare = { every: 1, from: 0 };

/**
 * The first row at or after `row` that belongs to `share`. Kept to small integers (`| 0`): a −0 from
 * `%` would make the optimiser carry the kernel's row numbers as doubles, which slows its loops.
 */
export function firstRowOfShare(row: number, share: RowShare): number {
  const offset = ((share.from - row) % share.every) | 0;
  return (row + (offset < 0 ? offset + share.every : offset)) | 0;
}

/** Most cells a grid may have (a 0.02 m grid over 20 m × 12 m, with room to spare). */
export const MAX_GRID_CELLS = 1_000_000;

/** A grid of `spacingM` cells covering a plan rectangle; throws for a spacing ≤ 0 or too many cells. */
export function gridOver(
  bounds: { minX: number; maxX: number; minY: number; maxY: number },
  spacingM: number,
): GridSpec {
  if (!(spacingM > 0) || !Number.isFinite(spacingM))
    throw new RangeError(`grid spacing must be greater than 0 (got ${spacingM})`);
  const columns = Math.max(1, Math.ceil((bounds.maxX - bounds.minX) / spacingM - 1e-9));
  const rows = Math.max(1, Math.ceil((bounds.maxY - bounds.minY) / spacingM - 1e-9));
  if (columns * rows > MAX_GRID_CELLS) {
    throw new RangeError(
      `a ${spacingM} m grid over this area has ${columns * rows} cells; the most is ${MAX_GRID_CELLS}`,
    );
  }
  return { minX: bounds.minX, minY: bounds.minY, spacingM, columns, rows };
}

export function cellCount(grid: GridSpec): number {
  return grid.columns * grid.rows;
}

export function cellCentreX(grid: GridSpec, column: number): number {
  return grid.minX + (column + 0.5) * grid.spacingM;
}

export function cellCentreY(grid: GridSpec, row: number): number {
  return grid.minY + (row + 0.5) * grid.spacingM;
}

/** True when the plan point is inside the polygon (even–odd rule; points on an edge may go either way). */
export function insidePolygon(x: number, y: number, polygon: readonly { x: number; y: number }[]): boolean {
  let inside = false;
  for (let index = 0, previous = polygon.length - 1; index < polygon.length; previous = index, index += 1) {
    const a = polygon[index];
    const b = polygon[previous];
    if (a.y > y !== b.y > y && x < ((b.x - a.x) * (y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** 1 for every cell whose centre lies inside the polygon, else 0. */
export function polygonMask(grid: GridSpec, polygon: readonly { x: number; y: number }[]): Uint8Array {
  const mask = new Uint8Array(cellCount(grid));
  for (let row = 0; row < grid.rows; row += 1) {
    const y = cellCentreY(grid, row);
    for (let column = 0; column < grid.columns; column += 1) {
      if (insidePolygon(cellCentreX(grid, column), y, polygon)) mask[row * grid.columns + column] = 1;
    }
  }
  return mask;
}
