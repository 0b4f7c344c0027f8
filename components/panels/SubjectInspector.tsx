'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import { NumberInput } from '@/components/inputs/NumberInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type Subject, deleteSubjects, moveSubject, updateSubject } from '@/lib/plot';
import { formatLength } from '@/lib/units';
import { PanelSection } from './PanelSection';
import { PointFields } from './PointFields';
import { SubjectLightFigures } from './SubjectLightFigures';
import { outcomeOf } from './format';

/** A person to be lit: their mark, face height and which way they face. */
export function SubjectInspector({ id }: { id: string }) {
  const { document, derived, run, select, units } = useEditor();
  const subject = document.subjects.find((candidate) => candidate.id === id);
  if (!subject) return null;
  const edit = (changes: Partial<Omit<Subject, 'id'>>) => outcomeOf(run(updateSubject, { id, changes }));
  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Subject</span> {subject.name}
      </h2>
      <PanelSection title="Subject">
        <TextInput label="Name" value={subject.name} onCommit={(name) => edit({ name })} />
        <PointFields
          name="Mark"
          point={subject.mark}
          axes={['x', 'y']}
          units={units}
          onCommit={(mark) => outcomeOf(run(moveSubject, { id, mark }))}
        />
        <LengthInput
          label="Face height"
          valueM={subject.faceHeightM}
          units={units}
          hint={`Above the floor: about ${formatLength(1.6, units)} standing, ${formatLength(1.2, units)} seated.`}
          onCommit={(faceHeightM) => edit({ faceHeightM })}
        />
        <NumberInput
          label="Facing"
          value={subject.facingDeg}
          unit="°"
          min={-360}
          max={360}
          decimals={1}
          hint="0 faces the audience, +90 faces stage left."
          onCommit={(facingDeg) => edit({ facingDeg })}
        />
      </PanelSection>
      <SubjectLightFigures subjectId={id} document={document} derived={derived} units={units} />
      <PanelSection title="Notes">
        <TextInput label="Notes" value={subject.notes} multiline onCommit={(notes) => edit({ notes })} />
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => {
            if (run(deleteSubjects, { ids: [id] }).ok) select([]);
          }}
        >
          Delete this subject
        </button>
      </PanelSection>
    </>
  );
}
