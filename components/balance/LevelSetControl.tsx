'use client';

import { useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { chooseLevelSet, deleteLevelSet, renameLevelSet, storeLevelSet } from '@/lib/plot';

/** Keeping the levels as a new set (then, optionally, choosing another set), or renaming one. */
type Editing = { kind: 'keep'; then: string | null } | { kind: 'rename'; id: string } | null;

/** True when the units are at exactly a set's levels (units not in it at 0 %, as choosing it would give). */
function atSetLevels(fixtures: readonly { id: string; levelPct: number }[], levels: Record<string, number>) {
  return fixtures.every((unit) => Math.abs(unit.levelPct - (levels[unit.id] ?? 0)) < 1e-9);
}

/**
 * The show's level sets: which one the units are at now (its levels follow every change), keep the
 * levels now as a new set, rename or delete the chosen one. Choosing a set while the levels now are
 * kept in no set asks first: keep them as a set, choose anyway, or cancel.
 */
export function LevelSetControl() {
  const { document, run } = useEditor();
  const [editing, setEditing] = useState<Editing>(null);
  const [name, setName] = useState('');
  const [error, setError] = useState<string | null>(null);
  /** A set the user picked while the levels now are in no set: waiting for their answer. */
  const [pending, setPending] = useState<string | null>(null);
  const chosen = document.levelSets.find((set) => set.id === document.activeLevelSetId) ?? null;
  const pendingSet = document.levelSets.find((set) => set.id === pending) ?? null;

  const startKeeping = (then: string | null) => {
    setName(`Levels ${document.levelSets.length + 1}`);
    setError(null);
    setEditing({ kind: 'keep', then });
  };

  const choose = (id: string | null) => {
    setPending(null);
    const unkept =
      id !== null &&
      document.activeLevelSetId === null &&
      !document.levelSets.some((set) => atSetLevels(document.fixtures, set.levels));
    if (unkept) setPending(id);
    else run(chooseLevelSet, { id });
  };

  const finish = () => {
    if (!editing) return;
    const outcome =
      editing.kind === 'keep' ? run(storeLevelSet, { name }) : run(renameLevelSet, { id: editing.id, name });
    if (outcome.ok) {
      if (editing.kind === 'keep' && editing.then !== null) run(chooseLevelSet, { id: editing.then });
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
          onChange={(event) => choose(event.target.value || null)}
        >
          <option value="">(none: levels kept in no set)</option>
          {document.levelSets.map((set) => (
            <option key={set.id} value={set.id}>
              {set.name}
            </option>
          ))}
        </select>
      </label>
      {pendingSet && !editing ? (
        <div className="level-sets-confirm" role="alertdialog" aria-label="Levels kept in no set">
          <p>
            These levels are in no set. Choosing “{pendingSet.name}” puts its levels on the units instead.
          </p>
          <div className="level-sets-actions">
            <button
              type="button"
              className="panel-button"
              onClick={() => {
                setPending(null);
                startKeeping(pendingSet.id);
              }}
            >
              Keep them as a set first
            </button>
            <button
              type="button"
              className="panel-button"
              onClick={() => {
                setPending(null);
                run(chooseLevelSet, { id: pendingSet.id });
              }}
            >
              Choose anyway
            </button>
            <button type="button" className="panel-button" onClick={() => setPending(null)}>
              Cancel
            </button>
          </div>
        </div>
      ) : null}
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
          <button type="button" className="panel-button" onClick={() => startKeeping(null)}>
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
