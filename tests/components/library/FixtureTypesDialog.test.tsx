// @vitest-environment jsdom
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FixtureTypesDialog } from '@/components/library/FixtureTypesDialog';
import { decodePhotometryBytes } from '@/components/library/readPhotometryBlob';
import { lambertian, oval, range, writeLm63 } from '../../lib/formats/synthetic';
import { tinyPlot } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from '../panels/renderWithEditor';

afterEach(cleanup);

function choose(text: string | Uint8Array, name: string) {
  const input = screen.getByLabelText('Choose a photometric file');
  fireEvent.change(input, { target: { files: [new File([text as BlobPart], name)] } });
}

function figure(key: string): string {
  const element = document.querySelector(`[data-figure="${key}"] dd`);
  if (!element) throw new Error(`no figure ${key}`);
  return element.textContent ?? '';
}

describe('the fixture types dialog', () => {
  it('previews an imported LM-63 file with a polar plot and its figures, then adds it as a measured type', async () => {
    const editor = renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, tinyPlot());
    // I0·cos γ, 1000 cd: π·1000 = 3142 lm within 0.5 %, beam 120°, field 2·acos 0.1 = 168.5° [DER].
    choose(
      writeLm63({ vertical: range(0, 90, 5), horizontal: [0], intensity: lambertian(1000) }),
      'downlight.ies',
    );
    await screen.findByRole('region', { name: 'Imported file preview' });
    expect(figure('format')).toBe('LM-63-2002');
    expect(figure('peakCd')).toBe('1,000 cd');
    expect(Number(figure('totalLumens').replace(/[^\d]/g, ''))).toBeGreaterThan(3126);
    expect(Number(figure('totalLumens').replace(/[^\d]/g, ''))).toBeLessThan(3157);
    expect(figure('beamAngle')).toBe('120.0°');
    expect(figure('fieldAngle')).toBe('168.5°');
    const curves = document.querySelectorAll('[data-polar-plot] polyline');
    expect(curves).toHaveLength(2);
    // The nadir point of the C0–C180 curve sits one radius (100) below the centre (120, 120).
    expect(curves[0].getAttribute('points')?.split(' ')[0]).toBe('120.00,220.00');
    const preview = screen.getByRole('region', { name: 'Imported file preview' });
    fireEvent.change(within(preview).getByLabelText(/Name/), { target: { value: 'Downlight (measured)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add to the show' }));
    const added = editor.document().fixtureTypes.at(-1);
    expect(added?.name).toBe('Downlight (measured)');
    expect(added?.photometry.kind).toBe('measured');
    expect(screen.getByText('Added Downlight (measured) to the show.')).toBeTruthy();
  });

  it('shows an oval file’s two planes', async () => {
    renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, tinyPlot());
    choose(
      writeLm63({ vertical: range(0, 90, 1), horizontal: range(0, 90, 5), intensity: oval }),
      'oval.ies',
    );
    await screen.findByRole('region', { name: 'Imported file preview' });
    // cos³⁰ across C0–C180 and cos⁶ across C90–C270: beams 2·acos(0.5^(1/n)) = 24.5° and 54.0° [DER].
    expect(figure('beamAngle')).toBe('24.5° × 54.0°');
  });

  it('a bad file shows its problem with the line and leaves the show unchanged', async () => {
    const editor = renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, tinyPlot());
    const before = editor.document();
    const text = writeLm63({ vertical: range(0, 90, 10), horizontal: [0], intensity: lambertian(1) }).replace(
      '0 10 20',
      '0 20 10',
    );
    choose(text, 'broken.ies');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe(
      'broken.ies, line 11: vertical angles are out of order: 20° is followed by 10° (they must ascend)',
    );
    choose(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x00, 0xff, 0xfe]), 'junk.ldt');
    await waitFor(() =>
      expect(screen.getByRole('alert').textContent).toMatch(/^junk\.ldt, line 1: .*binary file/),
    );
    expect(editor.document()).toBe(before);
  });

  it('adds library types and duplicates and deletes show types', () => {
    const editor = renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, tinyPlot());
    const fresnel = document.querySelector('[data-library-id="fresnel-1k"]') as HTMLElement;
    fireEvent.click(within(fresnel).getByRole('button', { name: 'Add' }));
    expect(editor.document().fixtureTypes.map((type) => type.name)).toContain('Fresnel 1 kW, spot–flood');
    const zoomRow = document.querySelector('[data-type-id="type-zoom"]') as HTMLElement;
    fireEvent.click(within(zoomRow).getByRole('button', { name: 'Duplicate' }));
    expect(editor.document().fixtureTypes.at(-1)?.name).toBe('Zoom profile copy');
    fireEvent.click(within(zoomRow).getByRole('button', { name: 'Delete' }));
    expect(editor.document().fixtureTypes.some((type) => type.id === 'type-zoom')).toBe(false);
  });

  it('decodes Windows-1252 text that is not UTF-8', () => {
    expect(decodePhotometryBytes(new Uint8Array([0x4d, 0xfc, 0x6c, 0x6c, 0x65, 0x72]).buffer)).toBe('Müller');
  });
});
