import { describe, expect, it } from 'vitest';
import { PLOT_VERSION, loadPlotText, savePlotText, plotDocument } from '@/lib/plot';
import { tinyPlot } from './tinyPlot';

function errorsOf(value: unknown): string[] {
  const result = loadPlotText(typeof value === 'string' ? value : JSON.stringify(value));
  if (result.ok) throw new Error('expected the file to be refused');
  return result.errors;
}

describe('loading plot files', () => {
  it('save → load gives an equal document', () => {
    const document = tinyPlot();
    const result = loadPlotText(savePlotText(document));
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.document).toEqual(document);
  });

  it('refuses text that is not JSON, saying so', () => {
    expect(errorsOf('{"format": "throwline-plot",')[0]).toMatch(/^\(the file\): is not valid JSON/);
    expect(errorsOf('[1, 2]')[0]).toMatch(/must be a JSON object/);
  });

  it('refuses other formats and files from a newer version', () => {
    expect(errorsOf({ format: 'something-else', version: 1 })[0]).toMatch(
      /^format: this is not a Throwline plot file/,
    );
    expect(errorsOf({ ...tinyPlot(), version: PLOT_VERSION + 1 })[0]).toMatch(/made by a newer Throwline/);
    expect(errorsOf({ ...tinyPlot(), version: 1.5 })[0]).toMatch(/^version: must be a whole number/);
  });

  it.each([
    [
      'a string where a number goes',
      (plot: any) => (plot.fixtures[0].focus.z = 'high'),
      'fixtures[0].focus.z: must be a number',
    ],
    ['a missing field', (plot: any) => delete plot.fixtures[0].levelPct, 'fixtures[0].levelPct: is missing'],
    [
      'a level over 100',
      (plot: any) => (plot.fixtures[0].levelPct = 140),
      'fixtures[0].levelPct: must be between 0 and 100',
    ],
    [
      'an unknown field',
      (plot: any) => (plot.fixtures[0].colour = 'red'),
      'fixtures[0]: has an unknown field "colour"',
    ],
    [
      'a dangling type',
      (plot: any) => (plot.fixtures[0].typeId = 'type-gone'),
      'fixtures[0].typeId: names a fixture type "type-gone" that does not exist',
    ],
    [
      'a dangling position',
      (plot: any) => (plot.fixtures[0].positionId = 'pos-gone'),
      'fixtures[0].positionId: names a position "pos-gone" that does not exist',
    ],
    [
      'a duplicate id',
      (plot: any) => (plot.subjects[0].id = 'fx-1'),
      'subjects[0].id: repeats the id "fx-1" already used by fixtures[0]',
    ],
    [
      'a field angle not wider than the beam',
      (plot: any) => (plot.fixtureTypes[0].photometry.spread.fieldAngleDeg = 20),
      'fixtureTypes[0].photometry.spread.fieldAngleDeg: must be wider than the beam angle',
    ],
    [
      'a zoom on a fixed type',
      (plot: any) => (plot.fixtures[0].zoomBeamDeg = 20),
      'fixtures[0].zoomBeamDeg: is set but "Profile 26°" has no zoom',
    ],
    [
      'an unknown photometry kind',
      (plot: any) => (plot.fixtureTypes[0].photometry.kind = 'laser'),
      'fixtureTypes[0].photometry.kind: must be one of "beam", "soft", "measured"',
    ],
    [
      'a missing main viewpoint',
      (plot: any) => (plot.mainViewpointId = 'vp-9'),
      'mainViewpointId: names a viewpoint "vp-9" that does not exist',
    ],
    [
      'a two-point stage',
      (plot: any) => plot.stage.outline.splice(2),
      'stage.outline: needs at least 3 points',
    ],
    [
      'a camera without settings',
      (plot: any) => (plot.viewpoints[0].kind = 'camera'),
      'viewpoints[0].camera: a camera needs its exposure settings',
    ],
  ])('%s is named with its path', (_label, spoil, message) => {
    const plot = structuredClone(tinyPlot()) as any;
    spoil(plot);
    expect(errorsOf(plot)).toContain(message);
  });

  it('lists several problems at once, not just the first', () => {
    const plot = structuredClone(tinyPlot()) as any;
    plot.fixtures[0].levelPct = -1;
    plot.subjects[0].faceHeightM = 0;
    expect(errorsOf(plot)).toHaveLength(2);
  });

  it('refuses files over 10 MB without parsing them', () => {
    expect(errorsOf(' '.repeat(10 * 1024 * 1024 + 1))[0]).toMatch(/limited to 10 MB/);
  });

  it('exports a JSON Schema of the format that matches the checked-in copy', async () => {
    const { z } = await import('zod');
    const { readFileSync } = await import('node:fs');
    const generated = z.toJSONSchema(plotDocument, { io: 'input', unrepresentable: 'any' });
    const committed = JSON.parse(
      readFileSync(`public/schema/throwline-plot-v${PLOT_VERSION}.schema.json`, 'utf8'),
    );
    expect(committed).toEqual(JSON.parse(JSON.stringify(generated)));
  });
});

/** The tiny plot as a version 2 file had it: no level sets, overrides, power or rigging. */
function tinyPlotAtVersion2() {
  const {
    levelSets: _sets,
    activeLevelSetId: _active,
    power: _power,
    rigging: _rigging,
    ...rest
  } = tinyPlot();
  return {
    ...rest,
    version: 2,
    subjects: rest.subjects.map(({ roleOverrides: _overrides, ...person }) => person),
  };
}

describe('migrations', () => {
  it('a version 0 draft (title, no units) is brought up to date', () => {
    const { name, displayUnits: _units, version: _version, ...rest } = tinyPlotAtVersion2();
    const draft = { ...rest, version: 0, title: name };
    const result = loadPlotText(JSON.stringify(draft));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document.name).toBe('Tiny');
    expect(result.document.displayUnits).toBe('metric');
    expect(result.document.version).toBe(PLOT_VERSION);
    expect(result.migrations).toEqual([
      '0 → 1: rename title → name; add displayUnits "metric"',
      '1 → 2: fixture types may carry measured photometry; existing files only change their version',
      '2 → 3: add level sets (none), role overrides per subject (none), power (230 V single phase, 80 %, no circuits) and a 1 kg rigging allowance per unit',
    ]);
  });

  it('a version 1 file is read unchanged but for its version number and the version 3 defaults', () => {
    const result = loadPlotText(JSON.stringify({ ...tinyPlotAtVersion2(), version: 1 }));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document).toEqual(tinyPlot());
    expect(result.document.version).toBe(3);
    expect(result.migrations).toHaveLength(2);
  });

  it('a version 2 file gains no level sets, empty role overrides, a 230 V supply and a 1 kg allowance', () => {
    const result = loadPlotText(JSON.stringify(tinyPlotAtVersion2()));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.document.levelSets).toEqual([]);
    expect(result.document.activeLevelSetId).toBeNull();
    expect(result.document.subjects[0].roleOverrides).toEqual({});
    expect(result.document.power).toEqual({
      system: 'single',
      phaseVoltageV: 230,
      continuousLimitPct: 80,
      feeders: [],
      circuits: [],
    });
    expect(result.document.rigging).toEqual({ allowancePerUnitKg: 1 });
  });

  it('a file with no version is read as version 0', () => {
    const { version: _version, ...rest } = tinyPlotAtVersion2();
    const result = loadPlotText(JSON.stringify(rest));
    expect(result.ok && result.migrations.length).toBe(3);
  });
});
