import type { ApiClient } from '../helpers/api-client';
import type { TestApp } from '../helpers/test-app';

/** The demo workspace and its first scenario, as the demo editor (the consultant) sees them. */
export interface DemoScope {
  editor: ApiClient;
  wid: string;
  sid: string;
}

/** Signs the demo editor in and finds the demo workspace and a scenario in it. */
export async function demoScope(app: TestApp): Promise<DemoScope> {
  const editor = await app.signInAs('editor');
  const me = await editor.get('/api/me');
  const wid: string = me.body.memberships[0].workspaceId;
  const list = await editor.get(`/api/workspaces/${wid}/scenarios`);
  const room = list.body.items.find((s: { title: string }) => s.title.includes('Room A')) ?? list.body.items[0];
  return { editor, wid, sid: room.id };
}

/** Publishes the scenario's stored revision and returns the new snapshot's summary. */
export async function publish(c: ApiClient, wid: string, sid: string, body: Record<string, unknown> = {}) {
  const reply = await c.post(`/api/workspaces/${wid}/scenarios/${sid}/snapshots`, body);
  if (reply.status !== 201) throw new Error(`publish failed: ${reply.status} ${reply.text}`);
  return reply.body.snapshot as { id: string; inputHash: string; link: { status: string } };
}
