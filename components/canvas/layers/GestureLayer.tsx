'use client';

import { Layer, Line, Rect, Text } from 'react-konva';
import { formatLength } from '@/lib/units';
import { type ScreenPoint, type ViewTransform, type WorldPlanPoint, worldToScreen } from '../viewTransform';
import { palette } from '../palette';

/** What a gesture in progress draws over the plot: the selection box and the measuring line. */
export function GestureLayer({
  view,
  box,
  measure,
  units,
}: {
  view: ViewTransform;
  box: { start: ScreenPoint; end: ScreenPoint } | null;
  measure: { start: WorldPlanPoint; end: WorldPlanPoint } | null;
  units: 'metric' | 'imperial';
}) {
  const start = measure ? worldToScreen(view, measure.start) : null;
  const end = measure ? worldToScreen(view, measure.end) : null;
  return (
    <Layer listening={false}>
      {box ? (
        <Rect
          x={Math.min(box.start.x, box.end.x)}
          y={Math.min(box.start.y, box.end.y)}
          width={Math.abs(box.end.x - box.start.x)}
          height={Math.abs(box.end.y - box.start.y)}
          stroke={palette.selection}
          dash={[4, 3]}
          fill="rgba(88,196,255,0.08)"
        />
      ) : null}
      {measure && start && end ? (
        <>
          <Line
            points={[start.x, start.y, end.x, end.y]}
            stroke={palette.measure}
            strokeWidth={2}
            dash={[6, 3]}
          />
          <Text
            x={end.x + 8}
            y={end.y - 8}
            text={formatLength(
              Math.hypot(measure.end.x - measure.start.x, measure.end.y - measure.start.y),
              units,
            )}
            fontSize={13}
            fill={palette.measure}
          />
        </>
      ) : null}
    </Layer>
  );
}
