'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type HangingPosition, POSITION_KINDS, updatePosition } from '@/lib/plot';
import { formatLength } from '@/lib/units';
import { DeletePosition } from './DeletePosition';
import { PanelSection } from './PanelSection';
import { formatKg, outcomeOf } from './format';
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
  const weights = new Map(document.fixtureTypes.map((type) => [type.id, type.weightKg]));
  const hungKg = held.reduce((total, fixture) => total + (weights.get(fixture.typeId) ?? 0), 0);
  const unknownWeights = held.filter((fixture) => !((weights.get(fixture.typeId) ?? 0) > 0)).length;
  const over = position.ratedLoadKg !== null && hungKg > position.ratedLoadKg;
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
        <p
          className={over ? 'panel-warning' : 'panel-note'}
          data-readout="hungKg"
          data-value={String(hungKg)}
        >
          Units&apos; own weight: {formatKg(hungKg)}
          {position.ratedLoadKg === null ? '' : ` of ${formatKg(position.ratedLoadKg)} rated`}
          {over ? ': over its rating.' : '.'} Clamps, safeties and cable are not counted
          {unknownWeights > 0
            ? `, and ${unknownWeights} unit${unknownWeights === 1 ? "'s" : "s'"} weight is not known (0 kg)`
            : ''}
          ; the sum is set against the rating as one total, whether the rating is for a spread or a point
          load.
        </p>
        <p className="panel-caution" role="note">
          A planning figure, not a load calculation. What may hang on a position, and how, must be checked and
          approved by a qualified rigger or the person responsible for the venue under local regulations;
          every unit and accessory overhead needs its safety cable.
        </p>
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
