/**
 * The HTTP edge of the show API: bodies read with a size limit, JSON errors a person can read, the
 * access check, and no stack traces to the client (unexpected errors are logged on the server).
 */
import { MAX_PLOT_FILE_BYTES } from '@/lib/plot';
import { isCrossSiteWrite, requestHasAccess } from './access';

/** An error the client is meant to read: an HTTP status, a message and optional details. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** A JSON response with no caching (shows change with every save). */
export function jsonResponse(body: unknown, status = 200, headers: Record<string, string> = {}): Response {
  return Response.json(body, { status, headers: { 'Cache-Control': 'no-store', ...headers } });
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

function tooLarge(bytes: number | null): ApiError {
  const size = bytes === null ? 'over 10 MB' : megabytes(bytes);
  return new ApiError(
    413,
    `The request is ${size}; a show is limited to ${megabytes(MAX_PLOT_FILE_BYTES)}. Nothing was saved.`,
  );
}

/** The body as UTF-8 text, refused (413) past `limitBytes` without reading the rest. */
export async function readBodyText(request: Request, limitBytes = MAX_PLOT_FILE_BYTES): Promise<string> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > limitBytes) throw tooLarge(declared);
  if (request.body === null) return '';
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      await reader.cancel();
      throw tooLarge(null);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new ApiError(400, 'The request body is not UTF-8 text.');
  }
}

/** The body parsed as JSON (400 with the parser's reason when it is not). */
export async function readJsonBody(request: Request): Promise<unknown> {
  const text = await readBodyText(request);
  if (text.trim() === '') throw new ApiError(400, 'The request body is empty; expected JSON.');
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new ApiError(400, `The request body is not valid JSON (${(error as Error).message}).`);
  }
}

type Params = Record<string, string>;
type Handler<P extends Params> = (request: Request, params: P) => Promise<Response>;

/**
 * Wrap a handler for a route file: access and cross-site checks first, ApiErrors become JSON
 * responses, anything else a 500 with a plain message (and the details in the server log).
 */
export function apiRoute<P extends Params = Params>(handler: Handler<P>) {
  return async (request: Request, context?: { params: Promise<P> }): Promise<Response> => {
    try {
      if (!requestHasAccess(request)) {
        throw new ApiError(401, 'This server needs its access token: sign in on the start page.');
      }
      if (isCrossSiteWrite(request)) {
        throw new ApiError(403, 'Changes from pages of another site are refused.');
      }
      const params = context ? await context.params : ({} as P);
      return await handler(request, params);
    } catch (error) {
      if (error instanceof ApiError) {
        return jsonResponse({ error: error.message, ...error.details }, error.status);
      }
      console.error('Throwline API error:', error);
      return jsonResponse({ error: 'The server could not complete this request.' }, 500);
    }
  };
}
