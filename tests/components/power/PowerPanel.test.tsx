// @vitest-environment jsdom
import { readFileSync } from 'node:fs';
import { act, cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { Inspector } from '@/components/panels/Inspector';
import { PowerPanel } from '@/components/power/PowerPanel';
import { loadPlotText, updateFixture } from '@/lib/plot';
import { renderWithEditor } from '../panels/renderWithEditor';

afterEach(cleanup);

function conference() {
  const loaded = loadPlotText(readFileSync('public/demo/conference.json', 'utf8'));
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  return loaded.document;
}

function circuitRow(address: string): HTMLElement {
  const row = document.querySelector<HTMLElement>(`[data-circuit="${address}"]`);
  if (!row) throw new Error(`no row for ${address}`);
  return row;
}

describe('the Power panel on the conference demo', () => {
  it('shows every circuit with its load, its flag in words, and both cautions', () => {
    renderWithEditor(<PowerPanel />, conference());
    const ft2 = circuitRow('FT-2');
    // By hand: 7 × 400 W = 2800 W; 2800 / 230 = 12.17 A of 16 A = 76 %.
    expect(Number(ft2.dataset.currentA)).toBeCloseTo(2800 / 230, 9);
    expect(ft2.textContent).toContain('2800 W · 12.17 A of 16 A · 76 %');
    expect(within(ft2).getByText('OK')).toBeTruthy();
    expect(screen.getByTestId('power-summary').textContent).toContain('Nothing over a rating');
    // Three-phase star supply: line to line = √3 × 230 V = 398.4 V (published three-phase relation).
    expect(document.querySelector('[data-readout="lineVoltage"]')?.textContent).toBe(
      'Line to line: √3 × 230 V = 398 V.',
    );
    expect(screen.getByText(/A qualified electrician and the local electrical code decide/)).toBeTruthy();
    expect(
      screen.getByText(/A qualified rigger and local regulations decide.*every unit needs its safety cable/),
    ).toBeTruthy();
    expect(document.querySelector('[data-readout="bendingOnly"]')?.textContent).toMatch(
      /^This checks bending only\..*centre-point or point-load figure, that figure governs.*A qualified rigger decides\.$/,
    );
    // Neutral by the phasor formula for 1900, 2800, 2320 W at 230 V.
    const [a, b, c] = [1900 / 230, 2800 / 230, 2320 / 230];
    const neutral = document.querySelector<HTMLElement>('[data-testid="power-phases"] [data-phase="N"]');
    expect(Number(neutral?.dataset.currentA)).toBeCloseTo(
      Math.sqrt(a * a + b * b + c * c - a * b - b * c - c * a),
      9,
    );
    expect(document.querySelector('[data-position="pos-truss-front"]')?.getAttribute('data-total-kg')).toBe(
      '220',
    );
    // Opened: the rough load at the current levels. FT-2's washes stand at 33, 42, 42, 50, 33, 33 and 42 %
    // in the demo file: 400 W × 2.75 = 1100 W.
    fireEvent.click(screen.getByRole('button', { name: 'Edit circuit FT-2' }));
    expect(
      Number(document.querySelector('[data-readout="atLevel"]')?.getAttribute('data-value')),
    ).toBeCloseTo(1100, 9);
  });

  it('flags FT-2 over its limit, then over its rating, as units are put on it', () => {
    const view = renderWithEditor(<PowerPanel />, conference());
    act(() => {
      view.editor().run(updateFixture, { id: 'fx-5', changes: { circuit: 'FT-2' } });
    });
    // 3200 W / 230 = 13.91 A: over 80 % of 16 A (12.8 A), within 16 A.
    expect(circuitRow('FT-2').dataset.flag).toBe('over-limit');
    expect(within(circuitRow('FT-2')).getByText('Over 80 % limit')).toBeTruthy();
    act(() => {
      view.editor().run(updateFixture, { id: 'fx-3', changes: { circuit: 'FT-2' } });
      view.editor().run(updateFixture, { id: 'fx-2', changes: { circuit: 'FT-2' } });
    });
    // 4000 W / 230 = 17.39 A: over 16 A.
    const row = circuitRow('FT-2');
    expect(row.dataset.flag).toBe('over-rating');
    expect(row.textContent).toContain('4000 W · 17.39 A of 16 A · 109 %');
    expect(within(row).getByText('OVER RATING')).toBeTruthy();
    expect(screen.getByTestId('power-summary').textContent).toContain(
      'FT-2 is over its rating: 17.39 A of 16 A',
    );
  });

  it('lists a circuit from the form, refuses a duplicate with the field named, and lists an unlisted address', () => {
    const view = renderWithEditor(<PowerPanel />, conference());
    const form = screen.getByRole('form', { name: 'Add a circuit' });
    fireEvent.change(within(form).getByLabelText('New circuit address'), { target: { value: 'FT-1' } });
    fireEvent.submit(form);
    expect(screen.getByRole('alert').textContent).toMatch(
      /new circuit\.address: there is already a circuit "FT-1"/,
    );
    fireEvent.change(within(form).getByLabelText('New circuit address'), { target: { value: 'SR-1' } });
    fireEvent.change(within(form).getByLabelText('Rating A'), { target: { value: '10' } });
    fireEvent.submit(form);
    expect(view.document().power.circuits.at(-1)).toMatchObject({ address: 'SR-1', ratingA: 10 });
    act(() => {
      view.editor().run(updateFixture, { id: 'fx-18', changes: { circuit: 'SL-9' } });
    });
    expect(screen.getByTestId('power-unlisted').textContent).toContain('SL-9: 1 unit, 80 W, 0.35 A');
    fireEvent.click(screen.getByRole('button', { name: 'List SL-9 at 16 A' }));
    expect(view.document().power.circuits.at(-1)).toMatchObject({ address: 'SL-9', ratingA: 16 });
  });

  it('refuses a single-phase supply while circuits are on L2 and L3, and says why', () => {
    const view = renderWithEditor(<PowerPanel />, conference());
    fireEvent.change(screen.getByLabelText('System'), { target: { value: 'single' } });
    expect(view.document().power.system).toBe('three');
    expect(screen.getByText(/move every circuit to L1/)).toBeTruthy();
  });
});

describe('the fixture inspector shows the load of the unit’s circuit', () => {
  it('after the circuit is changed to a near-full one', () => {
    const view = renderWithEditor(<Inspector />, conference());
    view.select(['fx-5']);
    const field = screen.getByLabelText('Circuit');
    fireEvent.change(field, { target: { value: 'FT-2' } });
    fireEvent.keyDown(field, { key: 'Enter' });
    const note = document.querySelector<HTMLElement>('[data-readout="circuitLoad"]');
    expect(Number(note?.dataset.value)).toBeCloseTo(3200 / 230, 9);
    expect(note?.textContent).toContain('FT-2 at full: 13.91 A of 16 A (87 %)');
    expect(note?.textContent).toContain('Over 80 % limit');
    expect(note?.textContent).toContain('Planning estimate: nameplate at full, unity power factor');
  });
});
