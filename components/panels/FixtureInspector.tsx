'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import {
  type FixtureChanges,
  aimFixture,
  deleteFixtures,
  moveFixture,
  retypeFixtures,
  setFixtureLevel,
  updateFixture,
} from '@/lib/plot';
import { FilterFields } from './FilterFields';
import { FocusFigures } from './FocusFigures';
import { LensPicker } from './LensPicker';
import { PanelSection } from './PanelSection';
import { PointFields } from './PointFields';
import { formatAngleShort, outcomeOf } from './format';
import { unitPlace } from './labels';
import { CircuitLoadNote } from '@/components/power/CircuitLoadNote';

/** Everything about one unit: what it is, where it hangs and points, its control, and its live figures. */
export function FixtureInspector({ id }: { id: string }) {
  const { document, derived, run, select, units } = useEditor();
  const fixture = document.fixtures.find((candidate) => candidate.id === id);
  if (!fixture) return null;
  const unit = derived.byId.get(id);
  const position = document.positions.find((candidate) => candidate.id === fixture.positionId);
  const type = document.fixtureTypes.find((candidate) => candidate.id === fixture.typeId);
  const zoom = type?.photometry.kind === 'beam' ? type.photometry.zoom : null;
  const edit = (changes: FixtureChanges) => outcomeOf(run(updateFixture, { id, changes }));
  const place = unitPlace(fixture, position);
  const focus = unit?.focus;

  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Fixture</span> {place}
      </h2>

      <PanelSection title="Unit">
        <SelectInput
          label="Type"
          value={fixture.typeId}
          options={document.fixtureTypes.map((candidate) => ({ value: candidate.id, label: candidate.name }))}
          onCommit={(typeId) => outcomeOf(run(retypeFixtures, { ids: [id], typeId }))}
        />
        <dl className="panel-readouts">
          <div className="panel-readout">
            <dt>Position</dt>
            <dd>
              {position ? `${position.name}, unit ${fixture.unit ?? '?'}` : 'Standing free, on no position'}
            </dd>
          </div>
        </dl>
        <TextInput label="Purpose" value={fixture.purpose} onCommit={(purpose) => edit({ purpose })} />
        <div className="panel-pair">
          <NumberInput
            label="Channel"
            value={fixture.channel}
            min={1}
            max={99999}
            integer
            optional
            onCommit={(channel) => edit({ channel })}
          />
          <TextInput
            label="Circuit"
            value={fixture.circuit ?? ''}
            onCommit={(circuit) => edit({ circuit: circuit.trim() === '' ? null : circuit })}
          />
        </div>
        <CircuitLoadNote address={fixture.circuit} />
        <NumberInput
          label="Level"
          value={fixture.levelPct}
          unit="%"
          min={0}
          max={100}
          decimals={1}
          onCommit={(levelPct) => outcomeOf(run(setFixtureLevel, { ids: [id], levelPct }))}
        />
        {zoom ? (
          <NumberInput
            label="Zoom beam angle"
            value={fixture.zoomBeamDeg}
            unit="°"
            min={zoom.minBeamDeg}
            max={zoom.maxBeamDeg}
            decimals={1}
            optional
            placeholder={
              type?.photometry.kind === 'beam' && type.photometry.spread.kind === 'round'
                ? `nominal ${formatAngleShort(type.photometry.spread.beamAngleDeg)}`
                : 'nominal'
            }
            hint={`Field angle ${Math.round(zoom.minBeamDeg * zoom.fieldPerBeam)}–${Math.round(zoom.maxBeamDeg * zoom.fieldPerBeam)}° across the zoom. Empty: the type's nominal spread.`}
            onCommit={(zoomBeamDeg) => edit({ zoomBeamDeg })}
          />
        ) : null}
      </PanelSection>

      <PanelSection title="Hang and focus">
        <PointFields
          name="Mount"
          point={fixture.mount}
          axes={['x', 'y', 'z']}
          units={units}
          onCommit={(mount) => outcomeOf(run(moveFixture, { id, mount }))}
        />
        <PointFields
          name="Focus"
          point={fixture.focus}
          axisNote={false}
          axes={['x', 'y', 'z']}
          units={units}
          onCommit={(focusPoint) => outcomeOf(run(aimFixture, { id, focus: focusPoint }))}
        />
      </PanelSection>

      <PanelSection title="Focus figures">
        {focus && unit ? (
          <FocusFigures
            focus={focus}
            soft={unit.type.photometry.kind === 'soft'}
            units={units}
            focusPlaneHeightM={document.focusPlaneHeightM}
          />
        ) : (
          <p className="panel-problem">Its fixture type is missing, so there are no figures.</p>
        )}
      </PanelSection>

      {unit && unit.type.photometry.kind === 'beam' && focus?.aim && focus.angles ? (
        <PanelSection title="Lens picker">
          <LensPicker
            fixtureId={id}
            photometry={unit.type.photometry}
            throwM={focus.aim.throwM}
            beamAngleDeg={focus.angles.beamAngleDeg}
            units={units}
          />
        </PanelSection>
      ) : null}

      <PanelSection title="Filter">
        <FilterFields fixtureId={id} filter={fixture.filter} />
      </PanelSection>

      <PanelSection title="Notes">
        <TextInput label="Notes" value={fixture.notes} multiline onCommit={(notes) => edit({ notes })} />
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => {
            if (run(deleteFixtures, { ids: [id] }).ok) select([]);
          }}
        >
          Delete this fixture
        </button>
      </PanelSection>
    </>
  );
}
