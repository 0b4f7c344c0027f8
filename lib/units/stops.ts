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
