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
  /** Where a person whose password an admin reset must set their own before anything else. */
  setPassword: { pattern: '/set-password', to: () => '/set-password' },
  /** What this phone still holds for the server: flags, photos and shelf marks. */
  outbox: { pattern: '/outbox', to: () => '/outbox' },
  scan: { pattern: '/scan', to: () => '/scan' },
  users: { pattern: '/users', to: (query?: Query) => withQuery('/users', query) },
  historyImport: { pattern: '/imports/history', to: () => '/imports/history' },
  cookRuns: { pattern: '/cook-runs', to: (query?: Query) => withQuery('/cook-runs', query) },
  cookRun: { pattern: '/cook-runs/:id', to: (id: number) => `/cook-runs/${id}` },
  cultures: { pattern: '/cultures', to: (query?: Query) => withQuery('/cultures', query) },
  culture: { pattern: '/cultures/:id', to: (id: number) => `/cultures/${id}` },
  sessions: { pattern: '/sessions', to: (query?: Query) => withQuery('/sessions', query) },
  session: { pattern: '/sessions/:id', to: (id: number) => `/sessions/${id}` },
  grain: { pattern: '/grain', to: (query?: Query) => withQuery('/grain', query) },
  incidents: { pattern: '/incidents', to: (query?: Query) => withQuery('/incidents', query) },
  incident: { pattern: '/incidents/:id', to: (id: number) => `/incidents/${id}` },
  actions: { pattern: '/actions', to: (query?: Query) => withQuery('/actions', query) },
  flagJar: { pattern: '/incidents/new', to: (jar?: string) => withQuery('/incidents/new', { jar }) },
  /** The jar's public page, as printed in its QR code (DESIGN.md §5). */
  jarPage: { pattern: '/j/:label', to: (label: string) => `/j/${encodeURIComponent(label)}` },
  jars: { pattern: '/jars', to: (query?: Query) => withQuery('/jars', query) },
  newJars: { pattern: '/jars/new', to: (sessionId?: number) => withQuery('/jars/new', { session: sessionId }) },
  jarLabels: {
    pattern: '/jars/labels',
    to: (query: { session?: number; ids?: string; layout?: 'sheet' | 'roll' }) => withQuery('/jars/labels', query),
  },
  shelfWalk: {
    pattern: '/jars/shelf-walk',
    to: (query?: { room?: string; shelf?: string }) => withQuery('/jars/shelf-walk', query),
  },
  lineage: { pattern: '/lineage/:kind/:id', to: (kind: 'culture' | 'jar', id: number) => `/lineage/${kind}/${id}` },
  procedures: { pattern: '/procedures', to: () => '/procedures' },
  procedure: { pattern: '/procedures/:id', to: (id: number) => `/procedures/${id}` },
  procedureVersion: { pattern: '/procedures/versions/:id', to: (id: number) => `/procedures/versions/${id}` },
  training: { pattern: '/training', to: (procedureId?: number) => withQuery('/training', { procedure: procedureId }) },
  mailPreferences: { pattern: '/account/mail', to: () => '/account/mail' },
  sentMail: { pattern: '/mail/sent', to: (query?: Query) => withQuery('/mail/sent', query) },
  analysisWeekly: { pattern: '/analysis/weekly', to: (query?: Query) => withQuery('/analysis/weekly', query) },
  analysisCauses: { pattern: '/analysis/causes', to: (query?: Query) => withQuery('/analysis/causes', query) },
  analysisRates: { pattern: '/analysis/rates', to: (query?: Query) => withQuery('/analysis/rates', query) },
  analysisCrosstab: { pattern: '/analysis/crosstab', to: (query?: Query) => withQuery('/analysis/crosstab', query) },
  analysisColonisation: {
    pattern: '/analysis/colonisation',
    to: (query?: Query) => withQuery('/analysis/colonisation', query),
  },
  analysisLethality: { pattern: '/analysis/lethality', to: (query?: Query) => withQuery('/analysis/lethality', query) },
  analysisActions: { pattern: '/analysis/actions', to: (query?: Query) => withQuery('/analysis/actions', query) },
  analysisJars: { pattern: '/analysis/jars', to: (query?: Query) => withQuery('/analysis/jars', query) },
  labSettings: { pattern: '/settings', to: () => '/settings' },
} as const;
