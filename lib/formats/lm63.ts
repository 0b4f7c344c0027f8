/**
 * Reader for IES LM-63 photometric files (REFERENCE-CHECKS §5a): the 1986 layout (no header line),
 * 1991 (`IESNA91`), 1995, 2002 and 2019 (`IESNA:LM-63-YYYY` / `IES:LM-63-YYYY`), keyword lines with
 * [MORE] continuations, TILT=NONE, TILT=INCLUDE (read and kept, not applied: it describes lamp-tilt
 * losses of discharge lamps) and TILT=<file> (not read; a warning says so). Only photometric type C
 * is read; types A and B are refused, never misread. Values may be separated by spaces, tabs, commas
 * and line breaks. Candela = file value × candela multiplier × ballast factor.
 */
import {
  type CandelaGrid,
  MAX_GRID_VALUES,
  MAX_HORIZONTAL_ANGLES,
  MAX_VERTICAL_ANGLES,
  symmetryOfPlanes,
} from './candelaGrid';
import { PhotometryFileError } from './errors';
import type { ParsedPhotometry } from './distribution';
import { NumberCursor, checkedLines, clip, tokensFrom } from './text';

/** Feet to metres, exact (international foot). */
const FOOT_M = 0.3048;

/** How many lines may come before TILT= (keywords and labels). */
const MAX_HEADER_LINES = 1000;

