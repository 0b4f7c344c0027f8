'use client';

import { Circle, Group, Line, Rect, Text } from 'react-konva';
import type { DerivedUnit } from '@/lib/plot';
import { type ViewTransform, worldToScreen } from '../viewTransform';
import { glyphOutline, glyphRotationDeg, unitColour } from '../glyphs';
import { palette } from '../palette';

/** Length of a fixture glyph on screen, px. */
const GLYPH_PX = 26;

/**
 * Units as glyphs turned along their aim, coloured by filter, with unit number and channel; a thin
 * line to each focus point and a handle there to drag the focus.
 */
export function FixtureLayer({
  view,
  units,
  selection,
}: {
  view: ViewTransform;
  units: readonly DerivedUnit[];
  selection: readonly string[];
}) {
  return (
    <Group>
      {units.map((unit) => {
        const { fixture } = unit;
        const selected = selection.includes(fixture.id);
        const mount = worldToScreen(view, fixture.mount);
        const focus = worldToScreen(view, fixture.focus);
        const colour = unitColour(fixture.filter?.displayColour);
        const rotation = glyphRotationDeg(unit.focus.aim?.panDeg ?? 0);
        const outline = glyphOutline(unit.type.category).map((value) => value * GLYPH_PX);
        return (
          <Group key={fixture.id}>
            <Line
              points={[mount.x, mount.y, focus.x, focus.y]}
              stroke={selected ? palette.selection : colour}
              strokeWidth={1}
              opacity={selected ? 0.9 : 0.35}
              dash={[3, 3]}
              listening={false}
            />
            <Group name={`fixture:${fixture.id}`} x={mount.x} y={mount.y} rotation={rotation}>
              <Line
                name={`fixture:${fixture.id}`}
                points={outline}
                closed
                fill={colour}
                stroke={selected ? palette.selection : '#0b0e13'}
                strokeWidth={selected ? 2.5 : 1}
                hitStrokeWidth={8}
              />
            </Group>
            {fixture.unit !== null ? (
              <Text
                x={mount.x - 8}
                y={mount.y - 6}
                width={16}
                align="center"
                text={String(fixture.unit)}
                fontSize={10}
                fontStyle="bold"
                fill="#0b0e13"
                listening={false}
              />
            ) : null}
            {fixture.channel !== null ? (
              <Group x={mount.x + 12} y={mount.y + 10} listening={false}>
                <Rect
                  width={String(fixture.channel).length * 7 + 8}
                  height={14}
                  cornerRadius={3}
                  fill="#0b0e13"
                  stroke={colour}
                  strokeWidth={1}
                />
                <Text x={4} y={2} text={String(fixture.channel)} fontSize={10} fill={colour} />
              </Group>
            ) : null}
            <Group name={`focus:${fixture.id}`} x={focus.x} y={focus.y}>
              <Circle
                name={`focus:${fixture.id}`}
                radius={selected ? 7 : 5}
                stroke={selected ? palette.selection : colour}
                strokeWidth={selected ? 2 : 1.5}
                fill="rgba(0,0,0,0.01)"
                hitStrokeWidth={10}
              />
              <Line
                points={[-9, 0, 9, 0]}
                stroke={selected ? palette.selection : colour}
                strokeWidth={1}
                listening={false}
              />
              <Line
                points={[0, -9, 0, 9]}
                stroke={selected ? palette.selection : colour}
                strokeWidth={1}
                listening={false}
              />
            </Group>
          </Group>
        );
      })}
    </Group>
  );
}
