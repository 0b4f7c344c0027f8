// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen } from '@testing-library/react';
import { Inspector } from '@/components/panels/Inspector';
import { renderWithEditor } from './renderWithEditor';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

describe('the light on a subject in the inspector', () => {
  it('shows the face light, the key with no fill, and a bar per unit', () => {
    // The tiny plot's one unit lights Ada's face toward the house with 380.47 lx (I·cos i/d², see the report test).
    const view = renderWithEditor(<Inspector />, tinyPlot());
    view.select(['sub-1']);
    const face = document.querySelector('[data-readout="subjectFace"]');
    expect(Number(face?.getAttribute('data-value'))).toBeCloseTo(380.471, 3);
    expect(document.querySelector('[data-readout="keyToFillStops"]')?.textContent).toBe('no fill');
    expect(document.querySelector('[data-readout="keyToFillStops"]')?.getAttribute('data-value')).toBe('');
    const bars = screen.getByRole('list', { name: 'Light on this subject by unit' });
    expect(bars.textContent).toContain('Front pipe #1');
    expect(bars.textContent).toContain('key');
  });

  it('a second unit from the other side makes a fill: 2 units of equal light give 0 stops and a 2:1 lighting ratio', () => {
    // Mirror the unit across the subject's face plane sideways: from (0, −2, 6) to a pair at x = ±2.
    const left = { ...unit, id: 'fx-l', mount: { x: -2, y: -2, z: 6 } };
    const right = { ...unit, id: 'fx-r', unit: 2, mount: { x: 2, y: -2, z: 6 } };
    const view = renderWithEditor(<Inspector />, tinyPlot({ fixtures: [left, right] }));
    view.select(['sub-1']);
    expect(
      Number(document.querySelector('[data-readout="keyToFillStops"]')?.getAttribute('data-value')),
    ).toBeCloseTo(0, 9);
    expect(document.querySelector('[data-readout="keyToFillStops"]')?.textContent).toContain('2.0:1');
  });

  it("choosing a unit's role moves its light between key and fill; choosing 'by rule' undoes it", () => {
    const left = { ...unit, id: 'fx-l', mount: { x: -2, y: -2, z: 6 } };
    const right = { ...unit, id: 'fx-r', unit: 2, mount: { x: 2, y: -2, z: 6 } };
    const view = renderWithEditor(<Inspector />, tinyPlot({ fixtures: [left, right] }));
    view.select(['sub-1']);
    const value = (name: string) =>
      Number(document.querySelector(`[data-readout="${name}"]`)?.getAttribute('data-value'));
    const each = value('subjectKey'); // equal units: key side = fill side = half the face light
    expect(value('subjectFill')).toBeCloseTo(each, 6);
    const keyUnit = screen
      .getAllByRole('combobox')
      .find(
        (select) =>
          (select as HTMLSelectElement).value === '' && select.textContent?.includes('by rule (key)'),
      );
    if (!keyUnit) throw new Error('no unit with the key role by rule');
    fireEvent.change(keyUnit, { target: { value: 'fill' } });
    // Both units now fill (by hand: 2 × each), no key light.
    expect(value('subjectFill')).toBeCloseTo(2 * each, 6);
    expect(value('subjectKey')).toBe(0);
    const fixtureId = keyUnit.getAttribute('data-fixture') ?? '';
    expect(view.document().subjects[0].roleOverrides).toEqual({ [fixtureId]: 'fill' });
    act(() => {
      view.editor().store.undo();
    });
    expect(value('subjectKey')).toBeCloseTo(each, 6);
    expect(view.document().subjects[0].roleOverrides).toEqual({});
  });

  it('a unit that is off can be listed and given a role (the balance uses it before it is lit)', () => {
    const view = renderWithEditor(<Inspector />, tinyPlot({ fixtures: [{ ...unit, levelPct: 0 }] }));
    view.select(['sub-1']);
    const bars = screen.getByRole('list', { name: 'Light on this subject by unit' });
    expect(bars.children.length).toBe(0);
    fireEvent.click(screen.getByLabelText('List units that give no light here too'));
    const chooser = screen.getByRole('combobox', { name: 'Role of Front pipe #1' });
    fireEvent.change(chooser, { target: { value: 'fill' } });
    expect(view.document().subjects[0].roleOverrides).toEqual({ [unit.id]: 'fill' });
  });
});
