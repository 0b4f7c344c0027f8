// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen } from '@testing-library/react';
import { CoveragePanel } from '@/components/coverage/CoveragePanel';
import { DEFAULT_COVERAGE, coverageRequest } from '@/components/coverage/coverageSettings';
import { createCoverageService } from '@/lib/analysis';
import { createPlotDeriver } from '@/lib/plot';
import { renderWithEditor } from '../panels/renderWithEditor';
import { tinyPlot } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

describe('the light map panel', () => {
  const plot = tinyPlot();
  const settings = { ...DEFAULT_COVERAGE, visible: true, targetLx: 100 };
  const request = coverageRequest(plot, createPlotDeriver()(plot), settings);
  if (typeof request === 'string') throw new Error(request);
  const map = createCoverageService().handle(request);

  it('shows the whole-stage figures and lists the hot spot with the unit behind it; a click goes there', () => {
    const onShowRegion = vi.fn();
    renderWithEditor(
      <CoveragePanel
        settings={settings}
        onSettingsChange={() => {}}
        status={{ state: 'ready', response: map }}
        map={map}
        onShowRegion={onShowRegion}
      />,
      plot,
    );
    const stageRow = screen.getByRole('row', { name: /Whole stage/ });
    expect(stageRow.getAttribute('data-average')).toBe(String(map.statistics[0].figures?.averageLx));
    const hot = screen.getAllByRole('button', { name: /Hot spot/ })[0];
    expect(hot.textContent).toContain('Front pipe #1');
    fireEvent.click(hot);
    expect(onShowRegion).toHaveBeenCalledWith(map.regions.find((region) => region.kind === 'hot'));
  });

  it('changing the target reports the new level in lux', () => {
    const onSettingsChange = vi.fn();
    renderWithEditor(
      <CoveragePanel
        settings={settings}
        onSettingsChange={onSettingsChange}
        status={{ state: 'idle' }}
        map={null}
        onShowRegion={() => {}}
      />,
      plot,
    );
    const target = screen.getByLabelText(/Target level/);
    fireEvent.change(target, { target: { value: '750' } });
    fireEvent.keyDown(target, { key: 'Enter' });
    expect(onSettingsChange).toHaveBeenCalledWith({ ...settings, targetLx: 750 });
  });

  it('a request without a viewpoint for faces says what is missing', () => {
    const noViewpoint = { ...plot, viewpoints: [], mainViewpointId: null };
    expect(
      coverageRequest(noViewpoint, createPlotDeriver()(noViewpoint), { ...settings, plane: 'toward' }),
    ).toMatch(/Choose a viewpoint/);
  });
});
