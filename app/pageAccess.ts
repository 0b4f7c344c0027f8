import { cookies } from 'next/headers';
import { TOKEN_COOKIE, tokenMatches } from '@/lib/storage/access';

/** True when the visitor may see pages: no token required, or the sign-in cookie carries it. */
export async function pageHasAccess(): Promise<boolean> {
  return tokenMatches((await cookies()).get(TOKEN_COOKIE)?.value);
}
