'use client';

import { useRouter } from 'next/navigation';
import { type ChangeEvent, useState } from 'react';
import { type PlotDocument, loadPlotText, replacePlot } from '@/lib/plot';
import { callShowsApi } from '../shows/showsApi';
import { useEditor } from '../editor/EditorContext';

type Pending =
  | { kind: 'none' }
  | { kind: 'bad'; fileName: string; errors: string[] }
  | {
      kind: 'ready';
      fileName: string;
      text: string;
      document: PlotDocument;
      migrations: string[];
      /** Why replacing this plot with it was refused, if it was. */
      refused: string | null;
    };

/**
 * Open a plot file. The file is checked first; a bad file (or one that cannot be read) shows every
 * problem with its path and changes nothing. A good one opens as a new show, or replaces this plot
 * after asking (one undoable step; the replaced plot also stays in the show's saved history); a
 * refused replacement says why and leaves the choice open.
 */
export function PlotFileImport() {
  const { run, setMessage, document } = useEditor();
  const router = useRouter();
  const [pending, setPending] = useState<Pending>({ kind: 'none' });
  const [busy, setBusy] = useState(false);

  const pick = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    let text: string;
    try {
      text = await file.text();
    } catch (error) {
      // A DOMException (NotReadableError…) is not an Error in every engine; take its message either way.
      const reason =
        typeof error === 'object' && error !== null && 'message' in error && typeof error.message === 'string'
          ? error.message
          : String(error);
      setPending({ kind: 'bad', fileName: file.name, errors: [`could not read ${file.name}: ${reason}`] });
      return;
    }
    const loaded = loadPlotText(text);
    setPending(
      loaded.ok
        ? {
            kind: 'ready',
            fileName: file.name,
            text,
            document: loaded.document,
            migrations: loaded.migrations,
            refused: null,
          }
        : { kind: 'bad', fileName: file.name, errors: loaded.errors },
    );
  };

  /** The server's import route checks the file again and records the show as imported. */
  const openAsNew = async (fileName: string, text: string) => {
    setBusy(true);
    const answer = await callShowsApi<{ show: { id: string } }>('/api/shows/import', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: text,
    });
    setBusy(false);
    if (!answer.ok) {
      setPending({ kind: 'bad', fileName, errors: [answer.message, ...answer.problems] });
      return;
    }
    router.push(`/shows/${answer.body.show.id}`);
  };

  const replace = (ready: Extract<Pending, { kind: 'ready' }>) => {
    const { document: next, fileName } = ready;
    const ok = window.confirm(
      `Replace “${document.name}” with “${next.name}” from ${fileName}? Undo (Ctrl+Z) brings the current plot back, and its saved revisions stay in the show’s history.`,
    );
    if (!ok) return;
    const result = run(replacePlot, { document: next });
    if (!result.ok) {
      setPending({ ...ready, refused: result.message });
      return;
    }
    setPending({ kind: 'none' });
    setMessage(`Replaced the plot with ${next.name} from ${fileName}. Undo brings the previous plot back.`);
  };

  return (
    <div className="plot-import">
      <label className="paperwork-file">
        Open plot file…
        <input type="file" accept=".json,application/json" onChange={(event) => void pick(event)} />
      </label>
      {pending.kind === 'bad' ? (
        <div className="plot-import-problems" role="alert">
          <p>{pending.fileName} cannot be opened; nothing was changed:</p>
          <ul>
            {pending.errors.slice(0, 20).map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          {pending.errors.length > 20 ? <p>… and {pending.errors.length - 20} more.</p> : null}
          <button type="button" onClick={() => setPending({ kind: 'none' })}>
            Dismiss
          </button>
        </div>
      ) : null}
      {pending.kind === 'ready' ? (
        <div className="plot-import-choice" role="group" aria-label="Open the plot file">
          <p>
            {pending.fileName}: “{pending.document.name}”, {pending.document.fixtures.length} units
            {pending.migrations.length > 0 ? ` (brought up to date: ${pending.migrations.join('; ')})` : ''}.
          </p>
          {pending.refused === null ? null : (
            <p className="plot-import-problems" role="alert">
              The plot was not replaced; nothing was changed: {pending.refused}
            </p>
          )}
          <button
            type="button"
            disabled={busy}
            onClick={() => void openAsNew(pending.fileName, pending.text)}
          >
            Open as a new show
          </button>
          <button type="button" disabled={busy} onClick={() => replace(pending)}>
            Replace this plot…
          </button>
          <button type="button" disabled={busy} onClick={() => setPending({ kind: 'none' })}>
            Cancel
          </button>
        </div>
      ) : null}
    </div>
  );
}
