// @vitest-environment jsdom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { Inspector } from '@/components/panels/Inspector';
import type { FixtureType, PlotDocument } from '@/lib/plot';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from './renderWithEditor';

afterEach(cleanup);

// The tiny plot by hand: the unit hangs at (0, −2, 6) and is focused at (0, 2, 1.6), on the focus plane.
// Across 4 m in plan, down 4.4 m: throw √(4² + 4.4²) = √35.36 = 5.946427 m (234.1 in, shown 19' 6");
// tilt atan(4.4 / 4) = 47.726°; the aim runs toward +y, so pan is 180° (upstage).
// Centre 20 000 cd / 35.36 m² = 565.61 lx (SI: 1 cd at 1 m gives 1 lx) = 52.547 fc (÷ 10.7639).
// Beam across at the throw 2 · 5.946427 · tan 13° = 2.745682 m; field 2 · 5.946427 · tan 20° = 4.328645 m.
// Beam pool on the plane 4.4 m below the unit, edge rays at 47.726° ± 13° below horizontal:
// near 4.4 / tan 60.726° = 2.466509 m, far 4.4 / tan 34.726° = 6.348176 m. Across it, the ellipse of a
// cone of half-angle α whose axis is β = 42.274° from the plane's normal at height h:
// semi-minor h·sin α / √(cos²β − sin²α) = 1.404115 m (width 2.808229 m), semi-major
// h·sin α·cos α / (cos²β − sin²α) = 1.940834 m, area π·a·b = 8.561321 m² (92 ft²).
const THROW_M = Math.sqrt(35.36);

function readout(name: string): HTMLElement {
  const element = document.querySelector<HTMLElement>(`[data-readout="${name}"]`);
  if (!element) throw new Error(`no readout ${name}`);
  return element;
}

function valueOf(name: string): number {
  return Number(readout(name).dataset.value);
}

function enter(label: string, text: string) {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
  return input;
}

function renderFixture(plot: PlotDocument = tinyPlot(), id = 'fx-1') {
  const view = renderWithEditor(<Inspector />, plot);
  view.select([id]);
  return view;
}

describe('fixture inspector readouts', () => {
  it('shows the focus figures of the tiny plot in metric', () => {
    renderFixture();
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Fixture Front pipe #1');
    expect(valueOf('throw')).toBeCloseTo(THROW_M, 9);
    expect(readout('throw').textContent).toBe('5.95 m');
    expect(valueOf('tilt')).toBeCloseTo(47.726311, 5);
    expect(readout('tilt').textContent).toBe('47.7°');
    expect(valueOf('pan')).toBeCloseTo(180, 9);
    expect(valueOf('beamDiameter')).toBeCloseTo(2.745682, 5);
    expect(readout('beamDiameter').textContent).toBe('2.75 m');
    expect(valueOf('fieldDiameter')).toBeCloseTo(4.328645, 5);
    expect(valueOf('centreIlluminance')).toBeCloseTo(565.6109, 3);
    expect(readout('centreIlluminance').textContent).toBe('566 lx');
  });

  it('shows the beam pool on the focus plane', () => {
    renderFixture();
    expect(valueOf('poolNear')).toBeCloseTo(2.466509, 5);
    expect(readout('poolNear').textContent).toBe('2.47 m');
    expect(valueOf('poolFar')).toBeCloseTo(6.348176, 5);
    expect(valueOf('poolWidth')).toBeCloseTo(2.808229, 5);
    expect(valueOf('poolArea')).toBeCloseTo(8.561321, 4);
    expect(readout('poolArea').textContent).toBe('8.56 m²');
  });

  it('shows feet and inches and foot-candles when the show is imperial', () => {
    renderFixture(tinyPlot({ displayUnits: 'imperial' }));
    expect(readout('throw').textContent).toBe(`19' 6"`);
    expect(valueOf('throw')).toBeCloseTo(THROW_M, 9);
    expect(readout('centreIlluminance').textContent).toBe('52.5 fc');
    expect(readout('poolArea').textContent).toBe('92 ft²');
  });

  it('says so when the pool does not close', () => {
    // Aimed 0.5 m down over 22 m: the axis is 1.3° below horizontal, so the upper beam edge (13° off
    // the axis) rises above the horizon and never lands.
    renderFixture(tinyPlot({ fixtures: [{ ...unit, focus: { x: 0, y: 20, z: 5.5 } }] }));
    expect(
      screen.getByText(
        "The pool does not close: the beam's edge reaches the horizon; light spills on past the stage.",
      ),
    ).toBeTruthy();
    expect(document.querySelector('[data-readout="poolFar"]')).toBeNull();
    expect(document.querySelector('[data-readout="poolNear"]')).not.toBeNull();
  });

  it('says so when the beam misses the focus plane', () => {
    // Aimed 45° up: its lowest edge is 32° above the horizontal.
    renderFixture(tinyPlot({ fixtures: [{ ...unit, focus: { x: 0, y: 2, z: 10 } }] }));
    expect(screen.getByText(/misses the focus plane/)).toBeTruthy();
    expect(document.querySelector('[data-readout="poolNear"]')).toBeNull();
  });

  it('says a soft source has no beam edge', () => {
    const soft: FixtureType = {
      id: 'type-soft',
      name: 'Soft panel',
      category: 'soft',
      photometry: {
        kind: 'soft',
        shape: { kind: 'rectangle', widthM: 1, heightM: 0.5 },
        output: { kind: 'luminance', cdPerM2: 5000 },
      },
      powerW: 200,
      weightKg: 6,
      colourTemperatureK: 5600,
      dimmingCurve: 'linear',
      notes: 'test values',
    };
    const plot = tinyPlot();
    renderFixture({
      ...plot,
      fixtureTypes: [...plot.fixtureTypes, soft],
      fixtures: [{ ...unit, typeId: 'type-soft' }],
    });
    expect(screen.getByText(/soft source has no beam edge/)).toBeTruthy();
    expect(document.querySelector('[data-readout="beamDiameter"]')).toBeNull();
    expect(document.querySelector('[data-readout="centreIlluminance"]')).not.toBeNull();
  });

  it('shows the problem instead of figures for a unit focused on itself', () => {
    renderFixture(tinyPlot({ fixtures: [{ ...unit, focus: { ...unit.mount } }] }));
    expect(screen.getByText(/zero throw/)).toBeTruthy();
    expect(document.querySelector('[data-readout="throw"]')).toBeNull();
  });
});

