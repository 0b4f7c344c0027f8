'use client';

import { useMemo } from 'react';
import { type CandelaGrid, polarCurves } from '@/lib/formats';

const SIZE = 240;
const RADIUS = 100;
const COLOURS = ['#ff7a3d', '#4dabf7'];

/**
 * A polar candela plot as data sheets draw it: nadir down, intensity as distance from the centre
 * (peak at the outer ring), the C0–C180 and C90–C270 plane pairs as two curves.
 */
export function PolarCandelaPlot({ grid, peakCd }: { grid: CandelaGrid; peakCd: number }) {
  const curves = useMemo(() => polarCurves(grid), [grid]);
  const centre = SIZE / 2;
  return (
    <figure className="polar-plot" data-polar-plot>
      <svg
        viewBox={`0 0 ${SIZE} ${SIZE}`}
        width={SIZE}
        height={SIZE}
        role="img"
        aria-label={`Polar candela plot: ${curves.map((curve) => curve.label).join(' and ')}, peak ${Math.round(peakCd)} cd`}
      >
        {[0.25, 0.5, 0.75, 1].map((ring) => (
          <circle key={ring} cx={centre} cy={centre} r={ring * RADIUS} className="polar-ring" />
        ))}
        {[0, 30, 60, 90, 120, 150].map((angle) => {
          const radians = (angle * Math.PI) / 180;
          const dx = Math.sin(radians) * RADIUS;
          const dy = Math.cos(radians) * RADIUS;
          return (
            <line
              key={angle}
              x1={centre - dx}
              y1={centre - dy}
              x2={centre + dx}
              y2={centre + dy}
              className="polar-spoke"
            />
          );
        })}
        {curves.map((curve, index) => (
          <polyline
            key={curve.label}
            data-plane={curve.label}
            points={curve.points
              .map(
                (point) =>
                  `${(centre + point.x * RADIUS).toFixed(2)},${(centre + point.y * RADIUS).toFixed(2)}`,
              )
              .join(' ')}
            fill="none"
            stroke={COLOURS[index]}
            strokeWidth={index === 0 ? 2 : 1.5}
            strokeDasharray={index === 0 ? undefined : '5 3'}
          />
        ))}
        <text x={centre + 4} y={SIZE - 4} className="polar-label">
          0° (axis)
        </text>
      </svg>
      <figcaption>
        {curves.map((curve, index) => (
          <span key={curve.label} style={{ color: COLOURS[index] }}>
            {index === 0 ? '━' : '╍'} {curve.label}{' '}
          </span>
        ))}
        · outer ring {Math.round(peakCd).toLocaleString('en')} cd
      </figcaption>
    </figure>
  );
}
