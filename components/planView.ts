import { LENGTH_TOLERANCE_M } from '@/lib/numeric';

/** A plan position in metres: x across the stage (+x stage left), y upstage from the setting line. */
export interface PlanPoint {
  readonly xM: number;
  readonly yM: number;
}

/** A position on the canvas in CSS pixels, y downward. */
export interface ScreenPoint {
  readonly x: number;
  readonly y: number;
}

/** The stage's acting area: its width across the centre line and its depth upstage of the setting line. */
export interface StageSize {
  readonly widthM: number;
  readonly depthM: number;
}

/** How plan metres map to canvas pixels: pixels per metre and the screen position of the plan origin. */
export interface PlanView {
  readonly pixelsPerM: number;
  readonly origin: ScreenPoint;
}

/** Input to `fitPlanView`: the canvas size in pixels, the stage, and the margin kept around it in metres. */
export interface FitPlanViewInput {
  readonly widthPx: number;
  readonly heightPx: number;
  readonly stage: StageSize;
  readonly marginM: number;
}

/**
 * The largest view that shows the whole stage plus margin, centred, with the audience at the bottom
 * of the screen (the setting line below, upstage above). A zero or negative canvas gives scale 0.
 */
export function fitPlanView(input: FitPlanViewInput): PlanView {
  const { widthPx, heightPx, stage, marginM } = input;
  const spanXM = stage.widthM + 2 * marginM;
  const spanYM = stage.depthM + 2 * marginM;
  const pixelsPerM = Math.max(0, Math.min(widthPx / spanXM, heightPx / spanYM));
  return {
    pixelsPerM,
    origin: { x: widthPx / 2, y: heightPx / 2 + (stage.depthM / 2) * pixelsPerM },
  };
}

/** Canvas position of a plan point under `view` (plan y grows upstage, screen y grows downward). */
export function planToScreen(view: PlanView, point: PlanPoint): ScreenPoint {
  return {
    x: view.origin.x + point.xM * view.pixelsPerM,
    y: view.origin.y - point.yM * view.pixelsPerM,
  };
}

/**
 * Plan coordinates of the grid lines covering the stage, `spacingM` apart (1 m by default): x of the
 * lines parallel to the centre line (symmetric about it), y of those parallel to the setting line.
 */
export function gridLinesM(stage: StageSize, spacingM = 1): { readonly xM: number[]; readonly yM: number[] } {
  const sideCount = Math.floor((stage.widthM / 2 + LENGTH_TOLERANCE_M) / spacingM);
  const depthCount = Math.floor((stage.depthM + LENGTH_TOLERANCE_M) / spacingM);
  const xM = Array.from({ length: 2 * sideCount + 1 }, (_, index) => (index - sideCount) * spacingM);
  const yM = Array.from({ length: depthCount + 1 }, (_, index) => index * spacingM);
  return { xM, yM };
}
