/**
 * Reader for EULUMDAT (.ldt) files (REFERENCE-CHECKS §5b; Stockmar 1990, 1998). A fixed layout of
 * one value per line: header fields on lines 1–26, six lines per lamp set, ten direct ratios, the C
 * angles, the γ angles, then the intensities in cd per 1000 lm of lamp flux for the planes the
 * symmetry (Isym) needs. Absolute cd = value × conversion factor × total lamp flux / 1000. A negative
 * number of lamps marks absolute photometry (the flux is then the luminaire's) [MEM]. Decimal commas
 * are accepted; lengths are in mm and kept in metres.
 */
import {
  type CandelaGrid,
  type Symmetry,
  MAX_GRID_VALUES,
  MAX_HORIZONTAL_ANGLES,
  MAX_VERTICAL_ANGLES,
  candelaGridProblems,
} from './candelaGrid';
import { PhotometryFileError } from './errors';
import type { ParsedPhotometry } from './distribution';
import { NumberCursor, type Token, checkedLines, clip, parseNumber } from './text';

const HEADER_LINES = 26;
const LAMP_SET_LINES = 6;

/** Parse the text of an EULUMDAT file; throws PhotometryFileError naming the line of the first problem. */
export function readEulumdat(text: string, fileName: string): ParsedPhotometry {
  const lines = checkedLines(text, fileName);
  const fail = (line: number | null, problem: string): never => {
    throw new PhotometryFileError(fileName, line, problem);
  };
  const warnings: string[] = [];
  const field = (lineNumber: number): string => {
    if (lineNumber > lines.length)
      fail(lines.length, `the file ends before line ${lineNumber} of the EULUMDAT header`);
    return lines[lineNumber - 1].trim();
  };
  const number = (lineNumber: number, what: string): number => {
    const text = field(lineNumber);
    const value = parseNumber(decimalPoint(text));
    if (value === null) fail(lineNumber, `expected a number for ${what}, found "${clip(text)}"`);
    return value as number;
  };
  const whole = (lineNumber: number, what: string, low: number, high: number): number => {
    const value = number(lineNumber, what);
    if (!Number.isInteger(value) || value < low || value > high) {
      fail(lineNumber, `${what} must be a whole number from ${low} to ${high}, found ${value}`);
    }
    return value;
  };

  const typeValue = whole(2, 'the type indicator Ityp', 0, 3);
  const isym = whole(3, 'the symmetry indicator Isym', 0, 4);
  const planeCount = whole(4, 'the number of C-planes Mc', 1, MAX_HORIZONTAL_ANGLES);
  const planeSpacing = number(5, 'the C-plane spacing Dc');
  const gammaCount = whole(6, 'the number of γ angles Ng', 2, MAX_VERTICAL_ANGLES);
  const gammaSpacing = number(7, 'the γ spacing Dg');
  if ((isym === 2 || isym === 3) && planeCount % 2 !== 0) {
    fail(4, `Mc = ${planeCount} C-planes cannot be halved for Isym ${isym}: it must be even`);
  }
  if ((isym === 3 || isym === 4) && planeCount % 4 !== 0) {
    fail(4, `Mc = ${planeCount} C-planes cannot be quartered for Isym ${isym}: it must be a multiple of 4`);
  }
  const mm = (lineNumber: number, what: string) => number(lineNumber, what) / 1000;
  const lengthM = mm(13, 'the luminaire length or diameter');
  const widthM = mm(14, 'the luminaire width');
  const heightM = mm(15, 'the luminaire height');
  const openingLengthM = mm(16, 'the luminous-area length or diameter');
  const openingWidthM = mm(17, 'the luminous-area width');
  for (let lineNumber = 18; lineNumber <= 21; lineNumber += 1) number(lineNumber, 'a luminous-area height');
  const downwardPct = number(22, 'the downward flux fraction DFF');
  const lightOutputPct = number(23, 'the light output ratio LORL');
  const conversion = number(24, 'the intensity conversion factor');
  if (conversion <= 0)
    fail(24, `the intensity conversion factor must be greater than 0, found ${conversion}`);
  const tiltDeg = number(25, 'the tilt during measurement');
  const setCount = whole(26, 'the number of lamp sets', 1, 50);

  let lampFluxLm = 0;
  let absolute = false;
  let watts = 0;
  for (let set = 0; set < setCount; set += 1) {
    const base = HEADER_LINES + set * LAMP_SET_LINES;
    const lamps = number(base + 1, `the number of lamps in set ${set + 1}`);
    if (!Number.isInteger(lamps) || lamps === 0) {
      fail(base + 1, `the number of lamps in set ${set + 1} must be a non-zero whole number, found ${lamps}`);
    }
    if (lamps < 0) absolute = true;
    field(base + 2);
    const flux = number(base + 3, `the lamp flux of set ${set + 1}`);
    if (flux <= 0) fail(base + 3, `the lamp flux of set ${set + 1} must be greater than 0 lm, found ${flux}`);
    lampFluxLm += flux;
    field(base + 4);
    field(base + 5);
    watts += Math.max(0, number(base + 6, `the wattage of set ${set + 1}`));
  }
  const ratiosStart = HEADER_LINES + setCount * LAMP_SET_LINES;
  for (let ratio = 1; ratio <= 10; ratio += 1) number(ratiosStart + ratio, `direct ratio ${ratio} of 10`);

  const cursor = new NumberCursor(numberTokens(lines, ratiosStart + 10), fileName, lines.length);
  const cLines: number[] = [];
  const cAngles: number[] = [];
  for (let index = 0; index < planeCount; index += 1) {
    cLines.push(cursor.line());
    cAngles.push(cursor.next(`C angle ${index + 1} of ${planeCount}`));
  }
  const gammaLine = cursor.line();
  const gammas: number[] = [];
  for (let index = 0; index < gammaCount; index += 1) {
    const line = cursor.line();
    const gamma = cursor.next(`γ angle ${index + 1} of ${gammaCount}`);
    if (gamma < 0 || gamma > 180)
      fail(line, `γ angle ${index + 1} is ${gamma}°; γ angles lie within 0°–180°`);
    if (index > 0 && !(gamma > gammas[index - 1])) {
      fail(
        line,
        `γ angles are out of order: ${gammas[index - 1]}° is followed by ${gamma}° (they must ascend)`,
      );
    }
    gammas.push(gamma);
  }
  for (let index = 0; index < planeCount; index += 1) {
    const angle = cAngles[index];
    if (angle < 0 || angle > 360)
      fail(cLines[index], `C angle ${index + 1} is ${angle}°; C angles lie within 0°–360°`);
    if (index > 0 && !(angle > cAngles[index - 1])) {
      fail(
        cLines[index],
        `C angles are out of order: ${cAngles[index - 1]}° is followed by ${angle}° (they must ascend)`,
      );
    }
  }

  const { symmetry, first, count } = storedPlanes(isym, planeCount);
  if (count * gammaCount > MAX_GRID_VALUES) {
    fail(4, `${count} × ${gammaCount} intensities is more than the ${MAX_GRID_VALUES} this reads`);
  }
  const horizontal = symmetry === 'rotational' ? [0] : cAngles.slice(first, first + count);
  const scale = (conversion * lampFluxLm) / 1000;
  const candelaCd: number[][] = [];
  for (let plane = 0; plane < count; plane += 1) {
    const row: number[] = [];
    for (let gamma = 0; gamma < gammaCount; gamma += 1) {
      const line = cursor.line();
      const value = cursor.next(`the intensity at C ${horizontal[plane]}°, γ ${gammas[gamma]}°`);
      if (value < 0)
        fail(line, `negative intensity ${value} cd/klm at C ${horizontal[plane]}°, γ ${gammas[gamma]}°`);
      const cd = value * scale;
      if (!Number.isFinite(cd) || cd > 1e12) fail(line, `intensity ${value} is too large`);
      row.push(cd);
    }
    candelaCd.push(row);
  }
  const rest = cursor.rest();
  if (rest.length > 0) {
    fail(
      rest[0].line,
      `${rest.length} more value${rest.length === 1 ? '' : 's'} follow the intensities: Mc, Ng or Isym do not match the data`,
    );
  }
  const grid: CandelaGrid = {
    symmetry,
    verticalAnglesDeg: gammas,
    horizontalAnglesDeg: horizontal,
    candelaCd,
  };
  const problems = candelaGridProblems(grid);
  if (problems.some((problem) => problem.startsWith('horizontalAnglesDeg'))) {
    fail(
      cLines[first] ?? gammaLine,
      `the stored C-planes ${horizontal[0]}°…${horizontal[horizontal.length - 1]}° do not fit Isym ${isym} (expected ${expectedRange(isym)})`,
    );
  }
  if (problems.length > 0) fail(gammaLine, problems[0]);
  if (candelaCd.every((row) => row.every((value) => value === 0)))
    fail(gammaLine, 'every intensity is 0: there is no light to use');
  if (!approximatelyEqual(planeSpacing * planeCount, 360) && planeSpacing !== 0 && isym !== 1) {
    warnings.push(
      `Dc = ${planeSpacing}° does not match Mc = ${planeCount} planes over 360°; the listed C angles are used`,
    );
  }
  if (gammaSpacing < 0) warnings.push(`Dg = ${gammaSpacing}° is negative; the listed γ angles are used`);
  if (tiltDeg !== 0) warnings.push(`measured with a tilt of ${tiltDeg}°; the intensities are used as given`);

  return {
    format: 'eulumdat',
    formatVersion: 'EULUMDAT',
    fileName,
    title: field(9) || field(1) || fileName,
    grid,
    ratedLampLumens: absolute ? null : lampFluxLm,
    inputWatts: watts > 0 ? watts : null,
    luminousOpening: { widthM: openingWidthM, lengthM: openingLengthM, heightM: 0 },
    keywords: {
      COMPANY: field(1),
      ITYP: String(typeValue),
      ISYM: String(isym),
      REPORT: field(8),
      LUMINAIRE: field(9),
      LUMINAIRE_NUMBER: field(10),
      FILE: field(11),
      DATE: field(12),
      SIZE_MM: `${lengthM * 1000} × ${widthM * 1000} × ${heightM * 1000}`,
      DFF: String(downwardPct),
      LORL: String(lightOutputPct),
    },
    warnings,
    originalText: text,
  };
}

