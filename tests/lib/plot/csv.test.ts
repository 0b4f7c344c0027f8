import { describe, expect, it } from 'vitest';
import { parseCsv, toCsv } from '@/lib/plot/csv';

interface Row {
  name: string;
  watts: number | null;
}

const columns = [
  { header: 'Name', value: (row: Row) => row.name },
  { header: 'Watts', value: (row: Row) => row.watts },
];

describe('CSV', () => {
  it('writes quotes, commas, line breaks and non-Latin text so they read back field by field', () => {
    const rows: Row[] = [
      { name: 'Box boom, "left"', watts: 750 },
      { name: 'Сцена 上手\nline two', watts: null },
      { name: '=SUM(A1)', watts: 0.5 },
      { name: '-1/2 CTO', watts: -0 },
      { name: '+1 cmd', watts: -0.5 },
      { name: '@SUM(A1)', watts: -2 },
      { name: '\tTab', watts: 1e-7 },
      { name: '-2+3', watts: null },
    ];
    const text = toCsv(rows, columns);
    // RFC 4180: fields with commas, quotes or line breaks are quoted and inner quotes doubled.
    expect(text).toContain('"Box boom, ""left"""');
    expect(text.startsWith('\uFEFFName,Watts\r\n')).toBe(true);
    expect(parseCsv(text)).toEqual([
      ['Name', 'Watts'],
      ['Box boom, "left"', '750'],
      ['Сцена 上手\nline two', ''],
      // OWASP "CSV injection": a text cell starting with = + - @ tab or CR gets a leading apostrophe;
      // numbers are never escaped (JS String(−0) is "0", String(1e-7) is "1e-7").
      ["'=SUM(A1)", '0.5'],
      ["'-1/2 CTO", '0'],
      ["'+1 cmd", '-0.5'],
      ["'@SUM(A1)", '-2'],
      ["'\tTab", '1e-7'],
      ["'-2+3", ''],
    ]);
  });

  it('reports malformed quoting with its row', () => {
    expect(() => parseCsv('a,b\r\n"open,1\r\n')).toThrow(/CSV row/);
  });
});
