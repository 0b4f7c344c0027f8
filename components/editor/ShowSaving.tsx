'use client';

import { useEditor } from './EditorContext';
import { SaveState } from './SaveState';
import { useAutosave } from './useAutosave';
import './showSaving.css';

function localTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleString();
}

/** The header's show controls: back to all shows, save state, history, and the keep-both choices. */
export function ShowSaving({ showId, revision }: { showId: string; revision: number }) {
  const editor = useEditor();
  const [autosaver, snapshot] = useAutosave(editor.store, showId, revision);
  const { status, recovered } = snapshot;
  const offer = recovered[0];

  const saveAsNewShow = async () => {
    const id = await autosaver.saveAsNewShow();
    if (id !== null) window.location.assign(new URL(`/shows/${id}`, window.location.origin));
  };

  return (
    <div className="show-saving">
      {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- a full load: the list is read fresh and leaving the editor runs its page-leave save */}
      <a href="/" className="show-saving-link">
        All shows
      </a>
      <SaveState status={status} revision={snapshot.revision} />
      <a href={`/shows/${showId}/history`} className="show-saving-link">
        History
      </a>
      {snapshot.keptLocally ? null : (
        <span className="show-saving-warning" role="alert">
          This browser would not keep a copy of unsaved edits.
        </span>
      )}
      {status.kind === 'conflict' ? (
        <section className="show-saving-panel" role="alertdialog" aria-label="Save conflict">
          <h2>Your edits were not saved</h2>
          <p>{status.message}</p>
          <p>Your edits are still here. Keep both versions:</p>
          <div className="show-saving-actions">
            {status.reason === 'revision' ? (
              <button type="button" onClick={() => void autosaver.saveOnTop()}>
                Save mine as revision {status.currentRevision + 1}
              </button>
            ) : null}
            <button type="button" onClick={() => void saveAsNewShow()}>
              Save mine as a new show
            </button>
            <a href={`/shows/${showId}`} target="_blank" rel="noopener noreferrer">
              Open the saved version in a new tab
            </a>
          </div>
          {status.reason === 'revision' ? (
            <p className="show-saving-note">
              Saving yours as a new revision keeps the other one in the show&apos;s history.
            </p>
          ) : null}
        </section>
      ) : null}
      {offer && status.kind !== 'conflict' ? (
        <section className="show-saving-panel" role="alertdialog" aria-label="Unsaved edits found">
          <h2>Unsaved edits found</h2>
          <p>
            This browser kept edits to this show from {localTime(offer.keptAt)} (made on revision{' '}
            {offer.baseRevision}) that never reached the server.
          </p>
          <div className="show-saving-actions">
            <button type="button" onClick={() => autosaver.restoreRecovered()}>
              Restore my unsaved edits
            </button>
            <button type="button" onClick={() => autosaver.discardRecovered()}>
              Discard them
            </button>
          </div>
          {recovered.length > 1 ? (
            <p className="show-saving-note">{recovered.length - 1} older copies follow.</p>
          ) : null}
        </section>
      ) : null}
    </div>
  );
}
