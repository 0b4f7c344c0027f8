/**
 * Synthetic photometric files written by the tests from analytic distributions (invented data, no
 * maker's file): LM-63 in any of its layouts and EULUMDAT with any symmetry.
 */

export type Intensity = (gammaDeg: number, cDeg: number) => number;

/** Angles from `from` to `to` inclusive every `step`. */
export function range(from: number, to: number, step: number): number[] {
  const values: number[] = [];
  for (let value = from; value <= to + 1e-9; value += step) values.push(Math.round(value * 1e9) / 1e9);
  return values;
}

export const isotropic =
  (cd: number): Intensity =>
  () =>
    cd;

/** I0·cos γ in the lower hemisphere, 0 above. */
export const lambertian =
  (peakCd: number): Intensity =>
  (gamma) =>
    gamma >= 90 ? 0 : peakCd * Math.cos((gamma * Math.PI) / 180);

/** I0·cosⁿγ in the lower hemisphere (REFERENCE-CHECKS §4). */
export const cosinePower =
  (peakCd: number, power: number): Intensity =>
  (gamma) =>
    gamma >= 90 ? 0 : peakCd * Math.cos((gamma * Math.PI) / 180) ** power;

/** An asymmetric distribution with no symmetry at all: brighter toward C 60°. */
export const lopsided: Intensity = (gamma, c) =>
  gamma >= 90
    ? 0
    : 1000 * Math.cos((gamma * Math.PI) / 180) ** 4 * (1.5 + 0.4 * Math.cos(((c - 60) * Math.PI) / 180));

/** Symmetric about C0–C180 and C90–C270 (an oval: narrow toward C0, wide toward C90). */
export const oval: Intensity = (gamma, c) => {
  const rad = (c * Math.PI) / 180;
  const power = 30 * Math.cos(rad) ** 2 + 6 * Math.sin(rad) ** 2;
  return gamma >= 90 ? 0 : 5000 * Math.cos((gamma * Math.PI) / 180) ** power;
};

export interface Lm63Options {
  readonly version?: '1986' | '1991' | '1995' | '2002' | '2019';
  readonly vertical: readonly number[];
  readonly horizontal: readonly number[];
  readonly intensity: Intensity;
  readonly lamps?: number;
  /** −1 for absolute photometry. */
  readonly lumensPerLamp?: number;
  readonly multiplier?: number;
  readonly photometricType?: number;
  readonly unitsType?: number;
  readonly dimensions?: readonly [number, number, number];
  readonly ballastFactor?: number;
  readonly tilt?: string;
  readonly perLine?: number;
  readonly separator?: string;
  readonly lineEnd?: string;
  /** Round values to this many decimals (files carry few). */
  readonly decimals?: number;
}

/** An LM-63 file; intensities written are intensity / multiplier. */
export function writeLm63(options: Lm63Options): string {
  const version = options.version ?? '2002';
  const lines: string[] = [];
  if (version === '1991') lines.push('IESNA91');
  else if (version === '2019') lines.push('IES:LM-63-2019');
  else if (version !== '1986') lines.push(`IESNA:LM-63-${version}`);
  if (version === '1986') {
    lines.push('Synthetic test distribution (invented)');
  } else {
    lines.push('[TEST] SYNTHETIC-1', '[TESTLAB] none (synthetic)', '[ISSUEDATE] 2024-01-01');
    lines.push('[MANUFAC] none (synthetic test data)', '[LUMINAIRE] Synthetic distribution');
    lines.push('[MORE] written by the tests from a formula');
  }
  lines.push(`TILT=${options.tilt ?? 'NONE'}`);
  const multiplier = options.multiplier ?? 1;
  const [width, length, height] = options.dimensions ?? [0, 0, 0];
  const separator = options.separator ?? ' ';
  lines.push(
    [
      options.lamps ?? 1,
      options.lumensPerLamp ?? -1,
      multiplier,
      options.vertical.length,
      options.horizontal.length,
      options.photometricType ?? 1,
      options.unitsType ?? 2,
      width,
      length,
      height,
    ].join(separator),
  );
  lines.push([options.ballastFactor ?? 1, version === '2019' ? '1.00001' : 1, 100].join(separator));
  const wrap = (values: readonly number[]) => {
    const perLine = options.perLine ?? 10;
    for (let index = 0; index < values.length; index += perLine) {
      lines.push(values.slice(index, index + perLine).join(separator));
    }
  };
  wrap(options.vertical);
  wrap(options.horizontal);
  const decimals = options.decimals ?? 6;
  for (const c of options.horizontal) {
    wrap(
      options.vertical.map((gamma) => Number((options.intensity(gamma, c) / multiplier).toFixed(decimals))),
    );
  }
  return lines.join(options.lineEnd ?? '\r\n') + (options.lineEnd ?? '\r\n');
}

export interface EulumdatOptions {
  readonly isym: 0 | 1 | 2 | 3 | 4;
  /** All C angles over 0…360 (Mc of them). */
  readonly cAngles: readonly number[];
  readonly gammas: readonly number[];
  /** Absolute intensity wanted, cd; the file stores cd/klm of `lampFluxLm`. */
  readonly intensity: Intensity;
  readonly lampFluxLm?: number;
  readonly lamps?: number;
  readonly conversion?: number;
  readonly decimals?: number;
  readonly decimalComma?: boolean;
}

/** The C planes an EULUMDAT file stores for its Isym. */
export function storedCAngles(isym: number, cAngles: readonly number[]): number[] {
  const count = cAngles.length;
  switch (isym) {
    case 1:
      return [cAngles[0]];
    case 2:
      return cAngles.slice(0, count / 2 + 1);
    case 3:
      return cAngles.slice(count / 4, (3 * count) / 4 + 1);
    case 4:
      return cAngles.slice(0, count / 4 + 1);
    default:
      return [...cAngles];
  }
}

/** An EULUMDAT file (one value per line). */
export function writeEulumdat(options: EulumdatOptions): string {
  const flux = options.lampFluxLm ?? 1000;
  const conversion = options.conversion ?? 1;
  const decimals = options.decimals ?? 6;
  const format = (value: number) => {
    const text = String(Number(value.toFixed(decimals)));
    return options.decimalComma ? text.replace('.', ',') : text;
  };
  const cAngles = options.cAngles;
  const lines: string[] = [
    'Synthetic test data (invented)',
    options.isym === 1 ? '1' : '3',
    String(options.isym),
    String(cAngles.length),
    String(cAngles.length > 1 ? cAngles[1] - cAngles[0] : 0),
    String(options.gammas.length),
    String(options.gammas[1] - options.gammas[0]),
    'REPORT-1',
    'Synthetic distribution',
    'SYN-1',
    'synthetic.ldt',
    '2024-01-01 tests',
    '200',
    '0',
    '300',
    '150',
    '0',
    '0',
    '0',
    '0',
    '0',
    '100',
    '80',
    String(conversion),
    '0',
    '1',
    String(options.lamps ?? 1),
    'synthetic lamp',
    String(flux),
    '3200',
    '1A',
    '100',
  ];
  for (let index = 0; index < 10; index += 1) lines.push('0.5');
  lines.push(...cAngles.map(String), ...options.gammas.map(String));
  for (const c of storedCAngles(options.isym, cAngles)) {
    for (const gamma of options.gammas) {
      lines.push(format((options.intensity(gamma, c) * 1000) / flux / conversion));
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}
