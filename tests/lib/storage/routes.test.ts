import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import * as sessionRoute from '@/app/api/session/route';
import * as exportRoute from '@/app/api/shows/[id]/export/route';
import * as revisionRoute from '@/app/api/shows/[id]/revisions/[revision]/route';
import * as restoreRoute from '@/app/api/shows/[id]/revisions/[revision]/restore/route';
import * as revisionsRoute from '@/app/api/shows/[id]/revisions/route';
import * as showRoute from '@/app/api/shows/[id]/route';
import * as undeleteRoute from '@/app/api/shows/[id]/undelete/route';
import * as importRoute from '@/app/api/shows/import/route';
import * as showsRoute from '@/app/api/shows/route';
import { MAX_PLOT_FILE_BYTES, savePlotText } from '@/lib/plot';
import { closeServerStore, databasePath } from '@/lib/storage/serverStore';
import { demoDocument, withFixtureMoved } from './support/documents';

const origin = 'http://127.0.0.1:3000';
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'throwline-routes-'));
  process.env.THROWLINE_DB = path.join(dir, 'throwline.db');
  delete process.env.THROWLINE_TOKEN;
});

afterAll(async () => {
  await closeServerStore();
  delete process.env.THROWLINE_DB;
  rmSync(dir, { recursive: true, force: true });
});

afterEach(() => {
  delete process.env.THROWLINE_TOKEN;
});

function request(
  pathname: string,
  init: { method?: string; json?: unknown; body?: BodyInit; headers?: Record<string, string> } = {},
): Request {
  const headers: Record<string, string> = { host: '127.0.0.1:3000', ...init.headers };
  let body = init.body;
  if (init.json !== undefined) {
    body = JSON.stringify(init.json);
    headers['content-type'] = 'application/json';
  }
  return new Request(`${origin}${pathname}`, { method: init.method ?? 'GET', body, headers });
}

function context<P extends Record<string, string>>(params: P) {
  return { params: Promise.resolve(params) };
}

async function json(response: Response): Promise<any> {
  return response.json();
}

async function createShow(document = demoDocument()): Promise<{ id: string; revision: number }> {
  const response = await showsRoute.POST(request('/api/shows', { method: 'POST', json: { document } }));
  expect(response.status).toBe(201);
  const body = await json(response);
  return { id: body.show.id, revision: body.revision };
}

function save(id: string, baseRevision: unknown, document: unknown) {
  return showRoute.PUT(
    request(`/api/shows/${id}`, { method: 'PUT', json: { baseRevision, document } }),
    context({ id }),
  );
}

