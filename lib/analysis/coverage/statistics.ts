/**
 * Figures of a light map over an area: E min, average and max, uniformity U0 = E min / E avg and
 * E min / E max (REFERENCE-CHECKS §9 definitions), and the share of the area within a target band.
 */

export interface TargetBand {
  /** The wanted illuminance, lx. */
  readonly targetLx: number;
  /** How far from the target (in stops either way) still counts as on target. */
  readonly toleranceStops: number;
}

export interface AreaStatistics {
  /** Cells counted (centres inside the area). */
  readonly cells: number;
  readonly minLx: number;
  readonly averageLx: number;
  readonly maxLx: number;
  /** E min / E avg (0 when the average is 0). */
  readonly uniformityMinToAverage: number;
  /** E min / E max (0 when the maximum is 0). */
  readonly uniformityMinToMax: number;
  /** Share of the cells within the target band, 0–1. */
  readonly withinTarget: number;
}

/** Statistics of `values` over the cells whose mask is 1 (all cells when mask is null); null if no cell counts. */
export function areaStatistics(
  values: Float64Array,
  mask: Uint8Array | null,
  band: TargetBand,
): AreaStatistics | null {
  let cells = 0;
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  let within = 0;
  const low = band.targetLx * 2 ** -band.toleranceStops;
  const high = band.targetLx * 2 ** band.toleranceStops;
  for (let index = 0; index < values.length; index += 1) {
    if (mask && mask[index] === 0) continue;
    // Incremental updates can leave −1e-13 where light was taken away: that is no light.
    const value = Math.max(0, values[index]);
    cells += 1;
    sum += value;
    if (value < min) min = value;
    if (value > max) max = value;
    if (value >= low && value <= high) within += 1;
  }
  if (cells === 0) return null;
  const average = sum / cells;
  return {
    cells,
    minLx: min,
    averageLx: average,
    maxLx: max,
    uniformityMinToAverage: average > 0 ? min / average : 0,
    uniformityMinToMax: max > 0 ? min / max : 0,
    withinTarget: within / cells,
  };
}
