import type { SaveStatus } from './autosaver';

const LABELS: Record<SaveStatus['kind'], string> = {
  saved: 'Saved',
  unsaved: 'Not saved yet',
  saving: 'Saving…',
  offline: 'Offline — edits kept in this browser',
  error: 'Not saved',
  conflict: 'Conflict — not saved',
};

/** The save state in the editor header, with the revision the editor is on. */
export function SaveState({ status, revision }: { status: SaveStatus; revision: number }) {
  const detail =
    status.kind === 'error' || status.kind === 'conflict' ? status.message : `Revision ${revision}`;
  return (
    <span
      className={`save-state save-state--${status.kind}`}
      data-testid="save-state"
      data-save-state={status.kind}
      data-revision={revision}
      title={detail}
    >
      {LABELS[status.kind]}
      {status.kind === 'saved' ? <span className="save-state-revision"> · r{revision}</span> : null}
    </span>
  );
}
