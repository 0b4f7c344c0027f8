/** Small display helpers shared by the panels (numbers arrive in SI; units are a display choice). */
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';
import type { DispatchResult } from '@/lib/plot';
import { type LengthUnitSystem, metresToFeet } from '@/lib/units';

/** An angle with one decimal: "47.7°". */
export function formatAngle(angleDeg: number): string {
  return Number.isFinite(angleDeg) ? `${angleDeg.toFixed(1)}°` : '—';
}

/** An angle without trailing zeros: "26°", "28.3°". */
export function formatAngleShort(angleDeg: number): string {
  return Number.isFinite(angleDeg) ? `${Number(angleDeg.toFixed(1))}°` : '—';
}

/** An area in m² (two decimals) or ft² (whole). */
export function formatArea(areaM2: number, units: LengthUnitSystem): string {
  if (!Number.isFinite(areaM2)) return '—';
  return units === 'metric' ? `${areaM2.toFixed(2)} m²` : `${(areaM2 * metresToFeet(1) ** 2).toFixed(0)} ft²`;
}

/** A weight in kg, without trailing zeros. */
export function formatKg(weightKg: number): string {
  return `${Number(weightKg.toFixed(1))} kg`;
}

/** What a field shows after a command: nothing when it was done, else the refusal. */
export function outcomeOf(result: DispatchResult): CommitOutcome {
  return result.ok ? null : result.message;
}

/** "1 fixture", "3 fixtures". */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  return `${count} ${count === 1 ? singular : plural}`;
}
