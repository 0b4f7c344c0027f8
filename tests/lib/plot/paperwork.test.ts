import { describe, expect, it } from 'vitest';
import { type Fixture, focusChartCsv, focusChartRows, scheduleCsv, scheduleRows } from '@/lib/plot';
import { parseCsv } from '@/lib/plot/csv';
import { describeAcross, describeUpDown } from '@/lib/plot/paperwork';
import { tinyPlot, unit } from './tinyPlot';

// A second, free-standing unit with awkward text: quotes, a comma, a line break and Japanese.
const boxUnit: Fixture = {
  ...unit,
  id: 'fx-2',
  positionId: null,
  unit: null,
  purpose: 'Box "A", 上手',
  mount: { x: 2, y: -3, z: 4.6 },
  focus: { x: -1.5, y: -0.5, z: 1.6 },
  channel: 12,
  circuit: '2/45',
  levelPct: 62.5,
  filter: { name: 'pale straw, ½', transmission: 0.8, miredShift: 20, displayColour: '#ffe8a0' },
  notes: 'line one\nline two — «ok»',
};

// Listed free-standing first in the file, so the hanging order has to move it after the pipe.
const plot = tinyPlot({ fixtures: [boxUnit, unit] });

describe('fixture schedule', () => {
  it('lists units in hanging order with type power and weight (tinyPlot: 750 W, 8 kg)', () => {
    const rows = scheduleRows(plot);
    expect(rows.map((row) => row.fixtureId)).toEqual(['fx-1', 'fx-2']);
    expect(rows[0]).toMatchObject({
      position: 'Front pipe',
      unit: 1,
      type: 'Profile 26°',
      channel: 1,
      circuit: 'A1',
      powerW: 750,
      weightKg: 8,
    });
    expect(rows[1]).toMatchObject({ position: null, filter: 'pale straw, ½', levelPct: 62.5 });
  });

  it('CSV reads back field by field with quotes, commas, line breaks and non-Latin text intact', () => {
    const cells = parseCsv(scheduleCsv(plot));
    expect(cells[0]).toEqual([
      'Position',
      'Unit',
      'Type',
      'Purpose',
      'Channel',
      'Circuit / dimmer',
      'Level (%)',
      'Filter',
      'Power (W)',
      'Weight (kg)',
      'Notes',
      'Fixture id',
    ]);
    expect(cells).toHaveLength(3);
    expect(cells[1]).toEqual([
      'Front pipe',
      '1',
      'Profile 26°',
      'centre',
      '1',
      'A1',
      '100',
      '',
      '750',
      '8',
      '',
      'fx-1',
    ]);
    expect(cells[2]).toEqual([
      '(free-standing)',
      '',
      'Profile 26°',
      'Box "A", 上手',
      '12',
      '2/45',
      '62.5',
      'pale straw, ½',
      '750',
      '8',
      'line one\nline two — «ok»',
      'fx-2',
    ]);
  });

  it('CSV writes text from the file that starts like a formula as text; numbers stay bare', () => {
    // OWASP "CSV injection": text cells starting with = + - @ get a leading apostrophe.
    const risky: Fixture = {
      ...unit,
      purpose: '=HYPERLINK("x")',
      filter: { name: '-1/2 CTO', transmission: 0.7, miredShift: -50, displayColour: '#d8e8ff' },
      notes: '-2+3',
    };
    const cells = parseCsv(scheduleCsv(tinyPlot({ fixtures: [risky] })));
    const cell = (header: string) => cells[1][cells[0].indexOf(header)];
    expect(cell('Purpose')).toBe(`'=HYPERLINK("x")`);
    expect(cell('Filter')).toBe("'-1/2 CTO");
    expect(cell('Notes')).toBe("'-2+3");
    expect(cell('Level (%)')).toBe('100');
  });
});

