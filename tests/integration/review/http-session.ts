/** Signs in to the running app (APP_URL) through next-auth's password callback and keeps the cookies. */
import { APP_URL } from './fixtures';

export type Fetcher = (path: string, init?: RequestInit) => Promise<Response>;

export async function signedInFetch(email: string, password: string): Promise<Fetcher> {
  const jar = new Map<string, string>();
  const keep = (response: Response) => {
    for (const cookie of response.headers.getSetCookie()) {
      const [pair] = cookie.split(';');
      const at = pair.indexOf('=');
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookieHeader = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = await fetch(`${APP_URL}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const signIn = await fetch(`${APP_URL}/api/auth/callback/password`, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookieHeader() },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
    redirect: 'manual',
  });
  keep(signIn);
  if (![...jar.keys()].some((k) => k.includes('session-token'))) throw new Error(`signing in as ${email} failed (${signIn.status})`);
  return (path, init = {}) =>
    fetch(`${APP_URL}${path}`, { ...init, redirect: 'manual', headers: { ...(init.headers as Record<string, string>), cookie: cookieHeader() } });
}

export const anonymousFetch: Fetcher = (path, init) => fetch(`${APP_URL}${path}`, { ...init, redirect: 'manual' });
