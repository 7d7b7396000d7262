import { demoPassword } from './sign-in';

export interface ApiSession {
  userId: string;
  get: <T>(path: string) => Promise<T>;
  post: <T>(path: string, body: unknown) => Promise<T>;
}

async function answer<T>(res: Response, what: string): Promise<T> {
  const text = await res.text();
  if (!res.ok) throw new Error(`${what} answered ${res.status}: ${text}`);
  return JSON.parse(text) as T;
}

/**
 * A demo member signed in to the API directly, for the setup a flow does not walk through itself (what someone
 * else did before the day starts).
 */
export async function apiSession(baseUrl: string, email: string): Promise<ApiSession> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  const { token } = await answer<{ token: string }>(login, `signing in ${email}`);
  const auth = { Authorization: `Bearer ${token}` };
  const get = async <T>(path: string) => answer<T>(await fetch(`${baseUrl}/api${path}`, { headers: auth }), `GET ${path}`);
  const post = async <T>(path: string, body: unknown) =>
    answer<T>(
      await fetch(`${baseUrl}/api${path}`, { method: 'POST', headers: { ...auth, 'Content-Type': 'application/json' }, body: JSON.stringify(body) }),
      `POST ${path}`,
    );
  const me = await get<{ user: { id: string } }>('/me');
  return { userId: me.user.id, get, post };
}
