const enc = encodeURIComponent;

/** API paths, built in one place too. */
export const apiPaths = {
  me: () => '/api/me',
  signUp: () => '/api/account/sign-up',
  examples: () => '/api/examples',
  example: (id: string) => `/api/examples/${enc(id)}`,
  workspaces: () => '/api/workspaces',
  workspace: (wid: string) => `/api/workspaces/${enc(wid)}`,
  members: (wid: string) => `/api/workspaces/${enc(wid)}/members`,
  member: (wid: string, userId: string) => `/api/workspaces/${enc(wid)}/members/${enc(userId)}`,
  invitations: (wid: string) => `/api/workspaces/${enc(wid)}/invitations`,
  invitationOfWorkspace: (wid: string, iid: string) => `/api/workspaces/${enc(wid)}/invitations/${enc(iid)}`,
  invitation: (token: string) => `/api/invitations/${enc(token)}`,
  acceptInvitation: (token: string) => `/api/invitations/${enc(token)}/accept`,
  fixtures: (wid: string) => `/api/workspaces/${enc(wid)}/fixtures`,
  fixture: (wid: string, fid: string) => `/api/workspaces/${enc(wid)}/fixtures/${enc(fid)}`,
  fixturesImport: (wid: string) => `/api/workspaces/${enc(wid)}/fixtures/import`,
  fixturesExport: (wid: string) => `/api/workspaces/${enc(wid)}/fixtures/export`,
  measurements: (wid: string) => `/api/workspaces/${enc(wid)}/measurements`,
  measurement: (wid: string, mid: string) => `/api/workspaces/${enc(wid)}/measurements/${enc(mid)}`,
  measurementFile: (wid: string, mid: string) => `/api/workspaces/${enc(wid)}/measurements/${enc(mid)}/file`,
  applyMeasurement: (wid: string, mid: string) => `/api/workspaces/${enc(wid)}/measurements/${enc(mid)}/apply`,
  scenarios: (wid: string, q?: { q?: string; page?: number; pageSize?: number }) => {
    const params = new URLSearchParams();
    if (q?.q) params.set('q', q.q);
    if (q?.page) params.set('page', String(q.page));
    if (q?.pageSize) params.set('pageSize', String(q.pageSize));
    const s = params.toString();
    return `/api/workspaces/${enc(wid)}/scenarios${s ? `?${s}` : ''}`;
  },
  scenario: (wid: string, sid: string) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}`,
  scenarioAnalysis: (wid: string, sid: string) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/analysis`,
  revisions: (wid: string, sid: string) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/revisions`,
  revision: (wid: string, sid: string, rev: number) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/revisions/${rev}`,
  restoreRevision: (wid: string, sid: string, rev: number) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/revisions/${rev}/restore`,
  duplicateScenario: (wid: string, sid: string) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/duplicate`,
  authCsrf: () => '/auth/csrf',
  authCredentials: () => '/auth/callback/credentials',
  authEmail: () => '/auth/signin/nodemailer',
  authSignOut: () => '/auth/signout',
} as const;
