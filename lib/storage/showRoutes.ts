/**
 * What each show API route does, kept here so the files under app/api only wire them up. Every
 * document in a request is checked with the plot schema (loadPlotValue / loadPlotText): a bad one is
 * refused with one line per problem and nothing is stored.
 */
import { type PlotDocument, loadPlotText, loadPlotValue, savePlotText } from '@/lib/plot';
import { ApiError, jsonResponse, readBodyText, readJsonBody } from './http';
import { getServerStore } from './serverStore';
import { SHOW_ID_PATTERN, type ShowOrigin, type ShowSummary, type StoredShow } from './showStore';

function validDocument(value: unknown, field: string): PlotDocument {
  const loaded = loadPlotValue(value);
  if (loaded.ok) return loaded.document;
  throw new ApiError(422, `The ${field} is not a valid Throwline plot; nothing was saved.`, {
    problems: loaded.errors,
  });
}

function bodyObject(value: unknown): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new ApiError(400, 'The request body must be a JSON object.');
  }
  return value as Record<string, unknown>;
}

function showId(params: { id?: string }): string {
  const id = params.id ?? '';
  if (!SHOW_ID_PATTERN.test(id)) throw new ApiError(404, 'There is no show with that id.');
  return id;
}

function revisionNumber(text: string | null | undefined): number {
  const revision = Number(text);
  if (!text || !/^\d{1,9}$/.test(text) || !Number.isSafeInteger(revision) || revision < 1) {
    throw new ApiError(404, 'There is no such revision (revisions are whole numbers from 1).');
  }
  return revision;
}

function summaryOnly(show: StoredShow | ShowSummary): ShowSummary {
  const { id, name, venue, revision, createdAt, updatedAt, deletedAt } = show;
  return { id, name, venue, revision, createdAt, updatedAt, deletedAt };
}

async function existingShow(id: string): Promise<StoredShow> {
  const show = await (await getServerStore()).getShow(id);
  if (!show) throw new ApiError(404, 'There is no show with that id.');
  return show;
}

/** A file name for a download: the show's name in plain letters and digits. */
export function exportFileName(name: string, revision: number): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .toLowerCase();
  return `${slug || 'show'}-r${revision}.throwline.json`;
}

const ORIGINS: readonly ShowOrigin[] = ['created', 'demo', 'copy'];

/** GET /api/shows (`?bin=1` lists the bin). */
export async function listShowsRoute(request: Request): Promise<Response> {
  const inBin = new URL(request.url).searchParams.get('bin') === '1';
  return jsonResponse({ shows: await (await getServerStore()).listShows({ inBin }) });
}

/** POST /api/shows with `{ document, origin? }`. */
export async function createShowRoute(request: Request): Promise<Response> {
  const body = bodyObject(await readJsonBody(request));
  if (!('document' in body)) throw new ApiError(400, 'The request body needs a "document" field.');
  const document = validDocument(body.document, 'document');
  const origin = ORIGINS.includes(body.origin as ShowOrigin) ? (body.origin as ShowOrigin) : 'created';
  const show = await (await getServerStore()).createShow(document, origin);
  return jsonResponse({ show: summaryOnly(show), revision: show.revision }, 201, {
    Location: `/api/shows/${show.id}`,
  });
}

/** POST /api/shows/import with the text of a plot file as the body (older versions are migrated). */
export async function importShowRoute(request: Request): Promise<Response> {
  const text = await readBodyText(request);
  const loaded = loadPlotText(text);
  if (!loaded.ok) {
    throw new ApiError(422, 'The file is not a Throwline plot this version can open; nothing was saved.', {
      problems: loaded.errors,
    });
  }
  const show = await (await getServerStore()).createShow(loaded.document, 'imported');
  return jsonResponse(
    { show: summaryOnly(show), revision: show.revision, migrations: loaded.migrations },
    201,
    {
      Location: `/api/shows/${show.id}`,
    },
  );
}

/** GET /api/shows/{id}: the head revision's document and its number. */
export async function getShowRoute(_request: Request, params: { id?: string }): Promise<Response> {
  const show = await existingShow(showId(params));
  return jsonResponse({ show: summaryOnly(show), revision: show.revision, document: show.document });
}