function storedPlanes(
  isym: number,
  planeCount: number,
): { symmetry: Symmetry; first: number; count: number } {
  switch (isym) {
    case 1:
      return { symmetry: 'rotational', first: 0, count: 1 };
    case 2:
      return { symmetry: 'c0-c180', first: 0, count: planeCount / 2 + 1 };
    case 3:
      return { symmetry: 'c90-c270', first: planeCount / 4, count: planeCount / 2 + 1 };
    case 4:
      return { symmetry: 'quadrant', first: 0, count: planeCount / 4 + 1 };
    default:
      return planeCount === 1
        ? { symmetry: 'rotational', first: 0, count: 1 }
        : { symmetry: 'none', first: 0, count: planeCount };
  }
}

function expectedRange(isym: number): string {
  return ['C0 up to below C360', 'C0 only', 'C0…C180', 'C90…C270', 'C0…C90'][isym] ?? 'a known range';
}

/** "0,5" → "0.5" (a decimal comma), anything else unchanged. */
function decimalPoint(text: string): string {
  return /^[+-]?\d*,\d+$/.test(text) ? text.replace(',', '.') : text;
}

/** Tokens from `fromIndex` on, split on white space or semicolons, decimal commas read as points. */
function numberTokens(lines: readonly string[], fromIndex: number): Token[] {
  const tokens: Token[] = [];
  for (let index = fromIndex; index < lines.length; index += 1) {
    for (const text of lines[index].split(/[\s;]+/)) {
      if (text !== '' && text !== '\u001a') tokens.push({ text: decimalPoint(text), line: index + 1 });
    }
  }
  return tokens;
}

function approximatelyEqual(a: number, b: number): boolean {
  return Math.abs(a - b) < 1e-6 * Math.max(1, Math.abs(b));
}
