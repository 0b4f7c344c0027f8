'use client';

import { useState } from 'react';
import type { RevisionSummary, ShowSummary } from '@/lib/storage/showStore';
import { LocalTime } from './LocalTime';
import { callShowsApi } from './showsApi';
import './shows.css';

/** A show's history: every revision with its time and what changed; export or restore any of them. */
export function RevisionList({
  show,
  revisions,
}: {
  show: ShowSummary;
  revisions: readonly RevisionSummary[];
}) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const restore = async (revision: number) => {
    setBusy(true);
    setError(null);
    const answer = await callShowsApi<{ revision: number }>(
      `/api/shows/${show.id}/revisions/${revision}/restore`,
      { method: 'POST' },
    );
    setBusy(false);
    if (!answer.ok) {
      setError(answer.message);
      return;
    }
    window.location.assign(new URL(`/shows/${show.id}`, window.location.origin));
  };

  return (
    <main className="shows-page">
      <header className="shows-header">
        <h1>Throwline</h1>
        <p>
          {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- a full load, so the list is read fresh */}
          <a href="/">All shows</a> · <a href={`/shows/${show.id}`}>Open {show.name}</a>
        </p>
      </header>
      <section aria-labelledby="history-heading">
        <h2 id="history-heading">History of {show.name}</h2>
        <p className="shows-muted">
          Every save is kept. Restoring a revision saves it again as the newest one; nothing is deleted.
        </p>
        {error ? (
          <p className="shows-notice shows-notice--error" role="alert">
            {error}
          </p>
        ) : null}
        <table className="shows-table">
          <thead>
            <tr>
              <th scope="col">Revision</th>
              <th scope="col">Saved</th>
              <th scope="col">What changed</th>
              <th scope="col">
                <span className="visually-hidden">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {revisions.map((entry) => (
              <tr key={entry.revision} data-revision={entry.revision}>
                <td>{entry.revision}</td>
                <td>
                  <LocalTime iso={entry.savedAt} />
                </td>
                <td>{entry.summary}</td>
                <td className="shows-actions">
                  <a href={`/api/shows/${show.id}/export?revision=${entry.revision}`} download>
                    Export
                  </a>
                  {entry.revision === show.revision ? (
                    <span className="shows-muted">current</span>
                  ) : (
                    <button
                      type="button"
                      disabled={busy || show.deletedAt !== null}
                      onClick={() => void restore(entry.revision)}
                    >
                      Restore
                    </button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </main>
  );
}
