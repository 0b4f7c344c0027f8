'use client';

import { useMemo } from 'react';
import { Group, Image as KonvaImage, Line, Rect, Text } from 'react-konva';
import type { CoverageResponse } from '@/lib/analysis';
import { formatIlluminance } from '@/lib/units';
import { mapPixels } from '@/components/coverage/colourScale';
import { type ViewTransform, screenPoints, worldToScreen } from '../viewTransform';

/** The light map under the plot: colour by stops from the target, isolux lines, hot spots and dark gaps. */
export function LightMapLayer({
  view,
  map,
  targetLx,
  units,
}: {
  view: ViewTransform;
  map: CoverageResponse;
  targetLx: number;
  units: 'metric' | 'imperial';
}) {
  const { grid } = map.spec;
  const image = useMemo(() => {
    const canvas = document.createElement('canvas');
    canvas.width = grid.columns;
    canvas.height = grid.rows;
    const context = canvas.getContext('2d');
    if (!context) return null;
    const pixels = mapPixels(map.values, targetLx);
    const flipped = new Uint8ClampedArray(pixels.length);
    const rowBytes = grid.columns * 4;
    // Grid row 0 is downstage (the bottom of the screen): draw rows bottom-up.
    for (let row = 0; row < grid.rows; row += 1) {
      flipped.set(pixels.subarray(row * rowBytes, (row + 1) * rowBytes), (grid.rows - 1 - row) * rowBytes);
    }
    context.putImageData(new ImageData(flipped, grid.columns, grid.rows), 0, 0);
    return canvas;
  }, [map, grid, targetLx]);
  const topLeft = worldToScreen(view, { x: grid.minX, y: grid.minY + grid.rows * grid.spacingM });
  const sizePx = grid.spacingM * view.scale;
  return (
    <Group listening={false}>
      {image ? (
        <KonvaImage
          image={image}
          x={topLeft.x}
          y={topLeft.y}
          width={grid.columns * sizePx}
          height={grid.rows * sizePx}
        />
      ) : null}
      {map.isolux.flatMap((line) =>
        line.rings.map((ring, index) => {
          const top = ring.reduce((best, point) => (point.y > best.y ? point : best), ring[0]);
          const label = worldToScreen(view, top);
          return [
            <Line
              key={`${line.levelLx}-${index}`}
              points={screenPoints(view, ring)}
              closed
              stroke="rgba(255,255,255,0.55)"
              strokeWidth={1}
            />,
            index === 0 ? (
              <Text
                key={`${line.levelLx}-${index}-label`}
                x={label.x + 3}
                y={label.y - 12}
                text={formatIlluminance(line.levelLx, units)}
                fontSize={10}
                fill="rgba(255,255,255,0.8)"
              />
            ) : null,
          ];
        }),
      )}
      {map.regions.map((region, index) => {
        const corner = worldToScreen(view, { x: region.bounds.minX, y: region.bounds.maxY });
        const colour = region.kind === 'hot' ? '#ff6b5b' : '#6bb8ff';
        return (
          <Rect
            key={`region-${index}`}
            x={corner.x}
            y={corner.y}
            width={(region.bounds.maxX - region.bounds.minX) * view.scale}
            height={(region.bounds.maxY - region.bounds.minY) * view.scale}
            stroke={colour}
            strokeWidth={1.5}
            dash={[5, 3]}
          />
        );
      })}
    </Group>
  );
}