/** Parse the text of an LM-63 file; throws PhotometryFileError naming the line of the first problem. */
export function readLm63(text: string, fileName: string): ParsedPhotometry {
  const lines = checkedLines(text, fileName);
  const fail = (line: number | null, problem: string): never => {
    throw new PhotometryFileError(fileName, line, problem);
  };
  const warnings: string[] = [];
  const first = lines[0].trim();
  const header = /^IES(?:NA)?\s*:\s*LM-63-(\d{4})\b/i.exec(first);
  let formatVersion: string;
  let index: number;
  if (header) {
    formatVersion = `LM-63-${header[1]}`;
    index = 1;
  } else if (/^IESNA\s*91\b/i.test(first)) {
    formatVersion = 'LM-63-1991';
    index = 1;
  } else {
    formatVersion = 'LM-63-1986';
    index = 0;
  }

  const keywords: Record<string, string> = {};
  let lastKeyword: string | null = null;
  let tiltIndex = -1;
  for (; index < lines.length && index < MAX_HEADER_LINES; index += 1) {
    const line = lines[index].trim();
    if (/^TILT\s*=/i.test(line)) {
      tiltIndex = index;
      break;
    }
    const keyword = /^\[([^\]]{1,40})\]\s*(.*)$/.exec(line);
    if (keyword) {
      const key = keyword[1].toUpperCase();
      if (key === 'MORE' && lastKeyword !== null) {
        keywords[lastKeyword] = `${keywords[lastKeyword]}\n${keyword[2]}`;
      } else {
        keywords[key] = keywords[key] === undefined ? keyword[2] : `${keywords[key]}\n${keyword[2]}`;
        lastKeyword = key;
      }
    } else if (line !== '') {
      keywords[`LABEL${index + 1}`] = line;
      if (formatVersion >= 'LM-63-1991')
        warnings.push(`line ${index + 1}: not a [KEYWORD] line; kept as a label`);
    }
  }
  if (tiltIndex < 0) {
    fail(
      header ? 1 : Math.min(lines.length, MAX_HEADER_LINES),
      'no "TILT=" line follows the header: this is not an IES LM-63 photometric file',
    );
  }
  const tilt = lines[tiltIndex].trim().replace(/^TILT\s*=\s*/i, '');
  const cursor = new NumberCursor(tokensFrom(lines, tiltIndex + 1), fileName, lines.length);

  if (/^INCLUDE$/i.test(tilt)) {
    const geometryLine = cursor.line();
    const geometry = cursor.next('the lamp-to-luminaire geometry (TILT=INCLUDE)');
    if (![1, 2, 3].includes(geometry))
      fail(geometryLine, `lamp-to-luminaire geometry must be 1, 2 or 3, found ${geometry}`);
    const countLine = cursor.line();
    const count = cursor.next('the number of tilt angles');
    if (!Number.isInteger(count) || count < 1 || count > 1000) {
      fail(countLine, `the number of tilt angles must be a whole number from 1 to 1000, found ${count}`);
    }
    const angles = readList(cursor, count, 'tilt angle').values;
    const factors = readList(cursor, count, 'tilt factor').values;
    keywords.TILT = `INCLUDE geometry ${geometry}; angles ${angles.join(' ')}; factors ${factors.join(' ')}`;
    warnings.push('TILT=INCLUDE: the lamp-tilt factors were read and kept but are not applied');
  } else if (/^NONE$/i.test(tilt)) {
    keywords.TILT = 'NONE';
  } else {
    keywords.TILT = tilt;
    warnings.push(`TILT=${clip(tilt)}: a separate tilt file is not read; intensities are used as measured`);
  }

  const lamps = whole(cursor, 'the number of lamps', 1, 1000, fail);
  const lumensLine = cursor.line();
  const lumensPerLamp = cursor.next('the lumens per lamp');
  const absolute = lumensPerLamp === -1;
  if (!absolute && lumensPerLamp <= 0) {
    fail(
      lumensLine,
      `lumens per lamp must be −1 (absolute photometry) or greater than 0, found ${lumensPerLamp}`,
    );
  }
  const multiplierLine = cursor.line();
  const multiplier = cursor.next('the candela multiplier');
  if (multiplier <= 0)
    fail(multiplierLine, `the candela multiplier must be greater than 0, found ${multiplier}`);
  const verticalCount = whole(cursor, 'the number of vertical angles', 2, MAX_VERTICAL_ANGLES, fail);
  const horizontalCount = whole(cursor, 'the number of horizontal angles', 1, MAX_HORIZONTAL_ANGLES, fail);
  const typeLine = cursor.line();
  const photometricType = cursor.next('the photometric type');
  if (photometricType === 2 || photometricType === 3) {
    fail(
      typeLine,
      `photometric type ${photometricType} (type ${photometricType === 2 ? 'B' : 'A'}) is not supported: only type C files (photometric type 1) can be read, and a type ${photometricType === 2 ? 'B' : 'A'} grid would be misread`,
    );
  }
  if (photometricType !== 1)
    fail(typeLine, `photometric type must be 1 (C), 2 (B) or 3 (A), found ${photometricType}`);
  const unitsLine = cursor.line();
  const unitsType = cursor.next('the units type');
  if (unitsType !== 1 && unitsType !== 2)
    fail(unitsLine, `units type must be 1 (feet) or 2 (metres), found ${unitsType}`);
  const toMetres = unitsType === 1 ? FOOT_M : 1;
  const widthM = cursor.next('the luminous width') * toMetres;
  const lengthM = cursor.next('the luminous length') * toMetres;
  const heightM = cursor.next('the luminous height') * toMetres;
  if (verticalCount * horizontalCount > MAX_GRID_VALUES) {
    fail(
      typeLine,
      `${verticalCount} × ${horizontalCount} candela values is more than the ${MAX_GRID_VALUES} this reads`,
    );
  }

  const ballastLine = cursor.line();
  const ballastFactor = cursor.next('the ballast factor');
  if (ballastFactor <= 0)
    fail(ballastLine, `the ballast factor must be greater than 0, found ${ballastFactor}`);
  if (ballastFactor !== 1) warnings.push(`ballast factor ${ballastFactor} is applied to every candela value`);
  const generationType = cursor.next(
    formatVersion >= 'LM-63-2019' ? 'the file generation type' : 'the future-use value',
  );
  const inputWatts = cursor.next('the input watts');
  if (formatVersion >= 'LM-63-2019') keywords.FILEGENTYPE = String(generationType);

  const verticalList = readList(cursor, verticalCount, 'vertical angle');
  checkAscending(verticalList, 'vertical', 0, 180, fail);
  const vertical = verticalList.values;
  if (
    !(vertical[0] === 0 || vertical[0] === 90) ||
    !(vertical[verticalCount - 1] === 90 || vertical[verticalCount - 1] === 180)
  ) {
    warnings.push(
      `vertical angles run ${vertical[0]}°–${vertical[verticalCount - 1]}°; LM-63 type C expects 0°–90°, 90°–180° or 0°–180° (no light is assumed outside)`,
    );
  }
  const horizontalLine = cursor.line();
  const horizontalList = readList(cursor, horizontalCount, 'horizontal angle');
  checkAscending(horizontalList, 'horizontal', 0, 360, fail);
  const horizontal = horizontalList.values;
  const symmetry = symmetryOfPlanes(horizontal);
  if (symmetry === null) {
    fail(
      horizontalLine,
      `horizontal angles ${horizontal[0]}°…${horizontal[horizontalCount - 1]}° fit no type C symmetry: they must start at 0° and end at 0°, 90°, 180° or above 180° up to 360°, or run 90°–270° (check the angle counts)`,
    );
  }

  const scale = multiplier * ballastFactor;
  const candelaCd: number[][] = [];
  for (let plane = 0; plane < horizontalCount; plane += 1) {
    const row: number[] = [];
    for (let gamma = 0; gamma < verticalCount; gamma += 1) {
      const line = cursor.line();
      const value = cursor.next(
        `the candela value at horizontal ${horizontal[plane]}°, vertical ${vertical[gamma]}°`,
      );
      if (value < 0) {
        fail(
          line,
          `negative candela value ${value} at horizontal ${horizontal[plane]}°, vertical ${vertical[gamma]}°`,
        );
      }
      const cd = value * scale;
      if (!Number.isFinite(cd) || cd > 1e12) fail(line, `candela value ${value} is too large`);
      row.push(cd);
    }
    candelaCd.push(row);
  }
  const rest = cursor.rest();
  if (rest.some((token) => /\d/.test(token.text))) {
    fail(
      rest[0].line,
      `${rest.length} more value${rest.length === 1 ? '' : 's'} follow the candela table: the angle counts (${verticalCount} vertical, ${horizontalCount} horizontal) do not match the data`,
    );
  }
  if (rest.length > 0) warnings.push(`line ${rest[0].line}: text after the candela table was ignored`);

  const grid: CandelaGrid = {
    symmetry: symmetry as NonNullable<typeof symmetry>,
    verticalAnglesDeg: vertical,
    horizontalAnglesDeg: horizontal,
    candelaCd,
  };
  if (candelaCd.every((row) => row.every((value) => value === 0))) {
    fail(horizontalLine, 'every candela value is 0: there is no light to use');
  }
  return {
    format: 'lm63',
    formatVersion,
    fileName,
    title:
      (keywords.LUMINAIRE ?? keywords.LUMCAT ?? keywords.TEST ?? fileName).split('\n')[0].trim() || fileName,
    grid,
    ratedLampLumens: absolute ? null : lamps * lumensPerLamp,
    inputWatts: Number.isFinite(inputWatts) && inputWatts > 0 ? inputWatts : null,
    luminousOpening: { widthM, lengthM, heightM },
    keywords,
    warnings,
    originalText: text,
  };
}