describe('fixture inspector edits', () => {
  it(`typing 12'6" into mount y moves the unit to 3.81 m and the figures follow`, () => {
    const view = renderFixture();
    enter('Mount y', `12'6"`);
    // 12 × 0.3048 + 6 × 0.0254 = 3.81 m
    expect(view.document().fixtures[0].mount).toEqual({ x: 0, y: expect.closeTo(3.81, 12), z: 6 });
    expect((screen.getByLabelText('Mount y') as HTMLInputElement).value).toBe('3.81 m');
    // New throw √(1.81² + 4.4²) = √22.6361 = 4.757741 m.
    expect(valueOf('throw')).toBeCloseTo(4.757741, 6);
  });

  it.each(['abc', '12 6'])('refuses %j for mount y in place and leaves the document alone', (text) => {
    const view = renderFixture();
    const before = view.document();
    const input = enter('Mount y', text);
    expect(view.document()).toBe(before);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('alert').textContent).toMatch(/is not a length/);
  });

  it('shows a refusal from the command beside the field', () => {
    const view = renderFixture();
    const before = view.document();
    enter('Focus z', '2000 m');
    expect(view.document()).toBe(before);
    expect(screen.getByRole('alert').textContent).toContain('must be within 1 km');
  });

  it('refuses a level of 120 with the allowed range', () => {
    const view = renderFixture();
    const before = view.document();
    enter('Level', '120');
    expect(view.document()).toBe(before);
    expect(screen.getByRole('alert').textContent).toContain('from 0 to 100 %');
  });

  it('a level of 50 halves the centre illuminance of a linear unit', () => {
    const view = renderFixture();
    enter('Level', '50');
    expect(view.document().fixtures[0].levelPct).toBe(50);
    // 565.61 lx × 0.5 = 282.81 lx
    expect(readout('centreIlluminance').textContent).toBe('283 lx');
  });

  it('channel, circuit and purpose are edited in place; an empty channel means none', () => {
    const view = renderFixture();
    enter('Channel', '');
    enter('Circuit', 'B7');
    enter('Purpose', 'area 2 warm');
    const fixture = view.document().fixtures[0];
    expect(fixture.channel).toBeNull();
    expect(fixture.circuit).toBe('B7');
    expect(fixture.purpose).toBe('area 2 warm');
    enter('Channel', '2.5');
    expect(screen.getByRole('alert').textContent).toContain('whole number');
  });

  it('changing the type to a zoom unit shows its zoom range, refuses a setting outside it and sets one inside', () => {
    const view = renderFixture();
    fireEvent.change(screen.getByLabelText('Type'), { target: { value: 'type-zoom' } });
    expect(view.document().fixtures[0].typeId).toBe('type-zoom');
    const zoom = screen.getByLabelText('Zoom beam angle');
    expect(
      document.getElementById(zoom.getAttribute('aria-describedby')!.split(' ')[0])?.textContent,
    ).toContain('15–30°');
    enter('Zoom beam angle', '40');
    expect(screen.getByRole('alert').textContent).toContain('from 15 to 30°');
    expect(view.document().fixtures[0].zoomBeamDeg).toBeNull();
    enter('Zoom beam angle', '20');
    expect(view.document().fixtures[0].zoomBeamDeg).toBe(20);
    expect(valueOf('beamAngle')).toBe(20);
  });

  it('a filter can be added, set and removed', () => {
    const view = renderFixture();
    fireEvent.click(screen.getByRole('button', { name: 'Add a filter' }));
    enter('Filter name', 'pale straw');
    enter('Transmission', '80');
    expect(view.document().fixtures[0].filter).toMatchObject({ name: 'pale straw', transmission: 0.8 });
    // 565.61 lx × 0.8 = 452.49 lx
    expect(readout('centreIlluminance').textContent).toBe('452 lx');
    enter('Drawing colour', 'orange');
    expect(screen.getByRole('alert').textContent).toContain('must be a colour like #ffcc88');
    fireEvent.click(screen.getByRole('button', { name: 'Remove the filter' }));
    expect(view.document().fixtures[0].filter).toBeNull();
  });
});

