import { describe, expect, it } from 'vitest';
import { MAX_PHOTOMETRY_FILE_CHARS, PhotometryFileError, readPhotometryFile } from '@/lib/formats';
import { lambertian, range, writeEulumdat, writeLm63 } from './synthetic';

const LM63 = writeLm63({
  vertical: range(0, 90, 10),
  horizontal: [0, 90],
  intensity: lambertian(1000),
  decimals: 1,
}).split('\r\n');
// Lines: 1 header, 2–7 keywords, 8 TILT, 9 ten numbers, 10 three numbers, 11 vertical angles,
// 12 horizontal angles, 13 first plane's candela, 14 second plane's.
const lm63 = (edit: (lines: string[]) => void) => {
  const lines = [...LM63];
  edit(lines);
  return lines.join('\n');
};

function refusal(text: string, fileName = 'bad.ies'): PhotometryFileError {
  try {
    readPhotometryFile(text, fileName);
  } catch (error) {
    expect(error).toBeInstanceOf(PhotometryFileError);
    return error as PhotometryFileError;
  }
  throw new Error('expected the file to be refused');
}

describe('bad LM-63 files are refused with the line named', () => {
  it.each([
    [
      'a truncated file',
      lm63((lines) => lines.splice(13)),
      13,
      /the file ends before the candela value at horizontal 90°, vertical 0°/,
    ],
    [
      'too few vertical angles promised',
      lm63((lines) => (lines[8] = lines[8].replace(' 10 2 ', ' 9 2 '))),
      12,
      /horizontal angles 90°…0°|fit no type C symmetry|out of order/,
    ],
    [
      'too many vertical angles promised',
      lm63((lines) => (lines[8] = lines[8].replace(' 10 2 ', ' 11 2 '))),
      12,
      /vertical angles are out of order: 90° is followed by 0°/,
    ],
    [
      'extra values after the table',
      lm63((lines) => lines.push('5 5 5')),
      16,
      /3 more values follow the candela table/,
    ],
    [
      'a non-numeric value',
      lm63((lines) => (lines[13] = lines[13].replace('984.8', '98x4'))),
      14,
      /expected a number for the candela value at horizontal 90°, vertical 10°, found "98x4"/,
    ],
    [
      'a negative candela value',
      lm63((lines) => (lines[12] = lines[12].replace('984.8', '-984.8'))),
      13,
      /negative candela value -984.8 at horizontal 0°, vertical 10°/,
    ],
    [
      'vertical angles out of order',
      lm63((lines) => (lines[10] = lines[10].replace('20 30', '30 20'))),
      11,
      /vertical angles are out of order: 30° is followed by 20°/,
    ],
    [
      'a vertical angle beyond 180°',
      lm63((lines) => (lines[10] = lines[10].replace(' 90', ' 190'))),
      11,
      /vertical angle 10 is 190°/,
    ],
    ['horizontal angles of no symmetry', lm63((lines) => (lines[11] = '0 45')), 12, /fit no type C symmetry/],
    [
      'a zero multiplier',
      lm63((lines) => (lines[8] = lines[8].replace('1 -1 1 ', '1 -1 0 '))),
      9,
      /candela multiplier must be greater than 0/,
    ],
    [
      'lumens per lamp of 0',
      lm63((lines) => (lines[8] = lines[8].replace('1 -1 1 ', '1 0 1 '))),
      9,
      /lumens per lamp must be −1/,
    ],
    [
      'units type 3',
      lm63((lines) => (lines[8] = lines[8].replace(' 1 2 0 0 0', ' 1 3 0 0 0'))),
      9,
      /units type must be 1 \(feet\) or 2 \(metres\)/,
    ],
    [
      'a huge angle count',
      lm63((lines) => (lines[8] = lines[8].replace(' 10 2 ', ' 100000 2 '))),
      9,
      /number of vertical angles must be a whole number from 2 to 2000/,
    ],
    ['no TILT line', lm63((lines) => lines.splice(7, 1)), 1, /no "TILT=" line/],
    [
      'all zero candela',
      lm63(
        (lines) => (
          (lines[12] = lines[12].replace(/[\d.]+/g, '0')),
          (lines[13] = lines[13].replace(/[\d.]+/g, '0'))
        ),
      ),
      12,
      /every candela value is 0/,
    ],
    [
      'a NUL byte (binary junk)',
      lm63((lines) => (lines[4] = 'PK\u0003\u0004\u0000\u0000')),
      5,
      /binary file/,
    ],
    ['an empty file', '  \n ', 1, /empty/],
  ])('%s', (_label, text, line, message) => {
    const error = refusal(text);
    expect(error.line).toBe(line);
    expect(error.message).toMatch(message);
    expect(error.message).toMatch(new RegExp(`^bad\\.ies, line ${line}: `));
  });

  it(`refuses files over ${MAX_PHOTOMETRY_FILE_CHARS / 1e6} MB without reading them`, () => {
    const error = refusal(`${LM63.join('\n')}\n${' '.repeat(MAX_PHOTOMETRY_FILE_CHARS)}`);
    expect(error.line).toBeNull();
    expect(error.message).toMatch(/photometric files are limited to 2 MB/);
  });

  it('refuses text that is mostly undecodable bytes', () => {
    expect(refusal('\ufffd'.repeat(500), 'junk.ies').message).toMatch(/not a text file/);
  });
});

describe('bad EULUMDAT files are refused with the line named', () => {
  const EULUMDAT = writeEulumdat({
    isym: 1,
    cAngles: [0],
    gammas: range(0, 90, 10),
    intensity: lambertian(100),
  }).split('\r\n');
  const ldt = (edit: (lines: string[]) => void) => {
    const lines = [...EULUMDAT];
    edit(lines);
    return lines.join('\n');
  };
  // Lines 27–32 lamp set, 33–42 direct ratios, 43 C angle, 44–53 γ angles, 54–63 intensities.
  it.each([
    ['a truncated header', ldt((lines) => lines.splice(20)), 20, /the file ends before line 21/],
    [
      'a non-numeric Mc',
      ldt((lines) => (lines[3] = 'twelve')),
      4,
      /expected a number for the number of C-planes Mc, found "twelve"/,
    ],
    ['Isym 5', ldt((lines) => (lines[2] = '5')), 3, /Isym must be a whole number from 0 to 4/],
    [
      'a zero lamp flux',
      ldt((lines) => (lines[28] = '0')),
      29,
      /lamp flux of set 1 must be greater than 0 lm/,
    ],
    [
      'truncated intensities',
      ldt((lines) => lines.splice(60)),
      60,
      /the file ends before the intensity at C 0°, γ 70°/,
    ],
    [
      'a negative intensity',
      ldt((lines) => (lines[54] = '-3')),
      55,
      /negative intensity -3 cd\/klm at C 0°, γ 10°/,
    ],
    [
      'γ angles out of order',
      ldt((lines) => (lines[45] = '5')),
      46,
      /γ angles are out of order: 10° is followed by 5°/,
    ],
    [
      'extra values',
      ldt((lines) => lines.splice(63, 0, '1', '2')),
      64,
      /2 more values follow the intensities/,
    ],
  ])('%s', (_label, text, line, message) => {
    const error = refusal(text, 'bad.ldt');
    expect(error.message).toMatch(message);
    expect(error.line).toBe(line);
  });
});
