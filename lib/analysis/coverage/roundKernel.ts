/**
 * The hot loop: one round beam's light on the cells of a grid. Only the rows that can meet the beam
 * (`rowRange`) and in each only the cells inside its edge (`rowInterval`) are visited; the model emits
 * nothing beyond the edge, so skipping them changes nothing. Per cell: one square root, one division,
 * the table polynomial (profileTable.ts) and one add, E = I0·f(θ)·cos i / d². Cells near the axis are
 * put aside and done after the row with the fine table or the closed form from the angle itself. A
 * horizontal plane lit from above has its own loop (cos i = −dz/d on every cell, the beam-angle count
 * by row interval), which inside a SIMD batch (simdRows.ts) becomes row records for the WebAssembly
 * loop, run after the rows; vertical faces and fixtures at or below the plane take the general loop.
 */
import type { Vec3 } from '../../geometry/vector';
import { type CoverageSpec, EVERY_ROW, type RowShare, firstRowOfShare } from './grid';
import { type ProfileTable, exactTableProfile, nearAxisProfile } from './profileTable';
import { RECORD_BYTES, type SimdBatch } from './simdRows';

export interface RoundBeam {
  readonly mount: Vec3;
  /** Unit vector along the beam. */
  readonly axis: Vec3;
  readonly peakCd: number;
  readonly table: ProfileTable;
}

export interface RoundTarget {
  readonly values: Float64Array;
  readonly overlaps: Uint16Array;
  /** During a SIMD batch (simdRows.ts, `values` is then its view): lit-from-above rows go to WebAssembly. */
  readonly simd?: SimdBatch | null;
}

export interface RoundNormals {
  readonly horizontal: boolean;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/** Whether x (along a row, relative to the fixture) is inside the cone: a·d > 0 and (a·d)² > cos²·|d|². */
function insideCone(axisX: number, k: number, cosSquared: number, m2: number, x: number): boolean {
  const along = axisX * x + k;
  return along > 0 && along * along > cosSquared * (x * x + m2);
}

/**
 * The x-interval (m, relative to the fixture) where a row line at (dy, dz) from the fixture lies
 * inside the cone cos θ > cosEdge about `axis`, written to `out` as [low, high]; false if none. A cone
 * of half-angle below 90° is convex, so a line meets it in one interval: the boundaries solve
 * (a·d)² = cos²·|d|², and the pieces between them are tested for a·d > 0 and lying inside.
 */
export function rowInterval(axis: Vec3, cosEdge: number, dy: number, dz: number, out: Float64Array): boolean {
  const k = axis.y * dy + axis.z * dz;
  const m2 = dy * dy + dz * dz;
  const c2 = cosEdge * cosEdge;
  const qa = axis.x * axis.x - c2;
  const qb = 2 * axis.x * k;
  const qc = k * k - c2 * m2;
  let first = Number.NaN;
  let second = Number.NaN;
  if (Math.abs(qa) < 1e-12) {
    if (Math.abs(qb) > 1e-15) first = -qc / qb;
  } else {
    // qb² − 4·qa·qc = 4c²·(k² + qa·m²), written so: the expanded form cancels to rounding noise when
    // the edge is near 90° (c → 0, a double root), and a row half inside the beam was lost.
    const discriminant = 4 * c2 * (k * k + qa * m2);
    if (discriminant >= 0) {
      const root = Math.sqrt(discriminant);
      const q = -0.5 * (qb + (qb >= 0 ? root : -root));
      if (q !== 0) {
        first = Math.min(q / qa, qc / q);
        second = Math.max(q / qa, qc / q);
      } else first = 0;
    }
  }
  if (Number.isNaN(first)) {
    // No boundary: the row is wholly inside or wholly outside.
    if (!insideCone(axis.x, k, c2, m2, 0)) return false;
    out[0] = -Infinity;
    out[1] = Infinity;
    return true;
  }
  const last = Number.isNaN(second) ? first : second;
  const leftInside = insideCone(axis.x, k, c2, m2, first - 1 - Math.abs(first));
  const middleInside = !Number.isNaN(second) && insideCone(axis.x, k, c2, m2, (first + second) / 2);
  const rightInside = insideCone(axis.x, k, c2, m2, last + 1 + Math.abs(last));
  if (!leftInside && !middleInside && !rightInside) return false;
  out[0] = leftInside ? -Infinity : middleInside ? first : last;
  out[1] = rightInside ? Infinity : middleInside ? last : first;
  return true;
}

/**
 * Rows (inclusive) that can meet the cone cos θ > cosEdge on the plane dz below/above the fixture: a row
 * at dy meets the double cone when (a_y·dy + a_z·dz)² ≥ (c² − a_x²)·(dy² + dz²), a quadratic in dy;
 * when it opens downward the rows lie between its roots (with one row of margin), otherwise any row
 * may. A superset: rowInterval decides each row exactly.
 */
function rowRange(
  axis: Vec3,
  cosEdge: number,
  dz: number,
  mountY: number,
  spec: CoverageSpec,
): { first: number; last: number } {
  const { grid } = spec;
  const g = cosEdge * cosEdge - axis.x * axis.x;
  const a = axis.y * axis.y - g;
  if (!(a < -1e-9)) return { first: 0, last: grid.rows - 1 };
  const b = 2 * axis.y * axis.z * dz;
  // b² − 4ac = 4·dz²·g·(1 − c²) for a unit axis, written so to keep clear of cancellation.
  const discriminant = 4 * dz * dz * g * (1 - cosEdge * cosEdge);
  if (!(discriminant >= 0)) return { first: 0, last: grid.rows - 1 };
  const root = Math.sqrt(discriminant);
  const one = (-b + root) / (2 * a);
  const other = (-b - root) / (2 * a);
  // Row r has dy = minY + (r + ½)·spacing − mountY.
  const first = Math.floor((mountY + Math.min(one, other) - grid.minY) / grid.spacingM - 0.5) - 1;
  const last = Math.ceil((mountY + Math.max(one, other) - grid.minY) / grid.spacingM - 0.5) + 1;
  // `| 0` (values are clamped to the grid first): Math.floor/ceil can give −0, after which the optimiser
  // may carry row and column numbers as doubles for good; the loops are much slower so.
  return {
    first: Math.max(0, Math.min(grid.rows, first)) | 0,
    last: Math.min(grid.rows - 1, Math.max(-1, last)) | 0,
  };
}

/** The closed form near the axis: θ = atan2(|a × d|, a · d), as the point-source functions take it. */
function nearAxis(
  table: ProfileTable,
  axis: Vec3,
  dx: number,
  dy: number,
  dz: number,
  along: number,
): number {
  const cx = axis.y * dz - axis.z * dy;
  const cy = axis.z * dx - axis.x * dz;
  const cz = axis.x * dy - axis.y * dx;
  return exactTableProfile(table, Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), along));
}