interface NumberList {
  readonly values: number[];
  /** The line each value is on. */
  readonly lines: number[];
}

function readList(cursor: NumberCursor, count: number, what: string): NumberList {
  const values: number[] = [];
  const lines: number[] = [];
  for (let index = 0; index < count; index += 1) {
    lines.push(cursor.line());
    values.push(cursor.next(`${what} ${index + 1} of ${count}`));
  }
  return { values, lines };
}

function whole(
  cursor: NumberCursor,
  what: string,
  low: number,
  high: number,
  fail: (line: number, problem: string) => never,
): number {
  const line = cursor.line();
  const value = cursor.next(what);
  if (!Number.isInteger(value) || value < low || value > high) {
    fail(line, `${what} must be a whole number from ${low} to ${high}, found ${value}`);
  }
  return value;
}

function checkAscending(
  list: NumberList,
  what: string,
  low: number,
  high: number,
  fail: (line: number, problem: string) => never,
): void {
  const angles = list.values;
  angles.forEach((angle, index) => {
    const line = list.lines[index];
    if (angle < low || angle > high) {
      fail(
        line,
        `${what} angle ${index + 1} is ${angle}°; type C ${what} angles lie within ${low}°–${high}°`,
      );
    }
    if (index > 0 && !(angle > angles[index - 1])) {
      fail(
        line,
        `${what} angles are out of order: ${angles[index - 1]}° is followed by ${angle}° (they must ascend)`,
      );
    }
  });
}
