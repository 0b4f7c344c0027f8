/** Reading and writing the numbers typed into a NumberInput, with the allowed range in words. */

export interface NumberRule {
  readonly min: number;
  readonly max: number;
  /** The value must be strictly greater than min (e.g. an ISO or a shutter time above 0). */
  readonly minExclusive?: boolean;
  /** Only whole numbers. */
  readonly integer?: boolean;
  /** Empty text means "none" (null). */
  readonly optional?: boolean;
  /** Accept a fraction such as 1/50. */
  readonly allowFraction?: boolean;
  /** Unit shown after the number and accepted when typed after it: "%", "°", "kg". */
  readonly unit?: string;
}

export type NumberParseResult = { ok: true; value: number | null } | { ok: false; message: string };

const DECIMAL = String.raw`[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?`;
const PLAIN = new RegExp(`^${DECIMAL}$`, 'i');
const FRACTION = new RegExp(`^(${DECIMAL})\\s*/\\s*(${DECIMAL})$`, 'i');

/** A number with its unit: "100 %", "30°". */
export function withUnit(value: number | string, unit: string | undefined): string {
  if (!unit) return String(value);
  return unit === '°' ? `${value}°` : `${value} ${unit}`;
}

/** The allowed range in words: "a number from 0 to 100 %", "a whole number from 1 to 99999". */
export function describeRange(rule: NumberRule): string {
  const kind = rule.integer ? 'a whole number' : 'a number';
  const span = rule.minExclusive
    ? `above ${rule.min} up to ${withUnit(rule.max, rule.unit)}`
    : `from ${rule.min} to ${withUnit(rule.max, rule.unit)}`;
  return `${kind} ${span}${rule.optional ? ', or leave it empty' : ''}`;
}

/** Short range for a field's hint: "0–100 %", "above 0, up to 60 s". */
export function rangeHint(rule: NumberRule): string {
  return rule.minExclusive
    ? `above ${rule.min}, up to ${withUnit(rule.max, rule.unit)}`
    : withUnit(`${rule.min}–${rule.max}`, rule.unit);
}

/** Read typed text as a number within the rule; never clamps, never throws. */
export function parseNumberText(text: string, rule: NumberRule): NumberParseResult {
  let source = text.trim().replace(/\u2212/g, '-');
  if (source === '') {
    return rule.optional
      ? { ok: true, value: null }
      : { ok: false, message: `Enter ${describeRange(rule)}.` };
  }
  if (rule.unit && source.toLowerCase().endsWith(rule.unit.toLowerCase())) {
    source = source.slice(0, source.length - rule.unit.length).trim();
  }
  let value = Number.NaN;
  const fraction = rule.allowFraction ? FRACTION.exec(source) : null;
  if (fraction) value = Number(fraction[1]) / Number(fraction[2]);
  else if (PLAIN.test(source)) value = Number(source);
  if (!Number.isFinite(value)) {
    return { ok: false, message: `"${text.trim()}" is not a number: enter ${describeRange(rule)}.` };
  }
  if (rule.integer && !Number.isInteger(value)) {
    return { ok: false, message: `${source} is not a whole number: enter ${describeRange(rule)}.` };
  }
  const belowMin = rule.minExclusive ? value <= rule.min : value < rule.min;
  if (belowMin || value > rule.max) {
    return {
      ok: false,
      message: `${withUnit(source, rule.unit)} is out of range: enter ${describeRange(rule)}.`,
    };
  }
  return { ok: true, value };
}

/** A value as the field shows it: at most `decimals` places, trailing zeros dropped. */
export function formatNumberText(value: number | null, decimals = 2): string {
  if (value === null || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(decimals)));
}