// Scratch space shared by every call (the kernel is synchronous and never re-entered).
const rowBounds = new Float64Array(2);
const beamBounds = new Float64Array(2);
let nearAxisScratch = new Int32Array(256);
// dy of each row record handed to the SIMD loop, for its near-axis cells.
let recordDy = new Float64Array(256);
const RECORD_DOUBLES = RECORD_BYTES / 8;
const RECORD_INTS = RECORD_BYTES / 4;

/**
 * The table's degree-5 polynomial at `position` (≥ deferBelow), by Estrin's scheme (shorter chains of
 * dependent operations than Horner's). The loop for a plane lit from above has it inlined by hand.
 */
export function tablePolynomial(coefficients: Float64Array, position: number): number {
  const slot = position | 0;
  const u = 2 * (position - slot) - 1;
  const base = slot * 6;
  const u2 = u * u;
  return (
    coefficients[base] +
    u * coefficients[base + 1] +
    u2 *
      (coefficients[base + 2] +
        u * coefficients[base + 3] +
        u2 * (coefficients[base + 4] + u * coefficients[base + 5]))
  );
}

/**
 * One row of a plane lit from above, in JavaScript (the loop simd/lightRows.wat does two cells at a time,
 * operation for operation): adds each lit cell's light and lists the near-axis cells in
 * `nearAxisColumns`; returns how many.
 */
function lightRowFromAbove(
  values: Float64Array,
  coefficients: Float64Array,
  nearAxisColumns: Int32Array,
  rowStart: number,
  firstColumn: number,
  lastColumn: number,
  x0: number,
  spacing: number,
  ax: number,
  alongRow: number,
  dy2dz2: number,
  cosEdge: number,
  positionScale: number,
  deferBelow: number,
  scaled: number,
): number {
  let nearAxisCount = 0;
  for (let column = firstColumn; column <= lastColumn; column += 1) {
    const dx = x0 + column * spacing;
    const inverseDistance = 1 / Math.sqrt(dx * dx + dy2dz2);
    const cosOffAxis = (dx * ax + alongRow) * inverseDistance;
    if (!(cosOffAxis > cosEdge)) continue; // as the SIMD loop tests it (a NaN would get no light in both)
    const position = (1 - cosOffAxis) * positionScale;
    if (position < deferBelow) {
      nearAxisColumns[nearAxisCount] = column;
      nearAxisCount += 1;
      continue;
    }
    const slot = position | 0;
    const u = 2 * (position - slot) - 1;
    const base = slot * 6;
    const u2 = u * u;
    const relative =
      coefficients[base] +
      u * coefficients[base + 1] +
      u2 *
        (coefficients[base + 2] +
          u * coefficients[base + 3] +
          u2 * (coefficients[base + 4] + u * coefficients[base + 5]));
    const index = rowStart + column;
    values[index] += scaled * relative * inverseDistance * inverseDistance * inverseDistance;
  }
  return nearAxisCount;
}