describe('focus chart', () => {
  it('focus points from the centre line and the setting line, worked by hand', () => {
    // Plot axes (README): +x stage left, +y upstage, origin on the centre line at the setting line.
    expect(describeAcross(0, 'metric')).toBe('on CL');
    expect(describeUpDown(2, 'metric')).toBe('2.00 m US');
    expect(describeAcross(-1.5, 'metric')).toBe('1.50 m SR');
    expect(describeUpDown(-0.5, 'metric')).toBe('0.50 m DS');
    expect(describeAcross(0.3048 * 4, 'metric')).toBe('1.22 m SL');
    // 2 m = 78.74 in → 79 in = 6' 7"; 1.5 m = 59.06 in → 4' 11"; 0.5 m = 19.69 in → 1' 8" (1 in = 25.4 mm).
    expect(describeUpDown(2, 'imperial')).toBe(`6' 7" US`);
    expect(describeAcross(-1.5, 'imperial')).toBe(`4' 11" SR`);
    expect(describeUpDown(-0.5, 'imperial')).toBe(`1' 8" DS`);
  });

  it('aim and pool figures match the hand-worked tiny plot (same numbers as the report test)', () => {
    const [pipe, box] = focusChartRows(plot);
    expect(pipe.fixtureId).toBe('fx-1');
    // Throw √(4² + 4.4²) = 5.946 427 m; aimed straight upstage (180°); tilt atan(4.4/4) (Pythagoras).
    expect(pipe.throwM).toBeCloseTo(5.946427, 6);
    expect(pipe.panDeg).toBeCloseTo(180, 9);
    expect(pipe.tiltDeg).toBeCloseTo(47.726311, 6);
    // 2·d·tan(13°) and 2·d·tan(20°) (REFERENCE-CHECKS §3).
    expect(pipe.beamDiameterM).toBeCloseTo(2.745682, 6);
    expect(pipe.fieldDiameterM).toBeCloseTo(4.328645, 6);
    // Tilted-cone pool: far − near = 6.348176 − 2.466509 m, width 2.808229 m (REFERENCE-CHECKS §3).
    expect(pipe.beamPoolLengthM).toBeCloseTo(3.881667, 5);
    expect(pipe.beamPoolWidthM).toBeCloseTo(2.808229, 6);
    expect(pipe.beamPoolState).toBe('closed');
    expect(pipe.acrossM).toBe(0);
    expect(pipe.upstageM).toBe(2);
    // Box unit from (2, −3, 4.6) to (−1.5, −0.5, 1.6): dx = −3.5, dy = 2.5, drop 3 (by hand):
    // pan = atan2(dx, −dy) = −125.5377°, throw √27.5 = 5.244044 m, tilt atan(3/√18.5) = 34.8952°.
    expect(box.panDeg).toBeCloseTo(-125.537678, 5);
    expect(box.throwM).toBeCloseTo(5.244044, 6);
    expect(box.tiltDeg).toBeCloseTo(34.895227, 5);
    expect(box.beamDiameterM).toBeCloseTo(2.421366, 6);
    expect(box.lensOptionsDeg).toEqual([19, 26, 36, 50]);
  });

  it('CSV gives the rounded figures and the focus point in words', () => {
    const cells = parseCsv(focusChartCsv(plot));
    const header = cells[0];
    const cell = (row: number, name: string) => cells[row][header.indexOf(name)];
    expect(cells).toHaveLength(3);
    expect(cell(1, 'Across centre line')).toBe('on CL');
    expect(cell(1, 'Up/down from setting line')).toBe('2.00 m US');
    expect(cell(1, 'Throw (m)')).toBe('5.946');
    expect(cell(1, 'Pan (°)')).toBe('180');
    expect(cell(1, 'Tilt (°)')).toBe('47.7');
    expect(cell(1, 'Beam diameter (m)')).toBe('2.746');
    expect(cell(2, 'Across centre line')).toBe('1.50 m SR');
    expect(cell(2, 'Up/down from setting line')).toBe('0.50 m DS');
    expect(cell(2, 'Across (m, + stage left)')).toBe('-1.5');
    expect(cell(2, 'Pan (°)')).toBe('-125.5');
    expect(cell(2, 'Purpose')).toBe('Box "A", 上手');
    expect(cell(2, 'Notes')).toBe('line one\nline two — «ok»');
    expect(cell(2, 'Zoom setting (°)')).toBe('');
  });

  it('a unit aimed at itself has no aim figures and says why', () => {
    const stuck = { ...unit, focus: { ...unit.mount } };
    const [row] = focusChartRows(tinyPlot({ fixtures: [stuck] }));
    expect(row.throwM).toBeNull();
    expect(row.problem).toMatch(/zero throw/);
    const cells = parseCsv(focusChartCsv(tinyPlot({ fixtures: [stuck] })));
    expect(cells[1][cells[0].indexOf('Throw (m)')]).toBe('');
  });
});
