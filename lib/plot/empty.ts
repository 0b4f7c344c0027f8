/** A new, empty plot: an 8 m × 6 m floor, no rig, metric units, face-height focus plane. */
import { PLOT_FORMAT, PLOT_VERSION, type PlotDocument } from './schema/document';
import { DEFAULT_POWER, DEFAULT_RIGGING } from './schema/power';

/** Face height used for the focus plane of a new plot, m (common practice: 1.5–1.8 m). */
export const DEFAULT_FOCUS_PLANE_M = 1.6;

export function createEmptyPlot(name = 'Untitled plot'): PlotDocument {
  return {
    format: PLOT_FORMAT,
    version: PLOT_VERSION,
    name,
    venue: '',
    notes: '',
    displayUnits: 'metric',
    focusPlaneHeightM: DEFAULT_FOCUS_PLANE_M,
    stage: {
      outline: [
        { x: -4, y: 0 },
        { x: 4, y: 0 },
        { x: 4, y: 6 },
        { x: -4, y: 6 },
      ],
      acting: [],
    },
    positions: [],
    fixtureTypes: [],
    fixtures: [],
    subjects: [],
    viewpoints: [],
    mainViewpointId: null,
    levelSets: [],
    activeLevelSetId: null,
    power: structuredClone(DEFAULT_POWER),
    rigging: { ...DEFAULT_RIGGING },
  };
}
