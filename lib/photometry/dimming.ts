/**
 * Dimmer level (0–100 %) to light output (fraction of full). Curve definitions vary by maker and are
 * user-selectable (REFERENCE-CHECKS §8):
 * - 'linear': light ∝ level (typical of LED fixtures' own curves).
 * - 'square': light ∝ level² (the conventional "square law" curve).
 * - 'incandescent': a linear-voltage dimmer on a tungsten lamp: V ∝ level and light ∝ V^3.4
 *   (lamp exponent, IES Lighting Handbook / Van Horn 1965), so 50 % level gives 9.47 % light.
 */
import { clamp, requireFinite } from '../numeric';

export type DimmingCurve = 'linear' | 'square' | 'incandescent';

export const DIMMING_CURVES: readonly DimmingCurve[] = ['linear', 'square', 'incandescent'];

/** Exponent of light output on lamp voltage for gas-filled tungsten lamps. */
export const TUNGSTEN_LIGHT_EXPONENT = 3.4;

/** Exponent of colour temperature on lamp voltage for tungsten lamps (approximate). */
export const TUNGSTEN_CCT_EXPONENT = 0.42;

function exponentOf(curve: DimmingCurve): number {
  switch (curve) {
    case 'linear':
      return 1;
    case 'square':
      return 2;
    case 'incandescent':
      return TUNGSTEN_LIGHT_EXPONENT;
    default: {
      const unknown: never = curve;
      throw new RangeError(`unknown dimming curve ${String(unknown)}`);
    }
  }
}

/** Light output as a fraction of full (0–1) at `levelPct` (clamped to 0–100) on `curve`. */
export function lightFractionAtLevel(levelPct: number, curve: DimmingCurve): number {
  requireFinite(levelPct, 'level');
  return Math.pow(clamp(levelPct, 0, 100) / 100, exponentOf(curve));
}

/** Level (0–100 %) that gives `fraction` (clamped to 0–1) of full light on `curve`. */
export function levelForLightFraction(fraction: number, curve: DimmingCurve): number {
  requireFinite(fraction, 'light fraction');
  return 100 * Math.pow(clamp(fraction, 0, 1), 1 / exponentOf(curve));
}

/** Lamp voltage as a fraction of rated that gives `lightFraction` of full light from a tungsten lamp. */
export function tungstenVoltageFraction(lightFraction: number): number {
  requireFinite(lightFraction, 'light fraction');
  return Math.pow(clamp(lightFraction, 0, 1), 1 / TUNGSTEN_LIGHT_EXPONENT);
}

/** Colour temperature (K) of a tungsten lamp rated `ratedK` when dimmed to `lightFraction` of full. */
export function tungstenColourTemperatureK(ratedK: number, lightFraction: number): number {
  requireFinite(ratedK, 'rated colour temperature');
  return ratedK * Math.pow(tungstenVoltageFraction(lightFraction), TUNGSTEN_CCT_EXPONENT);
}
