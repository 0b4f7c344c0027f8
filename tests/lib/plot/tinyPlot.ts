/**
 * A tiny hand-checkable plot for tests: one pipe 6 m up at y = −2, one 26°/40° profile with a
 * 20 000 cd peak, aimed at a face 1.6 m up on the centre line at y = 2.
 */
import { createEmptyPlot, type Fixture, type FixtureType, type PlotDocument } from '@/lib/plot';

export const profileType: FixtureType = {
  id: 'type-profile',
  name: 'Profile 26°',
  category: 'profile',
  photometry: {
    kind: 'beam',
    output: { kind: 'peak', peakCd: 20000 },
    spread: { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 },
    zoom: null,
    lensOptionsDeg: [19, 26, 36, 50],
  },
  powerW: 750,
  weightKg: 8,
  colourTemperatureK: 3200,
  dimmingCurve: 'linear',
  notes: 'test values',
};

export const zoomType: FixtureType = {
  id: 'type-zoom',
  name: 'Zoom profile',
  category: 'profile',
  photometry: {
    kind: 'beam',
    output: { kind: 'lumens', lumens: 10000 },
    spread: { kind: 'round', beamAngleDeg: 30, fieldAngleDeg: 45 },
    zoom: { minBeamDeg: 15, maxBeamDeg: 30, fieldPerBeam: 1.5 },
    lensOptionsDeg: [],
  },
  powerW: 500,
  weightKg: 14,
  colourTemperatureK: 5600,
  dimmingCurve: 'square',
  notes: 'test values',
};

export const unit: Fixture = {
  id: 'fx-1',
  typeId: 'type-profile',
  positionId: 'pos-1',
  unit: 1,
  purpose: 'centre',
  mount: { x: 0, y: -2, z: 6 },
  focus: { x: 0, y: 2, z: 1.6 },
  zoomBeamDeg: null,
  levelPct: 100,
  filter: null,
  channel: 1,
  circuit: 'A1',
  notes: '',
};

export function tinyPlot(overrides: Partial<PlotDocument> = {}): PlotDocument {
  return {
    ...createEmptyPlot('Tiny'),
    positions: [
      {
        id: 'pos-1',
        name: 'Front pipe',
        kind: 'pipe',
        shape: { kind: 'line', start: { x: -4, y: -2 }, end: { x: 4, y: -2 } },
        heightM: 6,
        ratedLoadKg: 200,
        loadKind: 'uniform',
        notes: '',
      },
    ],
    fixtureTypes: [profileType, zoomType],
    fixtures: [unit],
    subjects: [
      {
        id: 'sub-1',
        name: 'Ada',
        mark: { x: 0, y: 2 },
        faceHeightM: 1.6,
        facingDeg: 0,
        roleOverrides: {},
        notes: '',
      },
    ],
    viewpoints: [
      { id: 'vp-1', name: 'House centre', kind: 'audience', position: { x: 0, y: -8, z: 1.6 }, camera: null },
    ],
    mainViewpointId: 'vp-1',
    ...overrides,
  };
}
