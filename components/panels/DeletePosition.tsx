'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { type HangingPosition, type UnitsOnDeletedPosition, deletePosition } from '@/lib/plot';
import { countOf } from './format';

/**
 * Delete a position. When units hang on it the user must say what becomes of them (deleted with it,
 * or left standing free where they are) before anything is deleted.
 */
export function DeletePosition({ position, unitCount }: { position: HangingPosition; unitCount: number }) {
  const { run, select } = useEditor();
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const questionId = useId();
  const firstChoice = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (asking) firstChoice.current?.focus();
  }, [asking]);

  const remove = (units?: UnitsOnDeletedPosition) => {
    const result = run(deletePosition, units ? { id: position.id, units } : { id: position.id });
    if (result.ok) select([]);
    else setError(result.message);
  };

  if (!asking) {
    return (
      <>
        <button
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => (unitCount > 0 ? setAsking(true) : remove())}
        >
          Delete this position
        </button>
        {error ? (
          <p className="field-error" role="alert">
            {error}
          </p>
        ) : null}
      </>
    );
  }
  const them = unitCount === 1 ? 'it' : 'them';
  return (
    <div className="panel-choice" role="group" aria-labelledby={questionId}>
      <p id={questionId}>
        {position.name} holds {countOf(unitCount, 'fixture')}. What should happen to {them}?
      </p>
      <div className="panel-choice-buttons">
        <button
          ref={firstChoice}
          type="button"
          className="panel-button panel-button-danger"
          onClick={() => remove('delete-units')}
        >
          Delete {them} with the position
        </button>
        <button type="button" className="panel-button" onClick={() => remove('leave-units-free')}>
          Leave {them} standing free
        </button>
        <button type="button" className="panel-button" onClick={() => setAsking(false)}>
          Cancel
        </button>
      </div>
      {error ? (
        <p className="field-error" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
