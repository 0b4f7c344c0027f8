// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import { Inspector } from '@/components/panels/Inspector';
import { renderWithEditor } from './renderWithEditor';
import { profileType, tinyPlot, unit } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

describe('the weight on a position', () => {
  it('adds up the units, says what is not counted, and defers to a qualified person', () => {
    // Two 8 kg profiles and one unit of a type with no weight given: 16 kg counted, one unknown.
    const weightless = { ...profileType, id: 'type-weightless', name: 'Imported', weightKg: 0 };
    const plot = tinyPlot({
      fixtureTypes: [...tinyPlot().fixtureTypes, weightless],
      fixtures: [
        unit,
        { ...unit, id: 'fx-2', unit: 2 },
        { ...unit, id: 'fx-3', unit: 3, typeId: 'type-weightless' },
      ],
    });
    const view = renderWithEditor(<Inspector />, plot);
    view.select(['pos-1']);
    const readout = document.querySelector('[data-readout="hungKg"]');
    expect(readout?.getAttribute('data-value')).toBe('16');
    // With the 1 kg allowance for each of the three units: 19 kg.
    expect(readout?.getAttribute('data-total')).toBe('19');
    expect(readout?.textContent).toContain("1 unit's weight is not known");
    expect(screen.getByRole('note').textContent).toMatch(/qualified rigger/);
    expect(screen.getByRole('note').textContent).toMatch(/safety cable/);
    // Rated 200 kg spread evenly: the bending figure comes with what it leaves out.
    const bending = document.querySelector('[data-readout="bending"]')?.textContent ?? '';
    expect(bending).toContain('This checks bending only');
    expect(bending).toContain('that figure governs; it can be less than half the evenly spread rating');
    expect(bending).toContain('A qualified rigger decides');
  });
});