/** Add (sign +1) or take away (sign −1) one round beam's light on the cells it reaches, in `share`'s rows. */
export function accumulateRound(
  beam: RoundBeam,
  spec: CoverageSpec,
  normals: RoundNormals,
  target: RoundTarget,
  sign: 1 | -1,
  share: RowShare = EVERY_ROW,
): void {
  const { grid } = spec;
  const { mount, axis, table } = beam;
  const dz = spec.plane.heightM - mount.z;
  const fromAbove = normals.horizontal && dz <= -1e-6;
  if (normals.horizontal && !fromAbove && dz >= 0) return; // level with or below the plane: the light only grazes or misses it
  const { cosEdge, cosBeam, positionScale, deferBelow, coefficients } = table;
  const ax = axis.x;
  const values = target.values;
  const overlaps = target.overlaps;
  const spacing = grid.spacingM;
  const columns = grid.columns;
  const x0 = grid.minX + 0.5 * spacing - mount.x;
  const interval = rowBounds;
  // Cells near the axis (fine table or closed form) are put aside and done after each row's loop.
  if (nearAxisScratch.length < columns) nearAxisScratch = new Int32Array(columns);
  const nearAxisColumns = nearAxisScratch;
  const normalX = normals.x;
  const normalY = normals.y;
  // For a horizontal plane lit from above, cos i / d² = −dz / d³ on every cell.
  const scaled = sign * beam.peakCd * (fromAbove ? -dz : 1);
  const rows = rowRange(axis, cosEdge, dz, mount.y, spec);
  // Lit from above inside a SIMD batch: rows become records for the WebAssembly loop, run after the rows.
  const batch = fromAbove && target.simd ? target.simd : null;
  const vector = batch !== null && batch.tableAddress(table) !== undefined;
  if (vector && recordDy.length < grid.rows) recordDy = new Float64Array(grid.rows);
  let recordCount = 0;
  for (let row = firstRowOfShare(rows.first, share); row <= rows.last; row += share.every) {
    const dy = grid.minY + (row + 0.5) * spacing - mount.y;
    // Visit only the cells of this row inside the beam's edge (one cell of margin for rounding).
    if (!rowInterval(axis, cosEdge, dy, dz, interval)) continue;
    // Clamped before rounding, so an unbounded side (±Infinity) never reaches Math.floor: the optimiser
    // then keeps the column numbers as small integers instead of falling back to doubles.
    const lowCell = (interval[0] - x0) / spacing;
    const highCell = (interval[1] - x0) / spacing;
    const firstColumn = lowCell > 1 ? Math.min(columns, Math.floor(lowCell) - 1) | 0 : 0;
    const lastColumn = highCell < columns - 2 ? Math.max(-1, Math.ceil(highCell) + 1) | 0 : columns - 1;
    const rowStart = row * columns;
    const dy2dz2 = dy * dy + dz * dz;
    const alongRow = dy * axis.y + dz * axis.z;
    let nearAxisCount = 0;
    if (fromAbove) {
      if (vector) {
        const f64 = batch.recordsF64;
        const i32 = batch.recordsI32;
        f64[recordCount * RECORD_DOUBLES] = dy2dz2;
        f64[recordCount * RECORD_DOUBLES + 1] = alongRow;
        i32[recordCount * RECORD_INTS + 4] = rowStart;
        i32[recordCount * RECORD_INTS + 5] = firstColumn;
        i32[recordCount * RECORD_INTS + 6] = lastColumn;
        recordDy[recordCount] = dy;
        recordCount += 1;
      }
      if (!vector) {
        nearAxisCount = lightRowFromAbove(
          values,
          coefficients,
          nearAxisColumns,
          rowStart,
          firstColumn,
          lastColumn,
          x0,
          spacing,
          ax,
          alongRow,
          dy2dz2,
          cosEdge,
          positionScale,
          deferBelow,
          scaled,
        );
      }
      // Every cell here is lit, so the beam-angle count is the cells with cos θ ≥ cos hb: those a cell or
      // more inside the row's beam-angle interval at once, the few near its ends one by one.
      if (rowInterval(axis, cosBeam, dy, dz, beamBounds)) {
        const low = Math.max(-2, (beamBounds[0] - x0) / spacing);
        const high = Math.min(columns + 1, (beamBounds[1] - x0) / spacing);
        const outerFrom = Math.max(0, Math.floor(low) - 1) | 0;
        const outerTo = Math.min(columns - 1, Math.ceil(high) + 1) | 0;
        const innerFrom = Math.max(outerFrom, Math.ceil(low) + 1) | 0;
        const innerTo = Math.min(outerTo, Math.floor(high) - 1) | 0;
        const checkUntil = innerFrom <= innerTo ? innerFrom : outerTo + 1;
        let column = outerFrom;
        for (; column < checkUntil; column += 1) {
          const dx = x0 + column * spacing;
          if ((dx * ax + alongRow) * (1 / Math.sqrt(dx * dx + dy2dz2)) >= cosBeam)
            overlaps[rowStart + column] += sign;
        }
        for (; column <= innerTo; column += 1) overlaps[rowStart + column] += sign;
        for (; column <= outerTo; column += 1) {
          const dx = x0 + column * spacing;
          if ((dx * ax + alongRow) * (1 / Math.sqrt(dx * dx + dy2dz2)) >= cosBeam)
            overlaps[rowStart + column] += sign;
        }
      }
    } else {
      for (let column = firstColumn; column <= lastColumn; column += 1) {
        const dx = x0 + column * spacing;
        const distanceSquared = dx * dx + dy2dz2;
        if (distanceSquared < 1e-12) continue; // at the unit itself: no defined direction, no light
        const inverseDistance = 1 / Math.sqrt(distanceSquared);
        const cosOffAxis = (dx * ax + alongRow) * inverseDistance;
        if (cosOffAxis <= cosEdge) continue;
        const index = rowStart + column;
        // Incidence: the direction from the cell back to the fixture is −(dx, dy, dz).
        const cosIncidence = normals.horizontal
          ? -dz * inverseDistance
          : -(dx * normalX[index] + dy * normalY[index]) * inverseDistance;
        if (cosIncidence <= 0) continue;
        const position = (1 - cosOffAxis) * positionScale;
        if (position < deferBelow) {
          nearAxisColumns[nearAxisCount] = column;
          nearAxisCount += 1;
          continue;
        }
        values[index] +=
          scaled * tablePolynomial(coefficients, position) * cosIncidence * inverseDistance * inverseDistance;
        if (cosOffAxis >= cosBeam) overlaps[index] += sign;
      }
    }
    for (let entry = 0; entry < nearAxisCount; entry += 1) {
      const column = nearAxisColumns[entry];
      const dx = x0 + column * spacing;
      const inverseDistance = 1 / Math.sqrt(dx * dx + dy2dz2);
      const along = dx * ax + alongRow;
      const cosOffAxis = along * inverseDistance;
      const fine = nearAxisProfile(table, (1 - cosOffAxis) * positionScale);
      const relative = Number.isNaN(fine) ? nearAxis(table, axis, dx, dy, dz, along) : fine;
      const index = rowStart + column;
      // cos i / d² is 1/d³ here when lit from above (−dz is in `scaled`), else worked out as in the loop.
      const perDistanceSquared = fromAbove
        ? inverseDistance
        : normals.horizontal
          ? -dz * inverseDistance
          : -(dx * normalX[index] + dy * normalY[index]) * inverseDistance;
      values[index] += scaled * relative * perDistanceSquared * inverseDistance * inverseDistance;
      if (!fromAbove && cosOffAxis >= cosBeam) overlaps[index] += sign;
    }
  }
  if (vector && recordCount > 0) {
    // The rows in WebAssembly, then its near-axis cells here, as the loop above does them.
    const nearCount = batch.lightRows(x0, spacing, ax, table, scaled, recordCount);
    const near = batch.near;
    const f64 = batch.recordsF64;
    const i32 = batch.recordsI32;
    for (let entry = 0; entry < nearCount; entry += 1) {
      const record = near[entry * 2];
      const column = near[entry * 2 + 1];
      const dy = recordDy[record];
      const dx = x0 + column * spacing;
      const inverseDistance = 1 / Math.sqrt(dx * dx + f64[record * RECORD_DOUBLES]);
      const along = dx * ax + f64[record * RECORD_DOUBLES + 1];
      const fine = nearAxisProfile(table, (1 - along * inverseDistance) * positionScale);
      const relative = Number.isNaN(fine) ? nearAxis(table, axis, dx, dy, dz, along) : fine;
      values[i32[record * RECORD_INTS + 4] + column] +=
        scaled * relative * inverseDistance * inverseDistance * inverseDistance;
    }
  }
}
