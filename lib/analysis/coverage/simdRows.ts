/**
 * The round kernel's inner loop for a plane lit from above in WebAssembly SIMD (simd/lightRows.wat),
 * two cells at a time, and the module memory it works in. It gives the same bits as the JavaScript
 * loop (same operations in the same order, IEEE 754 per lane); where WebAssembly or its SIMD is
 * missing (or a content policy forbids compiling it) the JavaScript loop is used.
 *
 * A batch copies the grid's values into the module's memory, makes every profile table the batch needs
 * resident there, lets the kernel run (roundKernel.ts writes row records and reads back the near-axis
 * cells), and copies the values back. Memory layout: values (cells + 2), row records (32 bytes a row),
 * near-axis entries (8 bytes a cell), then the tables.
 */
import type { ProfileTable } from './profileTable';
import { LIGHT_ROWS_WASM_BASE64 } from './simd/simdRowsModule';

type LightRows = (
  x0: number,
  spacing: number,
  ax: number,
  cosEdge: number,
  positionScale: number,
  deferBelow: number,
  scaled: number,
  maxPosition: number,
  coefficients: number,
  values: number,
  rows: number,
  rowCount: number,
  near: number,
) => number;

export const RECORD_BYTES = 32;
const PAGE_BYTES = 65536;
/** Past this many bytes of tables, the resident ones are dropped and a batch loads only its own. */
const TABLE_AREA_LIMIT = 64 * 1024 * 1024;

interface Loaded {
  readonly memory: WebAssembly.Memory;
  readonly lightRows: LightRows;
}

let loaded: Loaded | null | undefined;

function load(): Loaded | null {
  if (loaded !== undefined) return loaded;
  loaded = null;
  try {
    if (typeof WebAssembly === 'undefined' || typeof atob !== 'function') return null;
    const text = atob(LIGHT_ROWS_WASM_BASE64);
    const bytes = new Uint8Array(text.length);
    for (let index = 0; index < text.length; index += 1) bytes[index] = text.charCodeAt(index);
    if (!WebAssembly.validate(bytes)) return null; // no SIMD here
    const instance = new WebAssembly.Instance(new WebAssembly.Module(bytes), {});
    loaded = {
      memory: instance.exports.memory as WebAssembly.Memory,
      lightRows: instance.exports.lightRows as LightRows,
    };
  } catch {
    loaded = null; // e.g. a content security policy without 'wasm-unsafe-eval'
  }
  return loaded;
}

/** How many profile tables are resident in the module's memory now (for tests of the table area). */
export function residentTableCount(): number {
  return resident.size;
}

/** Whether the SIMD loop can run here. */
export function simdRowsAvailable(): boolean {
  return load() !== null;
}

/** What the kernel uses during a batch. */
export interface SimdBatch {
  /** The grid's values, in the module's memory, for the length of the batch. */
  readonly values: Float64Array;
  /** Row records as doubles (4 a record: dy² + dz², along) and as 32-bit integers (8 a record). */
  readonly recordsF64: Float64Array;
  readonly recordsI32: Int32Array;
  /** Near-axis entries: (record, column) pairs. */
  readonly near: Int32Array;
  /** Where a table's coefficients are in the module's memory, or undefined if not resident. */
  tableAddress(table: ProfileTable): number | undefined;
  /** Run the loop over `recordCount` records for one beam; returns how many near-axis entries it wrote. */
  lightRows(
    x0: number,
    spacing: number,
    ax: number,
    table: ProfileTable,
    scaled: number,
    recordCount: number,
  ): number;
}

const resident = new Map<ProfileTable, number>();
let layoutFor = '';
let tablesAt = 0;
let tablesEnd = 0;

function ensureBytes(memory: WebAssembly.Memory, bytes: number): void {
  const missing = bytes - memory.buffer.byteLength;
  if (missing > 0) memory.grow(Math.ceil(missing / PAGE_BYTES));
}

/**
 * Run `work` with a batch over `values` (a grid of `rows` rows) and `tables` resident; null to `work`
 * where SIMD is unavailable (then nothing is copied). The kernel is synchronous, so batches never
 * overlap. Past `tableAreaLimit` bytes of resident tables, the others are dropped first.
 */
export function withSimdRows<T>(
  values: Float64Array,
  rows: number,
  tables: Iterable<ProfileTable>,
  work: (batch: SimdBatch | null) => T,
  tableAreaLimit = TABLE_AREA_LIMIT,
): T {
  const loadedModule = load();
  if (!loadedModule) return work(null);
  const cells = values.length;
  const valuesBytes = Math.ceil(((cells + 2) * 8) / 16) * 16;
  const recordsAt = valuesBytes;
  const nearAt = recordsAt + rows * RECORD_BYTES;
  const layout = `${cells}:${rows}`;
  if (layout !== layoutFor) {
    resident.clear();
    layoutFor = layout;
    tablesAt = nearAt + cells * 8;
    tablesEnd = tablesAt;
  }
  const wanted = [...new Set(tables)];
  const needed = wanted.filter((table) => !resident.has(table));
  const neededBytes = needed.reduce((sum, table) => sum + table.coefficients.byteLength, 0);
  if (tablesEnd + neededBytes - tablesAt > tableAreaLimit) {
    resident.clear();
    tablesEnd = tablesAt;
    needed.splice(0, needed.length, ...wanted);
  }
  try {
    ensureBytes(
      loadedModule.memory,
      tablesEnd + needed.reduce((sum, table) => sum + table.coefficients.byteLength, 0),
    );
  } catch {
    return work(null); // no memory to grow into: the JavaScript loop, on the grid itself
  }
  // Views only after any growth (growing detaches the old buffer).
  const buffer = loadedModule.memory.buffer;
  for (const table of needed) {
    new Float64Array(buffer, tablesEnd, table.coefficients.length).set(table.coefficients);
    resident.set(table, tablesEnd);
    tablesEnd += table.coefficients.byteLength;
  }
  const batchValues = new Float64Array(buffer, 0, cells);
  batchValues.set(values);
  new Float64Array(buffer, cells * 8, 2).fill(0);
  const batch: SimdBatch = {
    values: batchValues,
    recordsF64: new Float64Array(buffer, recordsAt, rows * (RECORD_BYTES / 8)),
    recordsI32: new Int32Array(buffer, recordsAt, rows * (RECORD_BYTES / 4)),
    near: new Int32Array(buffer, nearAt, cells * 2),
    // Only the batch's own tables: others may be resident from earlier batches, but were not asked for.
    tableAddress: (table) => (wanted.includes(table) ? resident.get(table) : undefined),
    lightRows: (x0, spacing, ax, table, scaled, recordCount) =>
      loadedModule.lightRows(
        x0,
        spacing,
        ax,
        table.cosEdge,
        table.positionScale,
        table.deferBelow,
        scaled,
        // Cells outside the edge are clamped to a real piece (their light is masked away); lit ones
        // never reach past the last piece (at most intervals + a rounding).
        table.intervals + 0.5,
        resident.get(table) ?? 0,
        0,
        recordsAt,
        recordCount,
        nearAt,
      ),
  };
  try {
    return work(batch);
  } finally {
    values.set(batchValues);
  }
}
