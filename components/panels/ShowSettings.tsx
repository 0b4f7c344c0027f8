'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type ShowSettings as Settings, updateShow } from '@/lib/plot';
import { formatLength } from '@/lib/units';
import { PanelSection } from './PanelSection';
import { countOf, outcomeOf } from './format';

/** With nothing selected: the show's own settings. */
export function ShowSettings() {
  const { document, run, units } = useEditor();
  const edit = (changes: Partial<Settings>) => outcomeOf(run(updateShow, changes));
  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Show</span> {document.name}
      </h2>
      <p className="panel-note">
        Nothing is selected. {countOf(document.fixtures.length, 'fixture')} on{' '}
        {countOf(document.positions.length, 'position')}, {countOf(document.subjects.length, 'subject')}.
      </p>
      <PanelSection title="Show settings">
        <TextInput label="Show name" value={document.name} onCommit={(name) => edit({ name })} />
        <TextInput label="Venue" value={document.venue} onCommit={(venue) => edit({ venue })} />
        <SelectInput
          label="Display units"
          value={document.displayUnits}
          options={[
            { value: 'metric', label: 'Metric (m, lx)' },
            { value: 'imperial', label: 'Imperial (ft and in, fc)' },
          ]}
          hint="Only how figures are shown; the plot keeps SI units."
          onCommit={(displayUnits) => edit({ displayUnits })}
        />
        <LengthInput
          label="Focus-plane height"
          valueM={document.focusPlaneHeightM}
          units={units}
          hint={`Pools are measured on this plane, usually face height (about ${formatLength(1.6, units)} standing).`}
          onCommit={(focusPlaneHeightM) => edit({ focusPlaneHeightM })}
        />
        <TextInput label="Notes" value={document.notes} multiline onCommit={(notes) => edit({ notes })} />
      </PanelSection>
    </>
  );
}
