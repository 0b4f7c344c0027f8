/** Stops and ratios: one stop is a factor of two in light (photographic common practice). */
import { requirePositive, requireFinite } from '../numeric';

/** Stops between two light levels: log2(ratio). Throws for a ratio that is not positive. */
export function ratioToStops(ratio: number): number {
  return Math.log2(requirePositive(ratio, 'ratio'));
}

/** Ratio of two light levels that are `stops` apart: 2^stops. */
export function stopsToRatio(stops: number): number {
  return 2 ** requireFinite(stops, 'stops');
}

/**
 * The photographers' lighting ratio (key + fill) : fill, as a single number, from key and fill
 * each measured alone (fill assumed to reach both sides of the face). Throws when fill is not positive.
 */
export function lightingRatio(keyLx: number, fillLx: number): number {
  requirePositive(fillLx, 'fill illuminance');
  return (requireFinite(keyLx, 'key illuminance') + fillLx) / fillLx;
}

/** Format a ratio as `3:1` (one decimal when not whole). */
export function formatRatio(ratio: number): string {
  if (!Number.isFinite(ratio) || ratio <= 0) return '—';
  const rounded = Math.round(ratio * 10) / 10;
  return `${Number.isInteger(rounded) ? rounded.toFixed(0) : rounded.toFixed(1)}:1`;
}

/**
 * Key alone over fill alone from the photographers' lighting ratio (key + fill) : fill = N:1, i.e.
 * N − 1: 2:1 is key = fill (one stop between the lit and the shaded side), 3:1 is key = 2 × fill.
 * The key is the brighter side by definition (key ≥ fill), so N is at least 2: null for N < 2 or a
 * value that is not a number (below 2:1 the fill would outshine the key, and the roles would swap).
 */
export function keyOverFillFromLightingRatio(ratio: number): number | null {
  return Number.isFinite(ratio) && ratio >= 2 ? ratio - 1 : null;
}

/**
 * Key alone over fill alone from key:fill in stops: 2^stops. The key is the brighter side by
 * definition, so stops are 0 (key = fill) or more: null for negative stops or a value that is not a number.
 */
export function keyOverFillFromStops(stops: number): number | null {
  return Number.isFinite(stops) && stops >= 0 ? 2 ** stops : null;
}

/** Reads "2:1", "2 : 1", "2.5:1" or a bare "2" as the number before the colon; null otherwise. */
export function parseRatioText(text: string): number | null {
  const match = /^\s*(\d+(?:\.\d+)?)\s*(?::\s*(\d+(?:\.\d+)?)\s*)?$/.exec(text);
  if (!match) return null;
  const first = Number(match[1]);
  const second = match[2] === undefined ? 1 : Number(match[2]);
  return second > 0 ? first / second : null;
}
