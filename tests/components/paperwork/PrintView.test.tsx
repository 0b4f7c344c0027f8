// @vitest-environment jsdom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { PrintView } from '@/components/paperwork/PrintView';
import { tinyPlot } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

describe('print view', () => {
  it('prints the title block on each sheet and the electrical, rigging and heat cautions under the working sheets', () => {
    render(
      <PrintView
        document={tinyPlot()}
        revision={4}
        sheet="all"
        paper="a4"
        printedAt="2026-12-02T01:30:00Z"
        editorHref="/shows/x"
      />,
    );
    const schedule = screen.getByRole('region', { name: 'Fixture schedule' });
    expect(schedule.textContent).toContain('Tiny');
    expect(within(schedule).getByText(/qualified electrician and a qualified rigger/).textContent).toContain(
      'safety cable',
    );
    const focus = screen.getByRole('region', { name: 'Focus chart' });
    expect(within(focus).getByText(/minimum distance from scenery/).textContent).toContain('safety cable');
    // The plan sheet carries the drawing only.
    const plan = screen.getByRole('region', { name: 'Plan' });
    expect(plan.querySelector('.print-caution')).toBeNull();
  });
});
