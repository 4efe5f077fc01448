/**
 * Every URL of the client in one place: `pattern` for the router, `to(...)` to build a link, so no
 * path is ever written by hand elsewhere.
 */
const enc = encodeURIComponent;

export const paths = {
  home: { pattern: '/', to: () => '/' },
  signIn: { pattern: '/sign-in', to: (next?: string) => (next ? `/sign-in?next=${enc(next)}` : '/sign-in') },
  signUp: { pattern: '/sign-up', to: (next?: string) => (next ? `/sign-up?next=${enc(next)}` : '/sign-up') },
  invitation: { pattern: '/invitations/:token', to: (token: string) => `/invitations/${enc(token)}` },
  workspaces: { pattern: '/workspaces', to: () => '/workspaces' },
  workspace: { pattern: '/w/:wid', to: (wid: string) => `/w/${enc(wid)}` },
  scenarios: {
    pattern: '/w/:wid/scenarios',
    to: (wid: string, q?: { q?: string; page?: number }) => {
      const params = new URLSearchParams();
      if (q?.q) params.set('q', q.q);
      if (q?.page && q.page > 1) params.set('page', String(q.page));
      const s = params.toString();
      return `/w/${enc(wid)}/scenarios${s ? `?${s}` : ''}`;
    },
  },
  scenario: { pattern: '/w/:wid/scenarios/:sid', to: (wid: string, sid: string) => `/w/${enc(wid)}/scenarios/${enc(sid)}` },
  scenarioHistory: {
    pattern: '/w/:wid/scenarios/:sid/history',
    to: (wid: string, sid: string) => `/w/${enc(wid)}/scenarios/${enc(sid)}/history`,
  },
  scenarioSensitivity: {
    pattern: '/w/:wid/scenarios/:sid/sensitivity',
    to: (wid: string, sid: string) => `/w/${enc(wid)}/scenarios/${enc(sid)}/sensitivity`,
  },
  fixtures: { pattern: '/w/:wid/fixtures', to: (wid: string) => `/w/${enc(wid)}/fixtures` },
  measurements: { pattern: '/w/:wid/measurements', to: (wid: string) => `/w/${enc(wid)}/measurements` },
  measurement: { pattern: '/w/:wid/measurements/:mid', to: (wid: string, mid: string) => `/w/${enc(wid)}/measurements/${enc(mid)}` },
  settings: { pattern: '/w/:wid/settings', to: (wid: string) => `/w/${enc(wid)}/settings` },
  admin: { pattern: '/admin/:section', to: (section: 'mail' | 'accounts') => `/admin/${section}` },
  sharedSnapshot: { pattern: '/s/:id', to: (id: string) => `/s/${enc(id)}` },
} as const;
