'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type Filter, updateFixture } from '@/lib/plot';
import { outcomeOf } from './format';

/** A new filter starts clear (passes everything, no colour shift); the user names and sets it. */
const NEW_FILTER: Filter = { name: 'New filter', transmission: 1, miredShift: 0, displayColour: '#ffffff' };

/** The unit's colour or diffusion: name, how much light it passes, its mired shift and drawing colour. */
export function FilterFields({ fixtureId, filter }: { fixtureId: string; filter: Filter | null }) {
  const { run } = useEditor();
  const setFilter = (next: Filter | null) =>
    outcomeOf(run(updateFixture, { id: fixtureId, changes: { filter: next } }));
  if (filter === null) {
    return (
      <div className="panel-row">
        <p className="panel-note">No filter: the unit runs open white.</p>
        <button type="button" className="panel-button" onClick={() => setFilter(NEW_FILTER)}>
          Add a filter
        </button>
      </div>
    );
  }
  return (
    <>
      <TextInput
        label="Filter name"
        value={filter.name}
        onCommit={(name) => setFilter({ ...filter, name })}
      />
      <NumberInput
        label="Transmission"
        value={filter.transmission * 100}
        unit="%"
        min={0}
        max={100}
        decimals={1}
        hint="Share of the light it lets through."
        onCommit={(percent) => setFilter({ ...filter, transmission: percent / 100 })}
      />
      <NumberInput
        label="Colour temperature shift"
        value={filter.miredShift}
        unit="mired"
        min={-1000}
        max={1000}
        decimals={0}
        hint="+ warmer, − cooler, 0 for a colour that does not convert."
        onCommit={(miredShift) => setFilter({ ...filter, miredShift })}
      />
      <div className="panel-row">
        <TextInput
          label="Drawing colour"
          value={filter.displayColour}
          hint="As #rrggbb."
          onCommit={(displayColour) => setFilter({ ...filter, displayColour: displayColour.trim() })}
        />
        <span className="panel-swatch" style={{ background: filter.displayColour }} aria-hidden="true" />
      </div>
      <button type="button" className="panel-button" onClick={() => setFilter(null)}>
        Remove the filter
      </button>
    </>
  );
}
