// @vitest-environment jsdom
import { cleanup, fireEvent, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FixtureTypesDialog } from '@/components/library/FixtureTypesDialog';
import { fieldMessage, parseLensOptions } from '@/components/library/TypePhotometryEditor';
import { type FixtureType, type PlotDocument, measuredTypeDraft } from '@/lib/plot';
import { readPhotometryFile } from '@/lib/formats';
import { cosinePower, range, writeLm63 } from '../../lib/formats/synthetic';
import { tinyPlot } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from '../panels/renderWithEditor';

afterEach(cleanup);

const softbox: FixtureType = {
  id: 'type-soft',
  name: 'Soft disc',
  category: 'soft',
  photometry: {
    kind: 'soft',
    shape: { kind: 'disc', radiusM: 0.3 },
    output: { kind: 'luminance', cdPerM2: 2000 },
  },
  powerW: 200,
  weightKg: 3,
  colourTemperatureK: 5600,
  dimmingCurve: 'linear',
  notes: 'test values',
};

function openDialog(document: PlotDocument = tinyPlot()) {
  return renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, document);
}

function row(typeId: string): HTMLElement {
  const element = window.document.querySelector(`[data-type-id="${typeId}"]`);
  if (!(element instanceof HTMLElement)) throw new Error(`no row for ${typeId}`);
  return element;
}

/** Type into a field of a row and press Enter; the field. */
function enter(typeId: string, label: string, text: string): HTMLInputElement {
  const input = within(row(typeId)).getByLabelText(label) as HTMLInputElement;
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
  return input;
}

function choose(typeId: string, label: string, value: string) {
  fireEvent.change(within(row(typeId)).getByLabelText(label), { target: { value } });
}

function errorOf(input: HTMLElement): string | null {
  const ids = (input.getAttribute('aria-describedby') ?? '').split(' ');
  for (const id of ids) {
    const element = window.document.getElementById(id);
    if (element?.getAttribute('role') === 'alert') return element.textContent;
  }
  return null;
}

function typeIn(editor: ReturnType<typeof openDialog>, id: string): FixtureType {
  const found = editor.document().fixtureTypes.find((type) => type.id === id);
  if (!found) throw new Error(`no type ${id}`);
  return found;
}

