import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildReport, formatReportText, loadPlotText, powerSheetCsv } from '@/lib/plot';
import { parseCsv } from '@/lib/plot/csv';

function conference() {
  const loaded = loadPlotText(readFileSync('public/demo/conference.json', 'utf8'));
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  return loaded.document;
}

describe('power and weight in the report of the conference demo', () => {
  const report = buildReport(conference(), { spacingM: 0.5 });

  it('FT-2 carries seven 400 W washes: near its 80 % limit but within it (as shipped)', () => {
    const ft2 = report.power.circuits.find((entry) => entry.address === 'FT-2');
    // By hand: 7 × 400 = 2800 W; 2800 / 230 = 12.1739 A; of 16 A = 76.09 %.
    expect(ft2?.powerW).toBe(2800);
    expect(ft2?.currentA).toBeCloseTo(12.173913, 6);
    expect(ft2?.ratingPct).toBeCloseTo(76.086957, 5);
    expect(report.power.circuits.every((entry) => entry.flag === 'ok')).toBe(true);
    expect(report.power.unlisted).toEqual([]);
    expect(report.power.noCircuitUnitIds).toEqual([]);
  });

  it('totals per phase and the neutral of the demo by hand', () => {
    // L1: FT-1 = 2 × 350 + 3 × 400 = 1900 W; L2: FT-2 = 2800 W; L3: RT-1 5 × 400 + FL-1 4 × 80 = 2320 W.
    expect(report.power.phases.map((phase) => phase.powerW)).toEqual([1900, 2800, 2320]);
    expect(report.power.totalPowerW).toBe(7020);
    const [a, b, c] = [1900 / 230, 2800 / 230, 2320 / 230];
    // Phasor formula √(a² + b² + c² − ab − bc − ca) for unity power factor.
    expect(report.power.neutralCurrentA).toBeCloseTo(
      Math.sqrt(a * a + b * b + c * c - a * b - b * c - c * a),
      9,
    );
    // Imbalance: mean (1900 + 2800 + 2320) / 3 / 230; largest deviation is L1's or L2's.
    const mean = (a + b + c) / 3;
    expect(report.power.imbalancePct).toBeCloseTo(
      (Math.max(mean - a, b - mean, Math.abs(c - mean)) / mean) * 100,
      9,
    );
  });

  it('weight: the front truss holds 2 profiles of 19 kg and 10 washes of 17 kg, plus 1 kg each', () => {
    const front = report.weight.positions.find((position) => position.name === 'Front truss');
    // By hand: 38 + 170 = 208 kg, + 12 kg allowance = 220 kg, of 500 kg = 44 %; over 16 m = 13.75 kg/m.
    expect(front?.totalKg).toBe(220);
    expect(front?.ratingPct).toBeCloseTo(44, 9);
    expect(front?.kgPerM).toBeCloseTo(13.75, 9);
    expect(front?.flag).toBe('ok');
  });

  it('the text report carries both sections and both cautions', () => {
    const text = formatReportText(report, 'metric');
    expect(text).toContain('POWER CHECK (three phase, 230 V phase to neutral, 398 V line to line');
    expect(text).toContain('A qualified electrician and the local electrical code decide');
    expect(text).toContain('WEIGHT CHECK');
    expect(text).toContain('every unit needs its safety cable');
    expect(text).toMatch(/FT-2 +Truss distro +L2 +16 A +7 +2800 W +12\.17 A +76 % +OK/);
  });
});

describe('power sheet CSV', () => {
  it('one row per circuit, then feeders per phase, phase totals, neutral, total and the caution', () => {
    const rows = parseCsv(powerSheetCsv(conference()));
    expect(rows[0]).toEqual([
      'Row',
      'Circuit or feeder',
      'Feeder',
      'Phase',
      'Rating A',
      'Units',
      'Load W',
      'Load A',
      '% of rating',
      'Flag',
    ]);
    expect(rows[2]).toEqual([
      'circuit',
      'FT-2',
      'Truss distro',
      'L2',
      '16',
      '7',
      '2800',
      '12.17',
      '76.1',
      'OK',
    ]);
    expect(rows.filter((row) => row[0] === 'circuit').map((row) => row[1])).toEqual([
      'FT-1',
      'FT-2',
      'RT-1',
      'FL-1',
    ]);
    // Truss distro L2 at 12.17 A of 32 A = 38.0 %.
    expect(rows.find((row) => row[0] === 'feeder' && row[1] === 'Truss distro' && row[3] === 'L2')).toEqual([
      'feeder',
      'Truss distro',
      'Truss distro',
      'L2',
      '32',
      '',
      '2800',
      '12.17',
      '38',
      'OK',
    ]);
    expect(rows.filter((row) => row[0] === 'phase total').map((row) => row[6])).toEqual([
      '1900',
      '2800',
      '2320',
    ]);
    expect(rows.find((row) => row[0] === 'total')?.[6]).toBe('7020');
    expect(rows.at(-1)?.[1]).toMatch(/^Planning estimates only\. A qualified electrician/);
  });

  it('flags an overloaded circuit and lists addresses that are not listed', () => {
    const document = conference();
    // Move three front-truss washes from FT-1 onto FT-2 and write an unlisted address on another unit.
    const fixtures = document.fixtures.map((unit) =>
      ['fx-2', 'fx-3', 'fx-5'].includes(unit.id)
        ? { ...unit, circuit: 'FT-2' }
        : unit.id === 'fx-13'
          ? { ...unit, circuit: 'X-9' }
          : unit,
    );
    const rows = parseCsv(powerSheetCsv({ ...document, fixtures }));
    // By hand: 10 × 400 = 4000 W; 4000 / 230 = 17.39 A; 108.7 % of 16 A.
    expect(rows[2]).toEqual([
      'circuit',
      'FT-2',
      'Truss distro',
      'L2',
      '16',
      '10',
      '4000',
      '17.39',
      '108.7',
      'OVER RATING',
    ]);
    expect(rows.find((row) => row[0] === 'not listed')).toEqual([
      'not listed',
      'X-9',
      '',
      '',
      '',
      '1',
      '400',
      '1.74',
      '',
      'Not listed: no rating known',
    ]);
  });
});