/** PUT /api/shows/{id} with `{ baseRevision, document }`: a new revision, or 409 if the head moved on. */
export async function saveShowRoute(request: Request, params: { id?: string }): Promise<Response> {
  const id = showId(params);
  const body = bodyObject(await readJsonBody(request));
  const base = body.baseRevision;
  if (typeof base !== 'number' || !Number.isSafeInteger(base) || base < 1) {
    throw new ApiError(400, '"baseRevision" must be the whole revision number the document was based on.');
  }
  if (!('document' in body)) throw new ApiError(400, 'The request body needs a "document" field.');
  const document = validDocument(body.document, 'document');
  const result = await (await getServerStore()).saveShow(id, base, document);
  if (result.ok) {
    return jsonResponse({ revision: result.revision, savedAt: result.savedAt, unchanged: result.unchanged });
  }
  switch (result.reason) {
    case 'not-found':
      throw new ApiError(404, 'There is no show with that id.');
    case 'in-bin':
      throw new ApiError(409, 'This show is in the bin; restore it or save your copy as a new show.', {
        conflict: 'in-bin',
        currentRevision: result.currentRevision,
      });
    case 'conflict':
      throw new ApiError(
        409,
        `Revision ${result.currentRevision} was saved since revision ${base}, which your copy is based on. Nothing was overwritten.`,
        { conflict: 'revision', currentRevision: result.currentRevision },
      );
  }
}

/** DELETE /api/shows/{id}: move the show to the bin. */
export async function binShowRoute(_request: Request, params: { id?: string }): Promise<Response> {
  const id = showId(params);
  const store = await getServerStore();
  if (!(await store.moveToBin(id))) throw new ApiError(404, 'There is no show with that id.');
  return jsonResponse({ show: summaryOnly(await existingShow(id)) });
}

/** POST /api/shows/{id}/undelete: take the show out of the bin. */
export async function unbinShowRoute(_request: Request, params: { id?: string }): Promise<Response> {
  const id = showId(params);
  const store = await getServerStore();
  if (!(await store.restoreFromBin(id))) throw new ApiError(404, 'There is no show with that id.');
  return jsonResponse({ show: summaryOnly(await existingShow(id)) });
}

/** GET /api/shows/{id}/revisions: every revision, newest first, with what changed. */
export async function listRevisionsRoute(_request: Request, params: { id?: string }): Promise<Response> {
  const revisions = await (await getServerStore()).listRevisions(showId(params));
  if (revisions === null) throw new ApiError(404, 'There is no show with that id.');
  return jsonResponse({ revisions });
}

/** GET /api/shows/{id}/revisions/{revision}: one revision's document. */
export async function getRevisionRoute(
  _request: Request,
  params: { id?: string; revision?: string },
): Promise<Response> {
  const found = await (await getServerStore()).getRevision(showId(params), revisionNumber(params.revision));
  if (!found) throw new ApiError(404, 'There is no such revision of that show.');
  return jsonResponse(found);
}

/** POST /api/shows/{id}/revisions/{revision}/restore: that revision's document becomes a new head. */
export async function restoreRevisionRoute(
  _request: Request,
  params: { id?: string; revision?: string },
): Promise<Response> {
  const result = await (
    await getServerStore()
  ).restoreRevision(showId(params), revisionNumber(params.revision));
  if (result.ok) return jsonResponse({ revision: result.revision }, 201);
  if (result.reason === 'in-bin') {
    throw new ApiError(409, 'This show is in the bin; restore it from the bin first.', {
      conflict: 'in-bin',
    });
  }
  throw new ApiError(404, 'There is no such revision of that show.');
}

/** GET /api/shows/{id}/export (`?revision=n` for an older one): the plot file as a download. */
export async function exportShowRoute(request: Request, params: { id?: string }): Promise<Response> {
  const id = showId(params);
  const asked = new URL(request.url).searchParams.get('revision');
  const store = await getServerStore();
  const found = asked === null ? await existingShow(id) : await store.getRevision(id, revisionNumber(asked));
  if (!found) throw new ApiError(404, 'There is no such revision of that show.');
  const revision = 'revision' in found ? found.revision : 1;
  return new Response(savePlotText(found.document), {
    headers: {
      'Content-Type': 'application/json; charset=utf-8',
      'Content-Disposition': `attachment; filename="${exportFileName(found.document.name, revision)}"`,
      'Cache-Control': 'no-store',
    },
  });
}
