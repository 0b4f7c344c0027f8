/** Where a click hangs a new unit: the nearest position within reach, and a first focus point. */
import type { HangFixtureArgs, PlotDocument } from '@/lib/plot';
import { type WorldPlanPoint, nearestOnSegment } from './viewTransform';

/** How close (px) a click must land to a position to hang a unit on it. */
export const HANG_REACH_PX = 16;

/** How far below a pipe or truss a hung unit's lens sits, m (common practice: about half a metre). */
export const HANG_DROP_M = 0.4;

/**
 * The arguments for hanging a unit of `typeId` where the user clicked (`world`, plan m; the view at
 * `scalePxPerM`): on the nearest position within HANG_REACH_PX, its lens HANG_DROP_M under a pipe or
 * truss (at the height of a boom, stand or floor position), first aimed 45° down toward the middle
 * of the stage. null when no position is within reach.
 */
export function hangingPlacement(
  document: PlotDocument,
  world: WorldPlanPoint,
  scalePxPerM: number,
  typeId: string,
): HangFixtureArgs | null {
  let best: { id: string; point: WorldPlanPoint; mountZ: number; distancePx: number } | null = null;
  for (const position of document.positions) {
    const near =
      position.shape.kind === 'line'
        ? nearestOnSegment(world, position.shape.start, position.shape.end)
        : {
            point: position.shape.at,
            distanceM: Math.hypot(world.x - position.shape.at.x, world.y - position.shape.at.y),
          };
    const distancePx = near.distanceM * scalePxPerM;
    if (distancePx <= HANG_REACH_PX && (!best || distancePx < best.distancePx)) {
      const underneath = position.kind === 'pipe' || position.kind === 'truss';
      best = {
        id: position.id,
        point: near.point,
        mountZ: position.heightM - (underneath ? HANG_DROP_M : 0),
        distancePx,
      };
    }
  }
  if (!best) return null;
  const focusZ = document.focusPlaneHeightM;
  const rise = Math.max(best.mountZ - focusZ, 1);
  const ys = document.stage.outline.map((point) => point.y);
  const middleY = (Math.min(...ys) + Math.max(...ys)) / 2;
  const towardStage = best.point.y < middleY ? 1 : -1;
  return {
    typeId,
    positionId: best.id,
    mount: { x: best.point.x, y: best.point.y, z: best.mountZ },
    focus: { x: best.point.x, y: best.point.y + towardStage * rise, z: focusZ },
  };
}

/** Ids of the units (by mount) and subjects (by mark) inside the plan rectangle spanned by a and b. */
export function itemsInBox(document: PlotDocument, a: WorldPlanPoint, b: WorldPlanPoint): string[] {
  const inside = (point: WorldPlanPoint) =>
    point.x >= Math.min(a.x, b.x) &&
    point.x <= Math.max(a.x, b.x) &&
    point.y >= Math.min(a.y, b.y) &&
    point.y <= Math.max(a.y, b.y);
  return [
    ...document.fixtures.filter((unit) => inside(unit.mount)).map((unit) => unit.id),
    ...document.subjects.filter((person) => inside(person.mark)).map((person) => person.id),
  ];
}
