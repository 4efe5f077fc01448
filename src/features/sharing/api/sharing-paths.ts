const enc = encodeURIComponent;

/** API paths of sharing, built in one place. */
export const sharingApi = {
  snapshot: (id: string) => `/api/snapshots/${enc(id)}`,
  scenarioFile: (id: string) => `/api/snapshots/${enc(id)}/scenario.json`,
  totalsCsv: (id: string) => `/api/snapshots/${enc(id)}/totals.csv`,
  ledgerCsv: (id: string) => `/api/snapshots/${enc(id)}/ledger.csv`,
  fork: (id: string) => `/api/snapshots/${enc(id)}/fork`,
  scenarioSnapshots: (wid: string, sid: string) => `/api/workspaces/${enc(wid)}/scenarios/${enc(sid)}/snapshots`,
  workspaceSnapshot: (wid: string, id: string) => `/api/workspaces/${enc(wid)}/snapshots/${enc(id)}`,
  revoke: (wid: string, id: string) => `/api/workspaces/${enc(wid)}/snapshots/${enc(id)}/revoke`,
  send: (wid: string, id: string) => `/api/workspaces/${enc(wid)}/snapshots/${enc(id)}/send`,
} as const;
