'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { outcomeOf } from '@/components/panels/format';
import { type FixtureType, deleteFixtureType, duplicateFixtureType, updateFixtureType } from '@/lib/plot';
import { assertNever } from '@/lib/numeric';
import { TypePhotometryEditor } from './TypePhotometryEditor';

function photometrySummary(type: FixtureType): string {
  const photometry = type.photometry;
  switch (photometry.kind) {
    case 'beam': {
      const spread = photometry.spread;
      const angles =
        spread.kind === 'round'
          ? `${spread.beamAngleDeg}°/${spread.fieldAngleDeg}°`
          : `oval ${spread.beamAngleXDeg}° × ${spread.beamAngleYDeg}°`;
      const zoom = photometry.zoom
        ? `, zoom ${photometry.zoom.minBeamDeg}°–${photometry.zoom.maxBeamDeg}°`
        : '';
      const output =
        photometry.output.kind === 'lumens'
          ? `${photometry.output.lumens} lm`
          : `${photometry.output.peakCd} cd peak`;
      return `Beam ${angles}${zoom}, ${output}`;
    }
    case 'soft':
      return photometry.shape.kind === 'disc'
        ? `Soft disc ⌀ ${photometry.shape.radiusM * 2} m`
        : `Soft ${photometry.shape.widthM} × ${photometry.shape.heightM} m`;
    case 'measured':
      return `Measured: ${photometry.file.fileName}`;
    default:
      return assertNever(photometry);
  }
}

/** One of the show's fixture types: its figures, its editable facts and photometry, duplicate and delete. */
export function ShowTypeRow({ type }: { type: FixtureType }) {
  const { document, run } = useEditor();
  const users = document.fixtures.filter((unit) => unit.typeId === type.id).length;
  const edit = (changes: Partial<Omit<FixtureType, 'id'>>) =>
    outcomeOf(run(updateFixtureType, { id: type.id, changes }));
  return (
    <li className="type-row" data-type-id={type.id}>
      <details>
        <summary>
          <strong>{type.name}</strong> <span className="type-row-meta">{photometrySummary(type)}</span>{' '}
          <span className="type-row-meta">
            · {users} unit{users === 1 ? '' : 's'}
          </span>
        </summary>
        <div className="type-row-fields">
          <TextInput label="Name" value={type.name} onCommit={(name) => edit({ name })} />
          <div className="panel-pair">
            <NumberInput
              label="Power"
              unit="W"
              value={type.powerW}
              min={0}
              max={100000}
              onCommit={(powerW) => edit({ powerW })}
            />
            <NumberInput
              label="Weight"
              unit="kg"
              value={type.weightKg}
              min={0}
              max={5000}
              decimals={1}
              onCommit={(weightKg) => edit({ weightKg })}
            />
          </div>
          <NumberInput
            label="Colour temperature"
            unit="K"
            value={type.colourTemperatureK}
            min={1000}
            max={20000}
            onCommit={(colourTemperatureK) => edit({ colourTemperatureK })}
          />
          <TypePhotometryEditor type={type} />
          <TextInput label="Notes" value={type.notes} multiline onCommit={(notes) => edit({ notes })} />
        </div>
      </details>
      <div className="type-row-actions">
        <button
          type="button"
          className="panel-button"
          onClick={() => run(duplicateFixtureType, { id: type.id })}
        >
          Duplicate
        </button>
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => run(deleteFixtureType, { id: type.id })}
          title={users > 0 ? 'Change the type of its units first' : undefined}
        >
          Delete
        </button>
      </div>
    </li>
  );
}
