'use client';

import { Circle, Group, Line, RegularPolygon, Text } from 'react-konva';
import type { PlotDocument } from '@/lib/plot';
import { type ViewTransform, worldToScreen } from '../viewTransform';
import { palette } from '../palette';

/** Length of a subject's facing handle, px. */
export const FACING_HANDLE_PX = 26;

/** Subjects as marks with a facing handle; viewpoints as an eye (audience) or a lens (camera). */
export function PeopleLayer({
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
      {document.viewpoints.map((viewpoint) => {
        const selected = selection.includes(viewpoint.id);
        const at = worldToScreen(view, viewpoint.position);
        const colour = selected ? palette.selection : palette.viewpoint;
        const isMain = document.mainViewpointId === viewpoint.id;
        return (
          <Group key={viewpoint.id}>
            {viewpoint.kind === 'camera' ? (
              <RegularPolygon
                name={`viewpoint:${viewpoint.id}`}
                x={at.x}
                y={at.y}
                sides={3}
                radius={9}
                rotation={0}
                stroke={colour}
                strokeWidth={2}
                fill="rgba(0,0,0,0.01)"
              />
            ) : (
              <Group name={`viewpoint:${viewpoint.id}`} x={at.x} y={at.y}>
                <Line
                  name={`viewpoint:${viewpoint.id}`}
                  points={[-10, 0, 0, -6, 10, 0, 0, 6]}
                  closed
                  tension={0.4}
                  stroke={colour}
                  strokeWidth={2}
                  fill="rgba(0,0,0,0.01)"
                />
                <Circle radius={2.5} fill={colour} listening={false} />
              </Group>
            )}
            <Text
              x={at.x + 12}
              y={at.y - 6}
              text={`${viewpoint.name}${isMain ? ' (main)' : ''}`}
              fontSize={11}
              fill={colour}
              listening={false}
            />
          </Group>
        );
      })}
      {document.subjects.map((person) => {
        const selected = selection.includes(person.id);
        const at = worldToScreen(view, person.mark);
        const colour = selected ? palette.selection : palette.subject;
        const facing = (person.facingDeg * Math.PI) / 180;
        // Facing 0° is toward the audience: screen down.
        const handle = {
          x: at.x + Math.sin(facing) * FACING_HANDLE_PX,
          y: at.y + Math.cos(facing) * FACING_HANDLE_PX,
        };
        return (
          <Group key={person.id}>
            <Line
              points={[at.x, at.y, handle.x, handle.y]}
              stroke={colour}
              strokeWidth={2}
              listening={false}
            />
            <Circle
              name={`subject:${person.id}`}
              x={at.x}
              y={at.y}
              radius={9}
              fill="#2a1f2b"
              stroke={colour}
              strokeWidth={2}
            />
            <Circle
              name={`facing:${person.id}`}
              x={handle.x}
              y={handle.y}
              radius={4.5}
              fill={colour}
              hitStrokeWidth={10}
            />
            <Text
              x={at.x - 50}
              y={at.y - 24}
              width={100}
              align="center"
              text={person.name}
              fontSize={12}
              fill={colour}
              listening={false}
            />
          </Group>
        );
      })}
    </Group>
  );
}
