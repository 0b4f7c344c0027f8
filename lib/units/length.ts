/** Lengths: metres inside, feet and inches as a display choice (1 ft = 0.3048 m exactly, NIST SP 811). */

/** One international foot in metres (exact by the 1959 agreement). */
export const METRES_PER_FOOT = 0.3048;

/** One inch in metres (exact). */
export const METRES_PER_INCH = 0.0254;

/** Metres to feet. */
export function metresToFeet(lengthM: number): number {
  return lengthM / METRES_PER_FOOT;
}

/** Feet to metres. */
export function feetToMetres(lengthFt: number): number {
  return lengthFt * METRES_PER_FOOT;
}

export type LengthUnitSystem = 'metric' | 'imperial';

export type LengthParseResult = { ok: true; valueM: number } | { ok: false; message: string };

const UNIT_TO_METRES: Record<string, number> = {
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  cm: 0.01,
  mm: 0.001,
  ft: METRES_PER_FOOT,
  foot: METRES_PER_FOOT,
  feet: METRES_PER_FOOT,
  "'": METRES_PER_FOOT,
  '′': METRES_PER_FOOT,
  in: METRES_PER_INCH,
  inch: METRES_PER_INCH,
  inches: METRES_PER_INCH,
  '"': METRES_PER_INCH,
  '″': METRES_PER_INCH,
  "''": METRES_PER_INCH,
};

const NUMBER = String.raw`[+-]?(?:\d+(?:\.\d*)?|\.\d+)`;
const TERM = new RegExp(
  String.raw`^(${NUMBER})\s*(mm|cm|metres?|meters?|m|feet|foot|ft|''|'|′|inch(?:es)?|in|"|″)?`,
  'i',
);

/**
 * Parse a length typed by a user: `3.81 m`, `381 cm`, `12' 6"`, `12'6"`, `12 ft 6 in`, `6"`, or a bare
 * number in `bareUnit`. Returns metres, or a message saying what is wrong; never throws.
 */
export function parseLength(text: string, bareUnit: LengthUnitSystem = 'metric'): LengthParseResult {
  const source = text.trim();
  if (source === '') return { ok: false, message: 'Enter a length, e.g. 3.8 m or 12\' 6"' };
  let rest = source;
  let totalM = 0;
  let terms = 0;
  let sign = 1;
  let sawBare = false;
  while (rest.length > 0) {
    const match = TERM.exec(rest);
    if (!match) {
      return { ok: false, message: `"${source}" is not a length: cannot read "${rest}"` };
    }
    let value = Number(match[1]);
    if (terms === 0 && match[1].startsWith('-')) {
      sign = -1;
      value = Math.abs(value);
    } else if (terms > 0 && match[1].startsWith('-')) {
      return { ok: false, message: `"${source}" is not a length: only the first part may be negative` };
    }
    const unit = match[2]?.toLowerCase();
    if (unit === undefined) {
      if (terms > 0 || sawBare) {
        // A trailing bare number after feet means inches, as in 12' 6.
        if (terms === 1 && /['′]|ft|feet|foot/i.test(source.slice(0, source.length - rest.length))) {
          totalM += value * METRES_PER_INCH;
        } else {
          return { ok: false, message: `"${source}" is not a length: give a unit for "${match[1]}"` };
        }
      } else {
        totalM += value * (bareUnit === 'metric' ? 1 : METRES_PER_FOOT);
        sawBare = true;
      }
    } else {
      totalM += value * UNIT_TO_METRES[unit];
    }
    terms += 1;
    rest = rest.slice(match[0].length).trimStart();
  }
  const valueM = sign * totalM;
  if (!Number.isFinite(valueM)) return { ok: false, message: `"${source}" is too large` };
  return { ok: true, valueM };
}

/** Format metres as feet and inches, e.g. 3.81 → `12' 6"`; inches rounded to `inchStep` (default 1). */
export function formatFeetInches(lengthM: number, inchStep = 1): string {
  if (!Number.isFinite(lengthM)) return '—';
  const sign = lengthM < 0 ? '-' : '';
  const totalInches = Math.round(Math.abs(lengthM) / METRES_PER_INCH / inchStep) * inchStep;
  const feet = Math.floor(totalInches / 12 + 1e-9);
  const inches = totalInches - feet * 12;
  const inchText = Number.isInteger(inches) ? String(inches) : inches.toFixed(1);
  if (feet === 0 && inches === 0) return `0' 0"`;
  return `${sign}${feet}' ${inchText}"`;
}

/** Format metres with a unit for display, in metres (`3.81 m`) or feet and inches. */
export function formatLength(lengthM: number, system: LengthUnitSystem, decimals = 2): string {
  if (!Number.isFinite(lengthM)) return '—';
  return system === 'metric' ? `${lengthM.toFixed(decimals)} m` : formatFeetInches(lengthM);
}
