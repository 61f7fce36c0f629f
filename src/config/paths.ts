type Query = Record<string, string | number | boolean | null | undefined>;

function withQuery(pathname: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${pathname}?${search}` : pathname;
}

/** Only same-origin paths may be a return target, so a crafted link cannot send a user elsewhere. */
export function safeReturnPath(value: string | null | undefined): string {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return '/';
  return value;
}

export const paths = {
  home: { pattern: '/', to: () => '/' },
  signIn: {
    pattern: '/sign-in',
    to: (next?: string) => withQuery('/sign-in', { next: next && next !== '/' ? next : undefined }),
  },
  account: { pattern: '/account', to: () => '/account' },
  users: { pattern: '/users', to: (query?: Query) => withQuery('/users', query) },
} as const;
