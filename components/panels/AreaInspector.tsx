'use client';

import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { deleteActingArea, updateActingArea } from '@/lib/plot';
import { PanelSection } from './PanelSection';
import { outcomeOf } from './format';

/** An acting area: its name; its outline is drawn and edited on the plan. */
export function AreaInspector({ id }: { id: string }) {
  const { document, run, select } = useEditor();
  const area = document.stage.acting.find((candidate) => candidate.id === id);
  if (!area) return null;
  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Acting area</span> {area.name}
      </h2>
      <PanelSection title="Acting area">
        <TextInput
          label="Name"
          value={area.name}
          onCommit={(name) => outcomeOf(run(updateActingArea, { id, changes: { name } }))}
        />
        <p className="panel-note">Its outline has {area.outline.length} corners; shape it on the plan.</p>
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => {
            if (run(deleteActingArea, { id }).ok) select([]);
          }}
        >
          Delete this acting area
        </button>
      </PanelSection>
    </>
  );
}