describe('the show API on a temporary database', () => {
  it('uses THROWLINE_DB and seeds the demos on first use', async () => {
    expect(databasePath()).toBe(path.join(dir, 'throwline.db'));
    const body = await json(await showsRoute.GET(request('/api/shows')));
    expect(body.shows.map((show: { name: string }) => show.name)).toEqual([
      'The Salt Ledger — studio plot',
      'Kettle & Compass — guest interview set',
      'Urban Transit Forum — main stage',
    ]);
  });

  it('round trip: create, open, save, open again — the document comes back exactly', async () => {
    const original = demoDocument('interview.json');
    const { id, revision } = await createShow(original);
    expect(revision).toBe(1);
    const opened = await json(await showRoute.GET(request(`/api/shows/${id}`), context({ id })));
    expect(opened.revision).toBe(1);
    expect(opened.document).toEqual(original);

    const edited = withFixtureMoved(original, 0, 0.75);
    const saved = await save(id, 1, edited);
    expect(saved.status).toBe(200);
    expect(await json(saved)).toMatchObject({ revision: 2, unchanged: false });
    const reopened = await json(await showRoute.GET(request(`/api/shows/${id}`), context({ id })));
    expect(reopened).toMatchObject({ revision: 2, document: edited });
  });

  it('conflict: two clients save from the same revision; exactly one wins, the other gets 409', async () => {
    const original = demoDocument();
    const { id } = await createShow(original);
    const mine = withFixtureMoved(original, 0, 1);
    const theirs = withFixtureMoved(original, 1, -1);
    const [first, second] = await Promise.all([save(id, 1, mine), save(id, 1, theirs)]);
    const statuses = [first.status, second.status].sort();
    expect(statuses).toEqual([200, 409]);
    const loser = first.status === 409 ? first : second;
    const loserDocument = first.status === 409 ? mine : theirs;
    const refused = await json(loser);
    expect(refused).toMatchObject({ conflict: 'revision', currentRevision: 2 });
    expect(refused.error).toMatch(/Revision 2 was saved since revision 1/);
    // The loser still has its document and can keep both: on top as revision 3 ...
    const onTop = await save(id, refused.currentRevision, loserDocument);
    expect(await json(onTop)).toMatchObject({ revision: 3 });
    // ... with the winner's revision kept in the history.
    const history = await json(
      await revisionsRoute.GET(request(`/api/shows/${id}/revisions`), context({ id })),
    );
    expect(history.revisions.map((entry: { revision: number }) => entry.revision)).toEqual([3, 2, 1]);
  });

  it('revisions list with summaries; any revision opens; restore makes a new revision', async () => {
    const original = demoDocument();
    const { id } = await createShow(original);
    await save(id, 1, withFixtureMoved(withFixtureMoved(original, 0, 1), 1, 1));
    const history = await json(
      await revisionsRoute.GET(request(`/api/shows/${id}/revisions`), context({ id })),
    );
    expect(history.revisions[0]).toMatchObject({ revision: 2, summary: '2 fixtures moved' });
    expect(typeof history.revisions[0].savedAt).toBe('string');

    const first = await revisionRoute.GET(
      request(`/api/shows/${id}/revisions/1`),
      context({ id, revision: '1' }),
    );
    expect((await json(first)).document).toEqual(original);

    const restored = await restoreRoute.POST(
      request(`/api/shows/${id}/revisions/1/restore`, { method: 'POST' }),
      context({ id, revision: '1' }),
    );
    expect(restored.status).toBe(201);
    expect(await json(restored)).toEqual({ revision: 3 });
    const head = await json(await showRoute.GET(request(`/api/shows/${id}`), context({ id })));
    expect(head).toMatchObject({ revision: 3, document: original });

    const missing = await revisionRoute.GET(
      request(`/api/shows/${id}/revisions/42`),
      context({ id, revision: '42' }),
    );
    expect(missing.status).toBe(404);
    const nonsense = await revisionRoute.GET(
      request(`/api/shows/${id}/revisions/x`),
      context({ id, revision: 'x' }),
    );
    expect(nonsense.status).toBe(404);
  });

  it('bin: delete moves a show to the bin, saves are refused there, undelete brings it back', async () => {
    const { id } = await createShow();
    const binned = await showRoute.DELETE(request(`/api/shows/${id}`, { method: 'DELETE' }), context({ id }));
    expect(binned.status).toBe(200);
    expect((await json(binned)).show.deletedAt).not.toBeNull();
    const live = await json(await showsRoute.GET(request('/api/shows')));
    expect(live.shows.some((show: { id: string }) => show.id === id)).toBe(false);
    const bin = await json(await showsRoute.GET(request('/api/shows?bin=1')));
    expect(bin.shows.map((show: { id: string }) => show.id)).toContain(id);

    const refused = await save(id, 1, withFixtureMoved(demoDocument(), 0, 1));
    expect(refused.status).toBe(409);
    expect(await json(refused)).toMatchObject({ conflict: 'in-bin' });

    const back = await undeleteRoute.POST(
      request(`/api/shows/${id}/undelete`, { method: 'POST' }),
      context({ id }),
    );
    expect((await json(back)).show.deletedAt).toBeNull();
    expect((await save(id, 1, withFixtureMoved(demoDocument(), 0, 1))).status).toBe(200);
  });

  it('refuses a body over 10 MB with 413 and a readable message, and stores nothing', async () => {
    const before = (await json(await showsRoute.GET(request('/api/shows')))).shows.length;
    const padding = 'x'.repeat(MAX_PLOT_FILE_BYTES + 1);
    const declared = await showsRoute.POST(
      request('/api/shows', {
        method: 'POST',
        body: padding,
        headers: { 'content-type': 'application/json' },
      }),
    );
    expect(declared.status).toBe(413);
    expect((await json(declared)).error).toMatch(/limited to 10\.0 MB\. Nothing was saved/);

    // A streamed body with no Content-Length is cut off at the limit as well.
    const chunk = new TextEncoder().encode('y'.repeat(1024 * 1024));
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        sent += 1;
        if (sent > 12) controller.close();
        else controller.enqueue(chunk);
      },
    });
    const streamed = await importRoute.POST(
      new Request(`${origin}/api/shows/import`, {
        method: 'POST',
        body: stream,
        headers: { host: '127.0.0.1:3000' },
        duplex: 'half',
      } as RequestInit),
    );
    expect(streamed.status).toBe(413);
    expect(sent).toBeLessThanOrEqual(12);
    expect((await json(await showsRoute.GET(request('/api/shows')))).shows.length).toBe(before);
  });

  it('malformed JSON is a 400 with the reason; a non-object body and a missing document too', async () => {
    const broken = await showsRoute.POST(
      request('/api/shows', {
        method: 'POST',
        body: '{"document": ',
        headers: { 'content-type': 'application/json' },
      }),
    );
    expect(broken.status).toBe(400);
    const body = await json(broken);
    expect(body.error).toMatch(/^The request body is not valid JSON/);
    expect(JSON.stringify(body)).not.toMatch(/at .*\.ts|node_modules/);

    expect((await showsRoute.POST(request('/api/shows', { method: 'POST', json: [1, 2] }))).status).toBe(400);
    expect((await showsRoute.POST(request('/api/shows', { method: 'POST', json: {} }))).status).toBe(400);
    const { id } = await createShow();
    expect((await save(id, 'one', demoDocument())).status).toBe(400);
    expect((await save(id, 0, demoDocument())).status).toBe(400);
  });

  it('schema errors are a 422 listing every problem with its path; nothing is saved', async () => {
    const { id } = await createShow();
    const spoiled: any = structuredClone(demoDocument());
    spoiled.fixtures[3].focus.z = 'high';
    spoiled.fixtures[4].levelPct = 140;
    const response = await save(id, 1, spoiled);
    expect(response.status).toBe(422);
    const body = await json(response);
    expect(body.error).toMatch(/not a valid Throwline plot; nothing was saved/);
    expect(body.problems).toEqual([
      'fixtures[3].focus.z: must be a number',
      'fixtures[4].levelPct: must be between 0 and 100',
    ]);
    // Rules across collections are checked too.
    const dangling: any = structuredClone(demoDocument());
    dangling.fixtures[0].typeId = 'type-9';
    const refused = await json(await save(id, 1, dangling));
    expect(refused.problems).toEqual([
      'fixtures[0].typeId: names a fixture type "type-9" that does not exist',
    ]);
    expect((await json(await showRoute.GET(request(`/api/shows/${id}`), context({ id })))).revision).toBe(1);

    const notAPlot = await importRoute.POST(
      request('/api/shows/import', { method: 'POST', body: '{"format":"something-else"}' }),
    );
    expect(notAPlot.status).toBe(422);
    expect((await json(notAPlot)).problems[0]).toMatch(/^format: this is not a Throwline plot file/);
  });

  it('import takes a plot file as text; export gives it back as a download', async () => {
    const original = demoDocument('conference.json');
    const imported = await importRoute.POST(
      request('/api/shows/import', { method: 'POST', body: savePlotText(original) }),
    );
    expect(imported.status).toBe(201);
    const { show } = await json(imported);
    expect(show.name).toBe(original.name);

    const exported = await exportRoute.GET(request(`/api/shows/${show.id}/export`), context({ id: show.id }));
    expect(exported.status).toBe(200);
    expect(exported.headers.get('content-disposition')).toBe(
      'attachment; filename="urban-transit-forum-main-stage-r1.throwline.json"',
    );
    expect(await exported.text()).toBe(savePlotText(original));
    const history = await json(
      await revisionsRoute.GET(request(`/api/shows/${show.id}/revisions`), context({ id: show.id })),
    );
    expect(history.revisions[0].summary).toBe('imported from a file');
  });

  it('unknown and malformed show ids are 404 with a message', async () => {
    for (const id of ['sh-0000000000000000', '../../etc/passwd', '']) {
      const response = await showRoute.GET(request(`/api/shows/x`), context({ id }));
      expect(response.status).toBe(404);
      expect((await json(response)).error).toBe('There is no show with that id.');
    }
  });

  it('an unexpected failure is a 500 with a plain message and no stack trace', async () => {
    const { id } = await createShow();
    const db = new Database(databasePath());
    db.prepare('UPDATE revisions SET document = ? WHERE show_id = ?').run('not json', id);
    db.close();
    const originalError = console.error;
    console.error = () => {};
    try {
      const response = await showRoute.GET(request(`/api/shows/${id}`), context({ id }));
      expect(response.status).toBe(500);
      expect(await json(response)).toEqual({ error: 'The server could not complete this request.' });
    } finally {
      console.error = originalError;
    }
  });

  it('refuses writes sent from another site’s page', async () => {
    const response = await showsRoute.POST(
      request('/api/shows', {
        method: 'POST',
        json: { document: demoDocument() },
        headers: { origin: 'http://evil.example' },
      }),
    );
    expect(response.status).toBe(403);
    const sameSite = await showsRoute.POST(
      request('/api/shows', { method: 'POST', json: { document: demoDocument() }, headers: { origin } }),
    );
    expect(sameSite.status).toBe(201);
  });

  it('with THROWLINE_TOKEN set, every call needs the token (bearer or sign-in cookie)', async () => {
    process.env.THROWLINE_TOKEN = 'correct horse battery staple';
    const denied = await showsRoute.GET(request('/api/shows'));
    expect(denied.status).toBe(401);
    expect((await json(denied)).error).toMatch(/access token/);
    expect(
      (await showsRoute.GET(request('/api/shows', { headers: { authorization: 'Bearer wrong' } }))).status,
    ).toBe(401);
    const { id } = await (async () => {
      const response = await showsRoute.POST(
        request('/api/shows', {
          method: 'POST',
          json: { document: demoDocument() },
          headers: { authorization: 'Bearer correct horse battery staple' },
        }),
      );
      expect(response.status).toBe(201);
      return { id: (await json(response)).show.id as string };
    })();
    expect(
      (await showRoute.DELETE(request(`/api/shows/${id}`, { method: 'DELETE' }), context({ id }))).status,
    ).toBe(401);

    const wrongSignIn = await sessionRoute.POST(
      request('/api/session', { method: 'POST', json: { token: 'guess' } }),
    );
    expect(wrongSignIn.status).toBe(401);
    const signIn = await sessionRoute.POST(
      request('/api/session', {
        method: 'POST',
        body: 'token=correct+horse+battery+staple',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
      }),
    );
    expect(signIn.status).toBe(303);
    const cookie = signIn.headers.get('set-cookie') ?? '';
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    const withCookie = await showsRoute.GET(
      request('/api/shows', { headers: { cookie: cookie.split(';')[0] } }),
    );
    expect(withCookie.status).toBe(200);
  });
});
