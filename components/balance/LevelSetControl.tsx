'use client';

import { useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { chooseLevelSet, deleteLevelSet, renameLevelSet, storeLevelSet } from '@/lib/plot';

type Editing = { kind: 'keep' } | { kind: 'rename'; id: string } | null;

/**
 * The show's level sets: which one the units are at now (its levels follow every change), keep the
 * levels now as a new set, rename or delete the chosen one.
 */
export function LevelSetControl() {
  const { document, run } = useEditor();
  const [editing, setEditing] = useState<Editing>(null);
  const [name, setName] = useState('');
  const [error, setError] = useState<string | null>(null);
  const chosen = document.levelSets.find((set) => set.id === document.activeLevelSetId) ?? null;

  const finish = () => {
    if (!editing) return;
    const outcome =
      editing.kind === 'keep' ? run(storeLevelSet, { name }) : run(renameLevelSet, { id: editing.id, name });
    if (outcome.ok) {
      setEditing(null);
      setError(null);
    } else setError(outcome.message);
  };

  return (
    <div className="level-sets" data-testid="level-sets">
      <label className="level-sets-choice">
        <span>Level set</span>
        <select
          value={document.activeLevelSetId ?? ''}
          onChange={(event) => run(chooseLevelSet, { id: event.target.value || null })}
        >
          <option value="">(none: levels kept in no set)</option>
          {document.levelSets.map((set) => (
            <option key={set.id} value={set.id}>
              {set.name}
            </option>
          ))}
        </select>
      </label>
      {editing ? (
        <form
          className="level-sets-name"
          onSubmit={(event) => {
            event.preventDefault();
            finish();
          }}
        >
          <input
            aria-label={editing.kind === 'keep' ? 'Name of the new level set' : 'New name of the level set'}
            value={name}
            autoFocus
            onChange={(event) => setName(event.target.value)}
            onKeyDown={(event) => {
              if (event.key === 'Escape') setEditing(null);
            }}
          />
          <button type="submit" className="panel-button">
            {editing.kind === 'keep' ? 'Keep' : 'Rename'}
          </button>
          <button type="button" className="panel-button" onClick={() => setEditing(null)}>
            Cancel
          </button>
          {error ? <p className="field-error">{error}</p> : null}
        </form>
      ) : (
        <div className="level-sets-actions">
          <button
            type="button"
            className="panel-button"
            onClick={() => {
              setName(`Levels ${document.levelSets.length + 1}`);
              setError(null);
              setEditing({ kind: 'keep' });
            }}
          >
            Keep these levels as…
          </button>
          {chosen ? (
            <>
              <button
                type="button"
                className="panel-button"
                onClick={() => {
                  setName(chosen.name);
                  setError(null);
                  setEditing({ kind: 'rename', id: chosen.id });
                }}
              >
                Rename
              </button>
              <button
                type="button"
                className="panel-button panel-button-danger"
                onClick={() => run(deleteLevelSet, { id: chosen.id })}
              >
                Delete set
              </button>
            </>
          ) : null}
        </div>
      )}
      <p className="panel-note">
        {chosen
          ? `Level changes are kept in “${chosen.name}”. Choosing another set puts its levels on the units.`
          : 'Levels changed now are kept in no set.'}
      </p>
    </div>
  );
}
