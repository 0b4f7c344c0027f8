/**
 * Signing in to a server that requires THROWLINE_TOKEN: the start page's form posts the token here;
 * when it matches, an HttpOnly, same-site cookie carries it on every later page and API request.
 */
import { TOKEN_COOKIE, isCrossSiteWrite, requiredToken, tokenMatches } from './access';
import { ApiError, jsonResponse, readBodyText } from './http';

const THIRTY_DAYS_S = 30 * 24 * 3600;

function redirect(location: string, cookie?: string): Response {
  const headers: Record<string, string> = { Location: location, 'Cache-Control': 'no-store' };
  if (cookie) headers['Set-Cookie'] = cookie;
  return new Response(null, { status: 303, headers });
}

/** POST /api/session with form field or JSON `token`: sets the cookie (303 to the start page for forms). */
export async function signInRoute(request: Request): Promise<Response> {
  try {
    if (isCrossSiteWrite(request)) throw new ApiError(403, 'Sign-in from pages of another site is refused.');
    const text = await readBodyText(request, 16 * 1024);
    const isForm = (request.headers.get('content-type') ?? '').includes('application/x-www-form-urlencoded');
    let presented: string | null = null;
    if (isForm) {
      presented = new URLSearchParams(text).get('token');
    } else {
      try {
        const parsed: unknown = JSON.parse(text);
        const token = (parsed as { token?: unknown } | null)?.token;
        presented = typeof token === 'string' ? token : null;
      } catch {
        throw new ApiError(400, 'Send the token as a form field or as JSON {"token": "…"}.');
      }
    }
    const ok = requiredToken() !== null && tokenMatches(presented?.trim());
    if (!ok) {
      if (isForm) return redirect('/?signin=failed');
      throw new ApiError(401, 'That is not this server’s access token.');
    }
    const cookie = `${TOKEN_COOKIE}=${encodeURIComponent(presented!.trim())}; Path=/; HttpOnly; SameSite=Strict; Max-Age=${THIRTY_DAYS_S}`;
    if (isForm) return redirect('/', cookie);
    return jsonResponse({ signedIn: true }, 200, { 'Set-Cookie': cookie });
  } catch (error) {
    if (error instanceof ApiError) return jsonResponse({ error: error.message }, error.status);
    console.error('Throwline sign-in error:', error);
    return jsonResponse({ error: 'The server could not complete this request.' }, 500);
  }
}
