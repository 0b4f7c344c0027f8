/**
 * Who may use the API. On the default loopback address no token is needed. When THROWLINE_TOKEN is
 * set (required to serve on a network, see README), every API call must carry it, either as
 * `Authorization: Bearer <token>` or in the `throwline_token` cookie set by signing in on the start
 * page. Writes from another site's pages are refused whatever the token (their Origin differs).
 */
import { createHash, timingSafeEqual } from 'node:crypto';

/** Name of the cookie the sign-in form sets. */
export const TOKEN_COOKIE = 'throwline_token';

/** The configured access token, or null when none is required. */
export function requiredToken(): string | null {
  const token = process.env.THROWLINE_TOKEN?.trim();
  return token ? token : null;
}

/** Constant-time comparison of a presented token with the configured one (both hashed first). */
export function tokenMatches(presented: string | null | undefined): boolean {
  const token = requiredToken();
  if (token === null) return true;
  if (!presented) return false;
  const digest = (text: string) => createHash('sha256').update(text, 'utf8').digest();
  return timingSafeEqual(digest(presented), digest(token));
}

/** The value of one cookie in a Cookie header, or null. */
export function cookieValue(header: string | null, name: string): string | null {
  if (!header) return null;
  for (const part of header.split(';')) {
    const separator = part.indexOf('=');
    if (separator < 0) continue;
    if (part.slice(0, separator).trim() !== name) continue;
    try {
      return decodeURIComponent(part.slice(separator + 1).trim());
    } catch {
      return null;
    }
  }
  return null;
}

/** True when the request may use the API: no token configured, or the right one presented. */
export function requestHasAccess(request: Request): boolean {
  if (requiredToken() === null) return true;
  const authorization = request.headers.get('authorization');
  const bearer = authorization?.match(/^Bearer\s+(.+)$/i)?.[1]?.trim();
  if (bearer !== undefined) return tokenMatches(bearer);
  return tokenMatches(cookieValue(request.headers.get('cookie'), TOKEN_COOKIE));
}

/** True for a state-changing request sent by a page of another origin (a cross-site form or fetch). */
export function isCrossSiteWrite(request: Request): boolean {
  if (request.method === 'GET' || request.method === 'HEAD') return false;
  const origin = request.headers.get('origin');
  if (origin === null) return false;
  const host = request.headers.get('host');
  if (host === null) return true;
  try {
    return new URL(origin).host !== host;
  } catch {
    return true;
  }
}
