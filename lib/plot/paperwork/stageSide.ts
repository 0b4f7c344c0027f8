/**
 * Focus points in the crew's words: across from the centre line (SR / SL) and up or down from the
 * setting line (US / DS), in the show's display units. Plot coordinates: +x stage left, +y upstage.
 */
import { type LengthUnitSystem, formatLength } from '../../units';

/** Below this a point counts as on the line, m (half a centimetre; finer than any focus call). */
const ON_LINE_M = 0.005;

/** Distance from the centre line: "1.20 m SL", "4' 0\" SR", or "on CL". */
export function describeAcross(acrossM: number, units: LengthUnitSystem): string {
  if (!Number.isFinite(acrossM)) return '—';
  if (Math.abs(acrossM) < ON_LINE_M) return 'on CL';
  return `${formatLength(Math.abs(acrossM), units)} ${acrossM > 0 ? 'SL' : 'SR'}`;
}

/** Distance from the setting line: "2.30 m US", "1' 6\" DS", or "on setting line". */
export function describeUpDown(upstageM: number, units: LengthUnitSystem): string {
  if (!Number.isFinite(upstageM)) return '—';
  if (Math.abs(upstageM) < ON_LINE_M) return 'on setting line';
  return `${formatLength(Math.abs(upstageM), units)} ${upstageM > 0 ? 'US' : 'DS'}`;
}

/** The legend printed with focus positions. */
export const STAGE_SIDE_LEGEND =
  'Across: from the centre line (CL), SR = stage right, SL = stage left. ' +
  'Up/down: from the setting line, US = upstage, DS = downstage (toward the audience).';
