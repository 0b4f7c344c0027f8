// @vitest-environment jsdom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FocusCards } from '@/components/paperwork/FocusCards';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

describe('focus chart cards', () => {
  it('one card per unit, grouped by position, with the focus point from the centre and setting lines', () => {
    const plot = tinyPlot({
      fixtures: [unit, { ...unit, id: 'fx-2', unit: 2, channel: 7, focus: { x: -1.5, y: -0.5, z: 1.6 } }],
    });
    render(<FocusCards document={plot} />);
    const group = screen.getByRole('region', { name: 'Front pipe' });
    const cards = within(group).getAllByRole('article');
    expect(cards).toHaveLength(2);
    // Plot axes (README): +x stage left, +y upstage. (0, 2) is on the centre line, 2 m upstage.
    expect(cards[0].textContent).toContain('on CL');
    expect(cards[0].textContent).toContain('2.00 m US');
    // Throw √35.36 = 5.95 m, pan 180° (straight upstage), tilt atan(4.4/4) = 47.7° (by hand).
    expect(cards[0].textContent).toContain('5.95 m');
    expect(cards[0].textContent).toContain('180° · 47.7° down');
    // Beam pool on the 1.6 m plane, tilted-cone formulas (REFERENCE-CHECKS §3): width 2.808 m, far − near
    // = 6.348 − 2.467 = 3.882 m.
    expect(cards[0].textContent).toContain('2.81 m × 3.88 m');
    // (−1.5, −0.5): 1.5 m toward stage right, 0.5 m downstage of the setting line.
    expect(cards[1].textContent).toContain('1.50 m SR');
    expect(cards[1].textContent).toContain('0.50 m DS');
    expect(cards[1].textContent).toContain('Ch 7');
  });
});
