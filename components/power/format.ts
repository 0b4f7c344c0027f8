/** Number formats of the power panel: W whole, A to 0.01, % whole. */
export const formatW = (valueW: number) => `${Number.isFinite(valueW) ? valueW.toFixed(0) : '—'} W`;
export const formatA = (valueA: number) => `${Number.isFinite(valueA) ? valueA.toFixed(2) : '—'} A`;
export const formatPct = (value: number | null) =>
  value === null || !Number.isFinite(value) ? '—' : `${value.toFixed(0)} %`;
/** A new circuit's rating when none is given: 16 A on a 200 V-or-more supply, else 20 A (common sizes). */
export const defaultCircuitRatingA = (phaseVoltageV: number) => (phaseVoltageV >= 200 ? 16 : 20);
