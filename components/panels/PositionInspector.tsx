'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type HangingPosition, POSITION_KINDS, updatePosition } from '@/lib/plot';
import { formatLength } from '@/lib/units';
import { PositionWeightCheck } from '@/components/power/PositionWeightCheck';
import { DeletePosition } from './DeletePosition';
import { PanelSection } from './PanelSection';
import { outcomeOf } from './format';
import { fixturesInHangingOrder, fixtureLabeller } from './labels';

type PositionChanges = Partial<Omit<HangingPosition, 'id'>>;

const KIND_LABELS: Record<HangingPosition['kind'], string> = {
  pipe: 'Pipe or batten',
  truss: 'Truss',
  boom: 'Boom',
  stand: 'Stand',
  floor: 'Floor',
  other: 'Other',
};

/** A hanging position: its trim, its rating, and the units on it. */
export function PositionInspector({ id }: { id: string }) {
  const { document, run, select, units } = useEditor();
  const position = document.positions.find((candidate) => candidate.id === id);
  if (!position) return null;
  const edit = (changes: PositionChanges) => outcomeOf(run(updatePosition, { id, changes }));
  const held = fixturesInHangingOrder(document).filter((fixture) => fixture.positionId === id);
  const label = fixtureLabeller(document);
  const shape = position.shape;

  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Position</span> {position.name}
      </h2>
      <PanelSection title="Position">
        <TextInput label="Name" value={position.name} onCommit={(name) => edit({ name })} />
        <SelectInput
          label="Kind"
          value={position.kind}
          options={POSITION_KINDS.map((kind) => ({ value: kind, label: KIND_LABELS[kind] }))}
          onCommit={(kind) => edit({ kind })}
        />
        <LengthInput
          label="Height (trim)"
          valueM={position.heightM}
          units={units}
          hint="Its units move up or down with it."
          onCommit={(heightM) => edit({ heightM })}
        />
        <p className="panel-note">
          {shape.kind === 'line'
            ? `A run ${formatLength(Math.hypot(shape.end.x - shape.start.x, shape.end.y - shape.start.y), units)} long; drag it on the plan to move it.`
            : 'A single point; drag it on the plan to move it.'}
        </p>
      </PanelSection>
      <PanelSection title="Load">
        <NumberInput
          label="Rated load"
          value={position.ratedLoadKg}
          unit="kg"
          min={0}
          minExclusive
          max={100000}
          decimals={1}
          optional
          placeholder="unknown"
          hint="As given by whoever is responsible for it; empty if unknown."
          onCommit={(ratedLoadKg) => edit({ ratedLoadKg })}
        />
        <SelectInput
          label="Rating applies"
          value={position.loadKind}
          options={[
            { value: 'uniform', label: 'Spread evenly along it' },
            { value: 'point', label: 'At one point' },
          ]}
          onCommit={(loadKind) => edit({ loadKind })}
        />
        <PositionWeightCheck id={id} />
      </PanelSection>
      <PanelSection title={`Units (${held.length})`}>
        {held.length === 0 ? (
          <p className="panel-note">No units hang here yet.</p>
        ) : (
          <ul className="panel-links">
            {held.map((fixture) => (
              <li key={fixture.id}>
                <button type="button" className="panel-link" onClick={() => select([fixture.id])}>
                  {label(fixture)}
                </button>
              </li>
            ))}
          </ul>
        )}
      </PanelSection>
      <PanelSection title="Notes">
        <TextInput label="Notes" value={position.notes} multiline onCommit={(notes) => edit({ notes })} />
        <DeletePosition position={position} unitCount={held.length} />
      </PanelSection>
    </>
  );
}
