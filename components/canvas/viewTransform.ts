/**
 * The mapping between plan metres and canvas pixels: the audience at the bottom of the screen
 * (plan y grows upstage = screen up), stage left to the right. Konva events give screen points;
 * convert them here and nowhere else.
 */

export interface ScreenPoint {
  readonly x: number;
  readonly y: number;
}

export interface WorldPlanPoint {
  readonly x: number;
  readonly y: number;
}

export interface ViewTransform {
  /** Canvas pixels per metre. */
  readonly scale: number;
  /** Screen position of the plan origin (centre line × setting line). */
  readonly origin: ScreenPoint;
}

export interface PlanBounds {
  readonly minX: number;
  readonly maxX: number;
  readonly minY: number;
  readonly maxY: number;
}

/** Smallest and largest zoom, pixels per metre. */
export const MIN_SCALE = 2;
export const MAX_SCALE = 2000;

export function worldToScreen(view: ViewTransform, point: WorldPlanPoint): ScreenPoint {
  return { x: view.origin.x + point.x * view.scale, y: view.origin.y - point.y * view.scale };
}

export function screenToWorld(view: ViewTransform, point: ScreenPoint): WorldPlanPoint {
  return { x: (point.x - view.origin.x) / view.scale, y: (view.origin.y - point.y) / view.scale };
}

/** Flat [x0, y0, x1, y1, …] screen coordinates of plan points, for Konva lines. */
export function screenPoints(view: ViewTransform, points: readonly WorldPlanPoint[]): number[] {
  const flat: number[] = [];
  for (const point of points)
    flat.push(view.origin.x + point.x * view.scale, view.origin.y - point.y * view.scale);
  return flat;
}

/** The view that shows `bounds` whole and centred in a canvas of the given size, with a pixel margin. */
export function fitView(bounds: PlanBounds, widthPx: number, heightPx: number, marginPx = 24): ViewTransform {
  const spanX = Math.max(bounds.maxX - bounds.minX, 0.5);
  const spanY = Math.max(bounds.maxY - bounds.minY, 0.5);
  const usableWidth = Math.max(widthPx - 2 * marginPx, 1);
  const usableHeight = Math.max(heightPx - 2 * marginPx, 1);
  const scale = clampScale(Math.min(usableWidth / spanX, usableHeight / spanY));
  const centreX = (bounds.minX + bounds.maxX) / 2;
  const centreY = (bounds.minY + bounds.maxY) / 2;
  return { scale, origin: { x: widthPx / 2 - centreX * scale, y: heightPx / 2 + centreY * scale } };
}

/** Zoom by `factor` keeping the plan point under `anchor` (screen) where it is. */
export function zoomAt(view: ViewTransform, anchor: ScreenPoint, factor: number): ViewTransform {
  const scale = clampScale(view.scale * factor);
  const world = screenToWorld(view, anchor);
  return { scale, origin: { x: anchor.x - world.x * scale, y: anchor.y + world.y * scale } };
}

/** Move the view by a screen offset. */
export function panBy(view: ViewTransform, dx: number, dy: number): ViewTransform {
  return { scale: view.scale, origin: { x: view.origin.x + dx, y: view.origin.y + dy } };
}

function clampScale(scale: number): number {
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, Number.isFinite(scale) ? scale : MIN_SCALE));
}

/**
 * Grid spacing (m) that keeps lines at least `minPx` apart: 0.1, 0.25, 0.5, 1, 2, 5, 10 m in metric;
 * in imperial 6 in, 1, 2, 5, 10, 20, 50 ft (converted to metres).
 */
export function gridSpacingM(scale: number, units: 'metric' | 'imperial', minPx = 18): number {
  const steps =
    units === 'metric'
      ? [0.1, 0.25, 0.5, 1, 2, 5, 10, 20]
      : [0.5, 1, 2, 5, 10, 20, 50, 100].map((feet) => feet * 0.3048);
  return steps.find((step) => step * scale >= minPx) ?? steps[steps.length - 1];
}

/** Length (m) of a scale bar of a round value about `targetPx` long, with its label. */
export function scaleBar(
  scale: number,
  units: 'metric' | 'imperial',
  targetPx = 120,
): { lengthM: number; label: string } {
  const options =
    units === 'metric'
      ? [0.5, 1, 2, 5, 10, 20, 50].map((metres) => ({ lengthM: metres, label: `${metres} m` }))
      : [1, 2, 5, 10, 20, 50, 100].map((feet) => ({ lengthM: feet * 0.3048, label: `${feet} ft` }));
  return options.reduce((best, option) =>
    Math.abs(option.lengthM * scale - targetPx) < Math.abs(best.lengthM * scale - targetPx) ? option : best,
  );
}

/** The nearest point to `point` on segment a–b, with t in [0, 1] along it. */
export function nearestOnSegment(
  point: WorldPlanPoint,
  a: WorldPlanPoint,
  b: WorldPlanPoint,
): { point: WorldPlanPoint; t: number; distanceM: number } {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSquared = dx * dx + dy * dy;
  const t =
    lengthSquared > 0
      ? Math.min(1, Math.max(0, ((point.x - a.x) * dx + (point.y - a.y) * dy) / lengthSquared))
      : 0;
  const nearest = { x: a.x + t * dx, y: a.y + t * dy };
  return { point: nearest, t, distanceM: Math.hypot(point.x - nearest.x, point.y - nearest.y) };
}
