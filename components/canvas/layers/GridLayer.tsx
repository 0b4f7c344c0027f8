'use client';

import { Group, Line, Text } from 'react-konva';
import { type ViewTransform, gridSpacingM, scaleBar, screenToWorld } from '../viewTransform';
import { palette } from '../palette';

/** The measuring grid behind everything, and a scale bar in the display units. */
export function GridLayer({
  view,
  width,
  height,
  units,
}: {
  view: ViewTransform;
  width: number;
  height: number;
  units: 'metric' | 'imperial';
}) {
  const spacingM = gridSpacingM(view.scale, units);
  const topLeft = screenToWorld(view, { x: 0, y: 0 });
  const bottomRight = screenToWorld(view, { x: width, y: height });
  const lines = [];
  const firstX = Math.ceil(topLeft.x / spacingM);
  const lastX = Math.floor(bottomRight.x / spacingM);
  for (let index = firstX; index <= lastX && lines.length < 400; index += 1) {
    const x = view.origin.x + index * spacingM * view.scale;
    lines.push(<Line key={`x${index}`} points={[x, 0, x, height]} stroke={palette.grid} strokeWidth={1} />);
  }
  const firstY = Math.ceil(bottomRight.y / spacingM);
  const lastY = Math.floor(topLeft.y / spacingM);
  for (let index = firstY; index <= lastY && lines.length < 800; index += 1) {
    const y = view.origin.y - index * spacingM * view.scale;
    lines.push(<Line key={`y${index}`} points={[0, y, width, y]} stroke={palette.grid} strokeWidth={1} />);
  }
  const bar = scaleBar(view.scale, units);
  const barPx = bar.lengthM * view.scale;
  return (
    <Group listening={false}>
      {lines}
      <Line points={[16, height - 18, 16 + barPx, height - 18]} stroke={palette.label} strokeWidth={2} />
      <Line points={[16, height - 23, 16, height - 13]} stroke={palette.label} strokeWidth={2} />
      <Line
        points={[16 + barPx, height - 23, 16 + barPx, height - 13]}
        stroke={palette.label}
        strokeWidth={2}
      />
      <Text x={20 + barPx} y={height - 25} text={bar.label} fontSize={12} fill={palette.label} />
    </Group>
  );
}
