/** Signing in over real HTTP (fetch), for tests and benches that talk to a listening server. */
export interface Member {
  email: string;
  cookie: string;
  csrf: string;
}

function sessionCookie(res: globalThis.Response): string {
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith('gripline.sid='));
  if (!cookie) throw new Error(`no session cookie from ${res.url} (${res.status})`);
  return cookie.split(';')[0]!;
}

/** GET /api/auth/csrf, then POST /api/auth/login: the regenerated session's cookie and token. */
export async function signIn(base: string, email: string, password: string): Promise<Member> {
  const first = await fetch(`${base}/api/auth/csrf`);
  const { token } = (await first.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: sessionCookie(first), 'x-csrf-token': token },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in failed for ${email}: ${login.status} ${await login.text()}`);
  const { csrfToken } = (await login.json()) as { csrfToken: string };
  return { email, cookie: sessionCookie(login), csrf: csrfToken };
}