describe('lens picker', () => {
  it('names the angle a 3 m pool needs and the nearest lens', () => {
    renderFixture();
    enter('Wanted pool diameter', '3');
    // 2 · atan(1.5 / 5.946427) = 28.315°; lenses 19, 26, 36, 50° → 26° is nearest, giving 2.745682 m.
    expect(screen.getByText(/^For a/).textContent).toBe(
      'For a 3.00 m pool at this throw you need 28.3°; nearest available: 26° (2.75 m).',
    );
  });

  it('within a zoom it offers to set the exact angle', () => {
    const view = renderFixture(tinyPlot({ fixtures: [{ ...unit, typeId: 'type-zoom' }] }));
    enter('Wanted pool diameter', '3 m');
    expect(screen.getByText(/^For a/).textContent).toBe(
      'For a 3.00 m pool at this throw you need 28.3°: within the zoom, set 28.3°.',
    );
    fireEvent.click(screen.getByRole('button', { name: 'Set the zoom to 28.3°' }));
    expect(view.document().fixtures[0].zoomBeamDeg).toBeCloseTo(28.31527, 4);
  });

  it('refuses a pool of zero', () => {
    renderFixture();
    enter('Wanted pool diameter', '0');
    expect(screen.getByRole('alert').textContent).toBe('A pool diameter must be more than zero.');
    expect(screen.queryByText(/^For a/)).toBeNull();
  });

  it('speaks the display units', () => {
    renderFixture(tinyPlot({ displayUnits: 'imperial' }));
    enter('Wanted pool diameter', `10'`);
    // 10 ft = 3.048 m: 2 · atan(1.524 / 5.946427) = 28.75°; 26° gives 2.745682 m = 108.1 in = 9' 0".
    expect(screen.getByText(/^For a/).textContent).toBe(
      `For a 10' 0" pool at this throw you need 28.7°; nearest available: 26° (9' 0").`,
    );
  });
});

describe('several fixtures selected', () => {
  it('sets the level of all of them at once', () => {
    const plot = tinyPlot();
    const second = { ...unit, id: 'fx-2', unit: 2, levelPct: 40 };
    const view = renderWithEditor(<Inspector />, { ...plot, fixtures: [unit, second] });
    view.select(['fx-1', 'fx-2']);
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Fixtures 2 selected');
    const level = screen.getByLabelText('Level for all') as HTMLInputElement;
    expect(level.value).toBe('');
    expect(level.placeholder).toBe('mixed');
    enter('Level for all', '75');
    expect(view.document().fixtures.map((fixture) => fixture.levelPct)).toEqual([75, 75]);
    const units = within(screen.getByRole('region', { name: 'Selected units' }));
    fireEvent.click(units.getByRole('button', { name: /Front pipe #2/ }));
    expect(view.editor().selection).toEqual(['fx-2']);
  });
});
