export interface HttpSession {
  cookie: string;
  token: string;
}

function mergeCookies(previous: string, res: Response): string {
  const jar = new Map(
    previous
      .split('; ')
      .filter(Boolean)
      .map((c) => [c.split('=')[0]!, c] as const),
  );
  for (const set of res.headers.getSetCookie()) {
    const pair = set.split(';')[0]!;
    jar.set(pair.split('=')[0]!, pair);
  }
  return [...jar.values()].join('; ');
}

async function csrf(base: string, cookie: string): Promise<HttpSession> {
  const res = await fetch(`${base}/api/auth/csrf`, { headers: { cookie } });
  const { token } = (await res.json()) as { token: string };
  return { cookie: mergeCookies(cookie, res), token };
}

/** Signs in over HTTP as a browser would: CSRF cookie and token, sign-in, a fresh token. */
export async function signInOverHttp(base: string, username: string, password: string): Promise<HttpSession> {
  const before = await csrf(base, '');
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { cookie: before.cookie, 'x-csrf-token': before.token, 'content-type': 'application/json' },
    body: JSON.stringify({ username, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${username} answered ${res.status}`);
  await res.arrayBuffer();
  return csrf(base, mergeCookies(before.cookie, res));
}
