'use client';

import { Circle, Group, Line, Text } from 'react-konva';
import type { PlotDocument } from '@/lib/plot';
import { formatLength } from '@/lib/units';
import { type ViewTransform, worldToScreen } from '../viewTransform';
import { palette } from '../palette';

/** Hanging positions: pipes and truss as lines, booms and stands as points, each with name and height. */
export function PositionLayer({
  view,
  document,
  selection,
}: {
  view: ViewTransform;
  document: PlotDocument;
  selection: readonly string[];
}) {
  return (
    <Group>
      {document.positions.map((position) => {
        const selected = selection.includes(position.id);
        const colour = selected ? palette.selection : palette.position;
        const label = `${position.name} · ${formatLength(position.heightM, document.displayUnits, 1)}`;
        if (position.shape.kind === 'line') {
          const start = worldToScreen(view, position.shape.start);
          const end = worldToScreen(view, position.shape.end);
          const isTruss = position.kind === 'truss';
          return (
            <Group key={position.id} name={`position:${position.id}`}>
              <Line
                name={`position:${position.id}`}
                points={[start.x, start.y, end.x, end.y]}
                stroke={colour}
                strokeWidth={isTruss ? 7 : 3}
                opacity={isTruss ? 0.55 : 0.9}
                hitStrokeWidth={14}
                lineCap="round"
              />
              {isTruss ? (
                <Line
                  points={[start.x, start.y, end.x, end.y]}
                  stroke={palette.background}
                  strokeWidth={2}
                  listening={false}
                />
              ) : null}
              <Text
                x={Math.min(start.x, end.x) - 4}
                y={Math.min(start.y, end.y) - 18}
                text={label}
                fontSize={11}
                fill={colour}
                listening={false}
              />
            </Group>
          );
        }
        const at = worldToScreen(view, position.shape.at);
        return (
          <Group key={position.id}>
            <Circle
              name={`position:${position.id}`}
              x={at.x}
              y={at.y}
              radius={6}
              stroke={colour}
              strokeWidth={2}
              hitStrokeWidth={12}
            />
            <Line
              points={[
                at.x - 4,
                at.y - 4,
                at.x + 4,
                at.y + 4,
                at.x,
                at.y,
                at.x + 4,
                at.y - 4,
                at.x - 4,
                at.y + 4,
              ]}
              stroke={colour}
              strokeWidth={1}
              listening={false}
            />
            <Text x={at.x + 9} y={at.y + 6} text={label} fontSize={11} fill={colour} listening={false} />
          </Group>
        );
      })}
    </Group>
  );
}
