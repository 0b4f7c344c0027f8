/** Illuminance: lux inside; foot-candles as a display choice (1 fc = 1 lm/ft², NIST SP 811). */
import { METRES_PER_FOOT } from './length';

/** Lux in one foot-candle: 1 / 0.3048² = 10.763 910 416 709 72 lx (exact). */
export const LUX_PER_FOOTCANDLE = 1 / (METRES_PER_FOOT * METRES_PER_FOOT);

/** Lux to foot-candles. */
export function luxToFootcandles(illuminanceLx: number): number {
  return illuminanceLx / LUX_PER_FOOTCANDLE;
}

/** Foot-candles to lux. */
export function footcandlesToLux(illuminanceFc: number): number {
  return illuminanceFc * LUX_PER_FOOTCANDLE;
}

/** Format an illuminance for display in lx or fc; non-finite values show as a dash. */
export function formatIlluminance(illuminanceLx: number, system: 'metric' | 'imperial'): string {
  if (!Number.isFinite(illuminanceLx)) return '—';
  if (system === 'imperial') {
    const fc = luxToFootcandles(illuminanceLx);
    return `${fc >= 100 ? fc.toFixed(0) : fc.toFixed(1)} fc`;
  }
  return `${illuminanceLx >= 100 ? illuminanceLx.toFixed(0) : illuminanceLx.toFixed(1)} lx`;
}
