/** Calls to the show API from the browser; every failure comes back as a message a person can read. */

export type ApiAnswer<T> = { ok: true; body: T } | { ok: false; message: string; problems: string[] };

/** Send a request to the show API; the server's JSON error (and its list of problems) on failure. */
export async function callShowsApi<T>(path: string, init: RequestInit = {}): Promise<ApiAnswer<T>> {
  let response: Response;
  try {
    response = await fetch(path, init);
  } catch {
    return { ok: false, message: 'The server cannot be reached.', problems: [] };
  }
  const body = (await response.json().catch(() => null)) as
    (T & { error?: unknown; problems?: unknown }) | null;
  if (response.ok && body !== null) return { ok: true, body };
  const message = typeof body?.error === 'string' ? body.error : `The server answered ${response.status}.`;
  const problems = Array.isArray(body?.problems) ? body.problems.map(String) : [];
  return { ok: false, message, problems };
}

/** JSON request options. */
export function jsonBody(method: string, value: unknown): RequestInit {
  return { method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(value) };
}
