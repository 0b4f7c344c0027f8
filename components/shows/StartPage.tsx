'use client';

import { useRouter } from 'next/navigation';
import { type ChangeEvent, useState } from 'react';
import type { ShowSummary } from '@/lib/storage/showStore';
import { LocalTime } from './LocalTime';
import { callShowsApi, jsonBody } from './showsApi';
import './shows.css';

/** A demo show that can be copied into a new show. */
export interface DemoChoice {
  readonly file: string;
  readonly name: string;
}

interface Notice {
  readonly message: string;
  readonly problems: readonly string[];
  readonly tone: 'error' | 'info';
}

/** The start page: every show (open, history, export, bin), new from a demo, import a file, the bin. */
export function StartPage({
  shows,
  bin,
  demos,
}: {
  shows: readonly ShowSummary[];
  bin: readonly ShowSummary[];
  demos: readonly DemoChoice[];
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<Notice | null>(null);

  const act = async (work: () => Promise<void>) => {
    setBusy(true);
    setNotice(null);
    try {
      await work();
    } finally {
      setBusy(false);
    }
  };

  // A full page load, so the editor always opens the newest revision from the server.
  const openShow = (id: string) => {
    window.location.assign(new URL(`/shows/${id}`, window.location.origin));
  };

  const fail = (message: string, problems: readonly string[] = []) =>
    setNotice({ message, problems, tone: 'error' });

  const newFromDemo = (demo: DemoChoice) =>
    act(async () => {
      let document: unknown;
      try {
        const response = await fetch(`/demo/${demo.file}`);
        document = await response.json();
      } catch {
        fail(`The demo ${demo.name} could not be read.`);
        return;
      }
      const answer = await callShowsApi<{ show: ShowSummary }>(
        '/api/shows',
        jsonBody('POST', { document, origin: 'demo' }),
      );
      if (!answer.ok) return fail(answer.message, answer.problems);
      openShow(answer.body.show.id);
    });

  const importFile = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    void act(async () => {
      const answer = await callShowsApi<{ show: ShowSummary }>('/api/shows/import', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: file,
      });
      if (!answer.ok) return fail(`${file.name}: ${answer.message}`, answer.problems);
      openShow(answer.body.show.id);
    });
  };

  const moveToBin = (show: ShowSummary) =>
    act(async () => {
      const answer = await callShowsApi(`/api/shows/${show.id}`, { method: 'DELETE' });
      if (!answer.ok) return fail(answer.message);
      setNotice({ message: `${show.name} is in the bin.`, problems: [], tone: 'info' });
      router.refresh();
    });

  const takeOutOfBin = (show: ShowSummary) =>
    act(async () => {
      const answer = await callShowsApi(`/api/shows/${show.id}/undelete`, { method: 'POST' });
      if (!answer.ok) return fail(answer.message);
      setNotice({ message: `${show.name} is back in your shows.`, problems: [], tone: 'info' });
      router.refresh();
    });

  return (
    <main className="shows-page">
      <header className="shows-header">
        <h1>Throwline</h1>
        <p>Stage and studio lighting plots with real beam photometry.</p>
      </header>

      {notice ? (
        <div
          className={`shows-notice shows-notice--${notice.tone}`}
          role={notice.tone === 'error' ? 'alert' : 'status'}
        >
          <p>{notice.message}</p>
          {notice.problems.length > 0 ? (
            <ul>
              {notice.problems.map((problem) => (
                <li key={problem}>{problem}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}

      <section aria-labelledby="shows-heading">
        <h2 id="shows-heading">Shows</h2>
        {shows.length === 0 ? (
          <p className="shows-empty">No shows yet: start one from a demo or import a file.</p>
        ) : (
          <table className="shows-table">
            <thead>
              <tr>
                <th scope="col">Show</th>
                <th scope="col">Venue</th>
                <th scope="col">Last saved</th>
                <th scope="col">Revision</th>
                <th scope="col">
                  <span className="visually-hidden">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {shows.map((show) => (
                <tr key={show.id} data-show-id={show.id}>
                  <td>
                    <a href={`/shows/${show.id}`} className="shows-open">
                      {show.name}
                    </a>
                  </td>
                  <td>{show.venue}</td>
                  <td>
                    <LocalTime iso={show.updatedAt} />
                  </td>
                  <td>{show.revision}</td>
                  <td className="shows-actions">
                    <a href={`/shows/${show.id}/history`}>History</a>
                    <a href={`/api/shows/${show.id}/export`} download>
                      Export
                    </a>
                    <button type="button" disabled={busy} onClick={() => void moveToBin(show)}>
                      Move to bin
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <section aria-labelledby="new-heading" className="shows-new">
        <h2 id="new-heading">New show</h2>
        <div className="shows-new-row">
          <span>From a demo:</span>
          {demos.map((demo) => (
            <button key={demo.file} type="button" disabled={busy} onClick={() => void newFromDemo(demo)}>
              {demo.name}
            </button>
          ))}
        </div>
        <div className="shows-new-row">
          <label htmlFor="import-file">Import a plot file:</label>
          <input
            id="import-file"
            type="file"
            accept=".json,application/json"
            disabled={busy}
            onChange={importFile}
          />
        </div>
      </section>

      <section aria-labelledby="bin-heading" className="shows-bin">
        <h2 id="bin-heading">Bin</h2>
        {bin.length === 0 ? (
          <p className="shows-empty">The bin is empty.</p>
        ) : (
          <ul>
            {bin.map((show) => (
              <li key={show.id} data-show-id={show.id}>
                <span>{show.name}</span>{' '}
                <span className="shows-muted">
                  binned <LocalTime iso={show.deletedAt ?? show.updatedAt} />
                </span>{' '}
                <button type="button" disabled={busy} onClick={() => void takeOutOfBin(show)}>
                  Restore
                </button>
              </li>
            ))}
          </ul>
        )}
      </section>
    </main>
  );
}
