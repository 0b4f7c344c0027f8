'use client';

import { useState } from 'react';
import type { PhotometryDistribution } from '@/lib/formats';
import { FIXTURE_CATEGORIES, type FixtureType } from '@/lib/plot';
import { PolarCandelaPlot } from './PolarCandelaPlot';

const SYMMETRY_TEXT: Record<PhotometryDistribution['grid']['symmetry'], string> = {
  rotational: 'rotationally symmetric (one plane)',
  quadrant: 'symmetric in quadrants (C0–C90)',
  'c0-c180': 'symmetric about C0–C180',
  'c90-c270': 'symmetric about C90–C270',
  none: 'no symmetry (all planes)',
};

function angle(value: number): string {
  return value >= 359.95 ? 'never falls that far' : `${value.toFixed(1)}°`;
}

/** What an imported file holds, drawn and in figures, with the choices for the new type. */
export function ImportPreview({
  distribution,
  onAdd,
  onCancel,
}: {
  distribution: PhotometryDistribution;
  onAdd: (choices: { name: string; category: FixtureType['category'] }) => void;
  onCancel: () => void;
}) {
  const [name, setName] = useState(distribution.title.slice(0, 120));
  const [category, setCategory] = useState<FixtureType['category']>('other');
  const round = distribution.grid.symmetry === 'rotational';
  const figures: [string, string, string][] = [
    ['format', 'Format', distribution.formatVersion],
    ['symmetry', 'Symmetry', SYMMETRY_TEXT[distribution.grid.symmetry]],
    ['totalLumens', 'Total output', `${Math.round(distribution.totalLumens).toLocaleString('en')} lm`],
    ['peakCd', 'Peak intensity', `${Math.round(distribution.peakCd).toLocaleString('en')} cd`],
    [
      'beamAngle',
      round ? 'Beam angle (50 %)' : 'Beam angle (50 %), C0–C180 × C90–C270',
      round
        ? angle(distribution.beamAngleDeg)
        : `${angle(distribution.beamAngleDeg)} × ${angle(distribution.beamAngleCrossDeg)}`,
    ],
    [
      'fieldAngle',
      round ? 'Field angle (10 %)' : 'Field angle (10 %), C0–C180 × C90–C270',
      round
        ? angle(distribution.fieldAngleDeg)
        : `${angle(distribution.fieldAngleDeg)} × ${angle(distribution.fieldAngleCrossDeg)}`,
    ],
  ];
  if (!round) {
    figures.push([
      'beamRange',
      'Beam angle over all planes',
      `${angle(distribution.beamAngleMinDeg)} – ${angle(distribution.beamAngleMaxDeg)}`,
    ]);
  }
  if (distribution.efficiency !== null) {
    figures.push([
      'efficiency',
      'Of the rated lamp lumens',
      `${(distribution.efficiency * 100).toFixed(1)} %`,
    ]);
  }
  return (
    <section className="import-preview" aria-label="Imported file preview">
      <h4>{distribution.fileName}</h4>
      <div className="import-preview-body">
        <PolarCandelaPlot grid={distribution.grid} peakCd={distribution.peakCd} />
        <dl className="panel-readouts">
          {figures.map(([key, label, text]) => (
            <div className="panel-readout" key={key} data-figure={key}>
              <dt>{label}</dt>
              <dd>{text}</dd>
            </div>
          ))}
        </dl>
      </div>
      {distribution.warnings.length > 0 ? (
        <ul className="import-warnings">
          {distribution.warnings.map((warning) => (
            <li key={warning}>{warning}</li>
          ))}
        </ul>
      ) : null}
      <div className="import-choices">
        <label>
          Name{' '}
          <input type="text" value={name} maxLength={120} onChange={(event) => setName(event.target.value)} />
        </label>
        <label>
          Category{' '}
          <select
            value={category}
            onChange={(event) => setCategory(event.target.value as FixtureType['category'])}
          >
            {FIXTURE_CATEGORIES.map((value) => (
              <option key={value} value={value}>
                {value}
              </option>
            ))}
          </select>
        </label>
        <button
          type="button"
          className="panel-button"
          disabled={name.trim() === ''}
          onClick={() => onAdd({ name: name.trim(), category })}
        >
          Add to the show
        </button>
        <button type="button" className="panel-button" onClick={onCancel}>
          Discard
        </button>
      </div>
    </section>
  );
}
