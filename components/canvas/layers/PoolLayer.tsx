'use client';

import { Group, Line, Text } from 'react-konva';
import type { DerivedUnit } from '@/lib/plot';
import type { Footprint } from '@/lib/geometry';
import { type ViewTransform, screenPoints, worldToScreen } from '../viewTransform';
import { unitColour } from '../glyphs';
import { palette } from '../palette';

/**
 * Every unit's beam pool (filled) and field pool (dashed edge) on the focus plane, as the true tilted
 * shapes. A pool that does not close is drawn clipped, with a broken edge and the word "open".
 */
export function PoolLayer({
  view,
  units,
  selection,
  showAll,
  outlineOnly = false,
}: {
  view: ViewTransform;
  units: readonly DerivedUnit[];
  selection: readonly string[];
  showAll: boolean;
  /** Draw edges only (no fill), e.g. over the light map. */
  outlineOnly?: boolean;
}) {
  return (
    <Group listening={false}>
      {units.map((unit) => {
        const selected = selection.includes(unit.fixture.id);
        if (!showAll && !selected) return null;
        const colour = unitColour(unit.fixture.filter?.displayColour);
        return (
          <PoolShapes
            key={unit.fixture.id}
            view={view}
            beam={unit.focus.beamPool}
            field={unit.focus.fieldPool}
            colour={colour}
            strong={selected}
            outlineOnly={outlineOnly}
          />
        );
      })}
    </Group>
  );
}

function PoolShapes({
  view,
  beam,
  field,
  colour,
  strong,
  outlineOnly,
}: {
  view: ViewTransform;
  beam: Footprint | null;
  field: Footprint | null;
  colour: string;
  strong: boolean;
  outlineOnly: boolean;
}) {
  const shapes = [];
  // Field edges only for selected units: with every unit's field drawn the plan turns to noise.
  if (strong && field && field.polygon.length > 2 && field.state !== 'misses') {
    shapes.push(
      <Line
        key="field"
        points={screenPoints(view, field.polygon)}
        closed
        stroke={colour}
        strokeWidth={strong ? 1.5 : 1}
        dash={field.open ? [2, 6] : [6, 4]}
        opacity={strong ? 0.9 : 0.45}
      />,
    );
  }
  if (beam && beam.polygon.length > 2 && beam.state !== 'misses') {
    shapes.push(
      <Line
        key="beam"
        points={screenPoints(view, beam.polygon)}
        closed
        // An open pool spills for tens of metres: outline it, never flood the plan with it.
        fill={beam.open || outlineOnly ? undefined : colour}
        opacity={strong ? 0.32 : beam.open ? 0.35 : 0.1}
        stroke={beam.open ? palette.open : colour}
        strokeWidth={strong ? 2 : 1}
        dash={beam.open ? [3, 5] : undefined}
      />,
    );
    if (beam.open) {
      const first = worldToScreen(view, beam.polygon[0]);
      shapes.push(
        <Text key="open" x={first.x + 4} y={first.y + 4} text="open" fontSize={11} fill={palette.open} />,
      );
    }
  }
  return <>{shapes}</>;
}
