/** The plan area a view should show: the stage, every position, unit, subject and viewpoint. */
import type { PlotDocument } from '@/lib/plot';
import type { PlanBounds } from './viewTransform';

export function planBounds(document: PlotDocument, marginM = 0.75): PlanBounds {
  const xs: number[] = [];
  const ys: number[] = [];
  const add = (x: number, y: number) => {
    xs.push(x);
    ys.push(y);
  };
  for (const point of document.stage.outline) add(point.x, point.y);
  for (const position of document.positions) {
    if (position.shape.kind === 'line') {
      add(position.shape.start.x, position.shape.start.y);
      add(position.shape.end.x, position.shape.end.y);
    } else add(position.shape.at.x, position.shape.at.y);
  }
  for (const unit of document.fixtures) add(unit.mount.x, unit.mount.y);
  for (const person of document.subjects) add(person.mark.x, person.mark.y);
  for (const view of document.viewpoints) add(view.position.x, view.position.y);
  if (xs.length === 0) return { minX: -4 - marginM, maxX: 4 + marginM, minY: -marginM, maxY: 6 + marginM };
  return {
    minX: Math.min(...xs) - marginM,
    maxX: Math.max(...xs) + marginM,
    minY: Math.min(...ys) - marginM,
    maxY: Math.max(...ys) + marginM,
  };
}
