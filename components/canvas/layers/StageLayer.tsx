'use client';

import { Group, Line, Text } from 'react-konva';
import type { PlotDocument } from '@/lib/plot';
import { type ViewTransform, screenPoints, worldToScreen } from '../viewTransform';
import { palette } from '../palette';

/** The stage outline, acting areas, the centre line and the setting line. */
export function StageLayer({
  view,
  document,
  selection,
}: {
  view: ViewTransform;
  document: PlotDocument;
  selection: readonly string[];
}) {
  const outline = document.stage.outline;
  const xs = outline.map((point) => point.x);
  const ys = outline.map((point) => point.y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const maxY = Math.max(...ys);
  const centreTop = worldToScreen(view, { x: 0, y: maxY + 0.6 });
  const settingRight = worldToScreen(view, { x: maxX + 0.4, y: 0 });
  return (
    <Group listening={false}>
      <Line points={screenPoints(view, outline)} closed stroke={palette.outline} strokeWidth={2} />
      {document.stage.acting.map((area) => {
        const selected = selection.includes(area.id);
        const centre = area.outline.reduce(
          (sum, point) => ({
            x: sum.x + point.x / area.outline.length,
            y: sum.y + point.y / area.outline.length,
          }),
          { x: 0, y: 0 },
        );
        const label = worldToScreen(view, centre);
        return [
          <Line
            key={area.id}
            points={screenPoints(view, area.outline)}
            closed
            stroke={selected ? palette.selection : palette.area}
            strokeWidth={selected ? 2 : 1}
            dash={[4, 4]}
            opacity={0.7}
          />,
          <Text
            key={`${area.id}-label`}
            x={label.x - 60}
            y={label.y - 6}
            width={120}
            align="center"
            text={area.name}
            fontSize={11}
            fill={palette.area}
            opacity={0.8}
          />,
        ];
      })}
      <Line
        points={screenPoints(view, [
          { x: 0, y: Math.min(0, ...ys) - 0.8 },
          { x: 0, y: maxY + 0.6 },
        ])}
        stroke={palette.centreLine}
        strokeWidth={1.5}
        dash={[10, 5, 2, 5]}
      />
      <Text
        x={centreTop.x + 6}
        y={centreTop.y - 4}
        text="Centre line"
        fontSize={12}
        fill={palette.centreLine}
      />
      <Line
        points={screenPoints(view, [
          { x: minX - 0.4, y: 0 },
          { x: maxX + 0.4, y: 0 },
        ])}
        stroke={palette.settingLine}
        strokeWidth={2}
      />
      <Text
        x={settingRight.x - 90}
        y={settingRight.y + 5}
        width={90}
        align="right"
        text="Setting line"
        fontSize={12}
        fill={palette.settingLine}
      />
    </Group>
  );
}
