'use client';

import { type CandelaGrid, gridFigures } from '@/lib/formats';

function angle(value: number, reached: boolean): string {
  return reached ? `${value.toFixed(1)}°` : 'never falls that far';
}

/** A measured type's figures from its candela grid, read-only: output, peak, beam and field angles. */
export function MeasuredFigures({ grid }: { grid: CandelaGrid }) {
  const figures = gridFigures(grid);
  const round = grid.symmetry === 'rotational';
  const pair = (c0: number, c90: number, reached: boolean) =>
    round ? angle(c0, reached) : `${angle(c0, reached)} × ${angle(c90, reached)}`;
  const rows: [string, string, string][] = [
    ['totalLumens', 'Total output', `${Math.round(figures.totalLumens).toLocaleString('en')} lm`],
    ['peakCd', 'Peak intensity', `${Math.round(figures.peakCd).toLocaleString('en')} cd`],
    [
      'beamAngle',
      round ? 'Beam angle (50 %)' : 'Beam angle (50 %), C0–C180 × C90–C270',
      pair(figures.c0.beamAngleDeg, figures.c90.beamAngleDeg, figures.beamEdgeReached),
    ],
    [
      'fieldAngle',
      round ? 'Field angle (10 %)' : 'Field angle (10 %), C0–C180 × C90–C270',
      pair(figures.c0.fieldAngleDeg, figures.c90.fieldAngleDeg, figures.fieldEdgeReached),
    ],
  ];
  return (
    <dl className="panel-readouts" data-measured-figures>
      {rows.map(([key, label, text]) => (
        <div className="panel-readout" key={key} data-figure={key}>
          <dt>{label}</dt>
          <dd>{text}</dd>
        </div>
      ))}
    </dl>
  );
}
