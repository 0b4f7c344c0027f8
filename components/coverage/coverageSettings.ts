/** What the light map shows and how it judges it: view settings, not part of the plot. */
import type { CoverageRequest } from '@/lib/analysis';
import type { DerivedPlot, PlotDocument } from '@/lib/plot';
import { gridOver } from '@/lib/analysis';

export interface CoverageSettings {
  readonly visible: boolean;
  /** 'horizontal' plane, or vertical faces turned toward a viewpoint. */
  readonly plane: 'horizontal' | 'toward';
  /** The viewpoint faces turn toward; null means the plot's main viewpoint. */
  readonly viewpointId: string | null;
  /** Height of the measuring plane, m; null uses the plot's focus-plane height. */
  readonly heightM: number | null;
  readonly spacingM: number;
  readonly targetLx: number;
  readonly toleranceStops: number;
  readonly hotStops: number;
  readonly darkStops: number;
  readonly maxOverlaps: number;
}

export const DEFAULT_COVERAGE: CoverageSettings = {
  visible: false,
  plane: 'horizontal',
  viewpointId: null,
  heightM: null,
  spacingM: 0.1,
  targetLx: 500,
  toleranceStops: 0.5,
  hotStops: 1,
  darkStops: 1,
  maxOverlaps: 4,
};

/** The request for the coverage service: a grid over the stage outline, at the chosen plane. */
export function coverageRequest(
  document: PlotDocument,
  derived: DerivedPlot,
  settings: CoverageSettings,
): CoverageRequest | string {
  const xs = document.stage.outline.map((point) => point.x);
  const ys = document.stage.outline.map((point) => point.y);
  const heightM = settings.heightM ?? document.focusPlaneHeightM;
  const viewpointId = settings.viewpointId ?? document.mainViewpointId;
  const viewpoint = document.viewpoints.find((view) => view.id === viewpointId)?.position ?? null;
  if (settings.plane === 'toward' && !viewpoint)
    return 'Choose a viewpoint to map the light on faces turned toward it.';
  let grid;
  try {
    grid = gridOver(
      { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) },
      settings.spacingM,
    );
  } catch (error) {
    return (error as Error).message;
  }
  return {
    spec: {
      grid,
      plane:
        settings.plane === 'toward' && viewpoint
          ? { kind: 'toward', heightM, viewpoint }
          : { kind: 'horizontal', heightM },
    },
    fixtures: derived.rig,
    stage: { id: 'stage', name: 'Whole stage', outline: document.stage.outline },
    areas: document.stage.acting.map((area) => ({ id: area.id, name: area.name, outline: area.outline })),
    band: { targetLx: settings.targetLx, toleranceStops: settings.toleranceStops },
    rules: {
      hotStops: settings.hotStops,
      darkStops: settings.darkStops,
      maxOverlaps: settings.maxOverlaps,
      minimumAreaM2: 0.05,
    },
  };
}
