'use client';

import { useMemo, useState } from 'react';
import type { DerivedPlot, PlotDocument } from '@/lib/plot';
import { type CoverageSettings, DEFAULT_COVERAGE, coverageRequest } from './coverageSettings';
import { useCoverage } from './useCoverage';

/** The light map of the open plot: its settings, and the latest map from the worker. */
export function useCoverageMap(document: PlotDocument, derived: DerivedPlot) {
  const [settings, setSettings] = useState<CoverageSettings>(DEFAULT_COVERAGE);
  const [panelOpen, setPanelOpen] = useState(false);
  // Compute only while the map is shown or its panel is open.
  const request = useMemo(
    () => (settings.visible || panelOpen ? coverageRequest(document, derived, settings) : null),
    [document, derived, settings, panelOpen],
  );
  const { status, last } = useCoverage(request);
  return { settings, setSettings, status, map: last, setPanelOpen };
}
