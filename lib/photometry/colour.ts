/**
 * Colour temperature and filters. Mired = 10⁶ / K; a conversion filter shifts mireds by a constant,
 * so T_out = 10⁶ / (10⁶ / T_in + ΔM) (REFERENCE-CHECKS §7). A filter's transmission multiplies output.
 */
import { requireFinite, requirePositive } from '../numeric';

/** Mired value of a colour temperature in kelvin. */
export function kelvinToMired(temperatureK: number): number {
  return 1e6 / requirePositive(temperatureK, 'colour temperature');
}

/** Colour temperature in kelvin of a mired value. */
export function miredToKelvin(mired: number): number {
  return 1e6 / requirePositive(mired, 'mired value');
}

/** Colour temperature after a filter shifting `shiftMired`. Throws if the result is not a real temperature. */
export function applyMiredShift(temperatureK: number, shiftMired: number): number {
  requireFinite(shiftMired, 'mired shift');
  const mired = kelvinToMired(temperatureK) + shiftMired;
  if (mired <= 0) {
    throw new RangeError(
      `a ${shiftMired} mired shift from ${temperatureK} K leaves no real colour temperature`,
    );
  }
  return 1e6 / mired;
}

/** Mired shift that converts `fromK` to `toK` (positive: warmer, as an orange filter). */
export function miredShiftBetween(fromK: number, toK: number): number {
  return kelvinToMired(toK) - kelvinToMired(fromK);
}

export interface Filter {
  /** Fraction of light passed, 0–1. */
  readonly transmission: number;
  /** Mired shift, + warmer, − cooler; 0 for a non-conversion colour. */
  readonly miredShift: number;
}

/** Filters stacked in one frame: transmissions multiply, mired shifts add. Throws for transmission outside 0–1. */
export function combineFilters(filters: readonly Filter[]): Filter {
  let transmission = 1;
  let miredShift = 0;
  for (const filter of filters) {
    requireFinite(filter.transmission, 'filter transmission');
    if (filter.transmission < 0 || filter.transmission > 1) {
      throw new RangeError(`filter transmission must be between 0 and 1 (got ${filter.transmission})`);
    }
    transmission *= filter.transmission;
    miredShift += requireFinite(filter.miredShift, 'filter mired shift');
  }
  return { transmission, miredShift };
}
