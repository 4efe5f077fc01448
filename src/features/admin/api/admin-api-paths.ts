const enc = encodeURIComponent;

/** The site-admin API paths, kept beside the only feature that calls them. */
export const adminApiPaths = {
  users: (q: { q?: string; page?: number; pageSize?: number }) => {
    const params = new URLSearchParams();
    if (q.q) params.set('q', q.q);
    if (q.page) params.set('page', String(q.page));
    if (q.pageSize) params.set('pageSize', String(q.pageSize));
    const s = params.toString();
    return `/api/admin/users${s ? `?${s}` : ''}`;
  },
  user: (uid: string) => `/api/admin/users/${enc(uid)}`,
  mail: () => '/api/admin/mail',
} as const;