describe('editing a type’s photometry in the Fixture types dialog', () => {
  it('round beam: sets beam and field angles; a field narrower than the beam is refused in place', () => {
    const editor = openDialog();
    enter('type-profile', 'Beam angle', '30°');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      spread: { kind: 'round', beamAngleDeg: 30, fieldAngleDeg: 40 },
    });

    const before = editor.document();
    const field = enter('type-profile', 'Field angle', '25');
    expect(errorOf(field)).toBe('Field angle must be wider than the beam angle.');
    expect(editor.document()).toBe(before);

    // The schema's own limit (less than 180°) shows its message; nothing is clamped to 179.
    const beam = enter('type-profile', 'Beam angle', '180');
    expect(errorOf(beam)).toBe('Beam angle must be less than 180°.');
    expect(editor.document()).toBe(before);
  });

  it('oval beam: round becomes oval with both axes equal; each axis and the rotation are edited', () => {
    const editor = openDialog();
    choose('type-profile', 'Beam shape', 'oval');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      spread: {
        kind: 'oval',
        beamAngleXDeg: 26,
        fieldAngleXDeg: 40,
        beamAngleYDeg: 26,
        fieldAngleYDeg: 40,
        rotationDeg: 0,
      },
    });
    enter('type-profile', 'Beam angle Y', '12');
    enter('type-profile', 'Field angle Y', '20');
    enter('type-profile', 'Rotation', '-45');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      spread: {
        beamAngleXDeg: 26,
        fieldAngleXDeg: 40,
        beamAngleYDeg: 12,
        fieldAngleYDeg: 20,
        rotationDeg: -45,
      },
    });
    const before = editor.document();
    const field = enter('type-profile', 'Field angle X', '26');
    expect(errorOf(field)).toBe('Field angle X must be wider than the beam angle.');
    const rotation = enter('type-profile', 'Rotation', '200');
    expect(errorOf(rotation)).toBe('200° is out of range: enter a number from -180 to 180°.');
    expect(editor.document()).toBe(before);
  });

  it('output: peak candela and lumens convert through the beam model, so the light stays the same', () => {
    const editor = openDialog();
    choose('type-profile', 'Output given as', 'lumens');
    const photometry = typeIn(editor, 'type-profile').photometry;
    if (photometry.kind !== 'beam' || photometry.output.kind !== 'lumens') throw new Error('not lumens');
    // The documented beam model, I(θ) = I0·exp(−ln 2·(θ/hb)^p) with p = ln(ln 10/ln 2)/ln(hf/hb), cut
    // at 0.1 % of the peak, integrated here by the midpoint rule: Φ = 2π ∫ I(θ) sin θ dθ.
    const hb = (13 * Math.PI) / 180;
    const hf = (20 * Math.PI) / 180;
    const p = Math.log(Math.LN10 / Math.LN2) / Math.log(hf / hb);
    const edge = hb * (Math.log(1000) / Math.LN2) ** (1 / p);
    const steps = 20000;
    let flux = 0;
    for (let step = 0; step < steps; step += 1) {
      const theta = ((step + 0.5) * edge) / steps;
      flux += 20000 * Math.exp(-Math.LN2 * (theta / hb) ** p) * Math.sin(theta) * (edge / steps);
    }
    flux *= 2 * Math.PI;
    expect(photometry.output.lumens / flux).toBeCloseTo(1, 5);
    expect((within(row('type-profile')).getByLabelText('Output') as HTMLInputElement).value).toBe(
      String(Math.round(flux)),
    );
    choose('type-profile', 'Output given as', 'peak');
    const back = typeIn(editor, 'type-profile').photometry;
    expect(back.kind === 'beam' && back.output.kind === 'peak' && back.output.peakCd).toBeCloseTo(20000, 6);

    enter('type-profile', 'Peak intensity', '35000');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      output: { kind: 'peak', peakCd: 35000 },
    });
    const before = editor.document();
    const peak = enter('type-profile', 'Peak intensity', '0');
    expect(errorOf(peak)).toBe('0 cd is out of range: enter a number above 0 up to 100000000 cd.');
    expect(editor.document()).toBe(before);
  });

  it('zoom: a range is added from the nominal beam, edited, refused when it breaks a rule, and removed', () => {
    const editor = openDialog();
    choose('type-profile', 'Zoom', 'zoom');
    // Starts at the nominal 26°, field/beam 40/26 = 1.538…
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      zoom: { minBeamDeg: 26, maxBeamDeg: 26, fieldPerBeam: 40 / 26 },
    });
    enter('type-profile', 'Narrowest beam', '15');
    enter('type-profile', 'Widest beam', '35');
    enter('type-profile', 'Field/beam ratio', '1.6');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({
      zoom: { minBeamDeg: 15, maxBeamDeg: 35, fieldPerBeam: 1.6 },
    });

    const before = editor.document();
    // 40 > 35: the narrowest beam above the widest.
    const narrowest = enter('type-profile', 'Narrowest beam', '40');
    expect(errorOf(narrowest)).toBe('Widest beam must not be less than narrowest beam.');
    // 35° × 5.2 = 182° ≥ 180°.
    const ratio = enter('type-profile', 'Field/beam ratio', '5.2');
    expect(errorOf(ratio)).toBe('Field/beam ratio makes the widest field angle 180° or more.');
    expect(editor.document()).toBe(before);

    choose('type-profile', 'Zoom', 'none');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({ zoom: null });
  });

  it('zoom: a unit set beyond a narrowed range is brought within it by the command', () => {
    const plot = tinyPlot();
    const editor = openDialog({
      ...plot,
      fixtures: [
        ...plot.fixtures,
        { ...plot.fixtures[0], id: 'fx-2', unit: 2, typeId: 'type-zoom', zoomBeamDeg: 30 },
      ],
    });
    enter('type-zoom', 'Widest beam', '25');
    expect(editor.document().fixtures.find((unit) => unit.id === 'fx-2')?.zoomBeamDeg).toBe(25);
  });

  it('lens options: a list of angles; a word or an impossible angle is refused in place', () => {
    const editor = openDialog();
    const lenses = within(row('type-profile')).getByLabelText('Lens options') as HTMLInputElement;
    expect(lenses.value).toBe('19°, 26°, 36°, 50°');
    enter('type-profile', 'Lens options', '10, 19°; 26 36');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({ lensOptionsDeg: [10, 19, 26, 36] });
    const before = editor.document();
    expect(errorOf(enter('type-profile', 'Lens options', '19, wide'))).toBe(
      '"wide" is not an angle: list beam angles in degrees, e.g. 19, 26, 36.',
    );
    expect(errorOf(enter('type-profile', 'Lens options', '19, 190'))).toBe('Lens 2 must be less than 180°.');
    expect(editor.document()).toBe(before);
    enter('type-profile', 'Lens options', '');
    expect(typeIn(editor, 'type-profile').photometry).toMatchObject({ lensOptionsDeg: [] });
  });

  it('soft: shape, size and output; switching output keeps Φ = π·L·A', () => {
    const plot = tinyPlot();
    const editor = openDialog({ ...plot, fixtureTypes: [...plot.fixtureTypes, softbox] });
    const diameter = within(row('type-soft')).getByLabelText('Diameter') as HTMLInputElement;
    expect(diameter.value).toBe('0.60 m');

    // Φ = π · 2000 cd/m² · π·0.3² m² = 180·π² = 1776.53 lm.
    choose('type-soft', 'Output given as', 'lumens');
    const soft = typeIn(editor, 'type-soft').photometry;
    expect(soft.kind === 'soft' && soft.output.kind === 'lumens' && soft.output.lumens).toBeCloseTo(
      180 * Math.PI ** 2,
      9,
    );

    enter('type-soft', 'Diameter', '1 m');
    expect(typeIn(editor, 'type-soft').photometry).toMatchObject({ shape: { kind: 'disc', radiusM: 0.5 } });

    // A disc of ⌀ 1 m (0.7854 m²) becomes a square of the same area: side √(π/4) = 0.8862 m.
    choose('type-soft', 'Shape', 'rectangle');
    const square = typeIn(editor, 'type-soft').photometry;
    if (square.kind !== 'soft' || square.shape.kind !== 'rectangle') throw new Error('not a rectangle');
    expect(square.shape.widthM).toBeCloseTo(0.886227, 6);
    expect(square.shape.heightM).toBeCloseTo(0.886227, 6);
    enter('type-soft', 'Width', '1.2 m');
    enter('type-soft', 'Height', '0.6 m');
    expect(typeIn(editor, 'type-soft').photometry).toMatchObject({
      shape: { kind: 'rectangle', widthM: 1.2, heightM: 0.6 },
    });

    // 1776.53 lm from 0.72 m²: L = Φ / (π·A) = 180·π² / (0.72·π) = 250·π = 785.40 cd/m².
    choose('type-soft', 'Output given as', 'luminance');
    const luminance = typeIn(editor, 'type-soft').photometry;
    expect(
      luminance.kind === 'soft' && luminance.output.kind === 'luminance' && luminance.output.cdPerM2,
    ).toBeCloseTo(250 * Math.PI, 9);

    const before = editor.document();
    const width = enter('type-soft', 'Width', '2000 m');
    expect(errorOf(width)).toBe('Width must be within 1 km.');
    expect(editor.document()).toBe(before);
  });

  it('measured: figures from the grid, read-only', () => {
    const plot = tinyPlot();
    // I0·cos²γ, 1000 cd: beam 2·acos(√0.5) = 90°, field 2·acos(√0.1) = 143.1°, Φ = 2π·I0/3 = 2094 lm [DER].
    const distribution = readPhotometryFile(
      writeLm63({ vertical: range(0, 90, 1), horizontal: [0], intensity: cosinePower(1000, 2) }),
      'cos2.ies',
    );
    const measured = { ...measuredTypeDraft(distribution, { name: 'Measured wash' }), id: 'type-measured' };
    openDialog({ ...plot, fixtureTypes: [...plot.fixtureTypes, measured] });
    const figures = row('type-measured').querySelector('[data-measured-figures]') as HTMLElement;
    const text = (key: string) => figures.querySelector(`[data-figure="${key}"] dd`)?.textContent;
    expect(text('peakCd')).toBe('1,000 cd');
    expect(text('beamAngle')).toBe('90.0°');
    expect(text('fieldAngle')).toBe('143.1°');
    expect(text('totalLumens')).toBe('2,094 lm');
    expect(within(row('type-measured')).queryByLabelText('Beam angle')).toBeNull();
    expect(row('type-measured').querySelectorAll('[data-photometry="measured"] input')).toHaveLength(0);
  });
});

describe('the messages and lens lists of the photometry form', () => {
  it('names fields in words', () => {
    expect(fieldMessage('fixture type type-3.photometry.output.lumens: must be greater than 0')).toBe(
      'Output must be greater than 0.',
    );
    expect(fieldMessage('There is no fixture type with id "x".')).toBe(
      'There is no fixture type with id "x".',
    );
  });

  it('reads lens angles', () => {
    expect(parseLensOptions(' 19°, 26 ,36 ')).toEqual([19, 26, 36]);
    expect(parseLensOptions('')).toEqual([]);
    expect(parseLensOptions('19, 2x')).toBe(
      '"2x" is not an angle: list beam angles in degrees, e.g. 19, 26, 36.',
    );
  });
});
