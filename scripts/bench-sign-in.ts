/** Signs in over HTTP as a browser would and returns the session cookie. */
export async function signIn(base: string, username: string, password: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const first = csrfRes.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { token } = (await csrfRes.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { cookie: first, 'content-type': 'application/json', 'x-csrf-token': token },
    body: JSON.stringify({ username, password }),
  });
  if (login.status !== 200) throw new Error(`bench sign-in answered ${login.status}`);
  return (
    login.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ') || first
  );
}
