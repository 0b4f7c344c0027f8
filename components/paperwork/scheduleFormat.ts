/** Display of the schedule's power and weight (SI inside; pounds are a display choice). */
import type { LengthUnitSystem } from '@/lib/units';

/** Pounds per kilogram (1 lb = 0.453 592 37 kg exactly, NIST SP 811). */
const LB_PER_KG = 1 / 0.45359237;

/** "750 W", or "—" when unknown. */
export function formatWatts(powerW: number | null): string {
  return powerW === null ? '—' : `${Number(powerW.toFixed(0))} W`;
}

/** "8 kg" or "17.6 lb", or "—" when unknown. */
export function formatWeight(weightKg: number | null, units: LengthUnitSystem): string {
  if (weightKg === null) return '—';
  return units === 'metric'
    ? `${Number(weightKg.toFixed(1))} kg`
    : `${Number((weightKg * LB_PER_KG).toFixed(1))} lb`;
}
