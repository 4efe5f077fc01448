import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitationPreviewSchema, invitationResponseSchema } from '../../src/contracts/api/invitations';
import { linkIn } from '../helpers/caught-mail';
import type { ApiClient } from '../helpers/api-client';
import { startTestApp, TEST_PASSWORD } from '../helpers/test-app';
import type { TestApp } from '../helpers/test-app';

let app: TestApp;
let owner: ApiClient;
let wid: string;

beforeAll(async () => {
  app = await startTestApp();
  owner = await app.signInAs('owner');
  wid = (await owner.get('/api/me')).body.memberships[0].workspaceId;
});
afterAll(async () => app?.close());

const tokenOf = (link: string) => new URL(link).pathname.split('/').pop() ?? '';

describe('invitations', () => {
  it('e-mails a link that a new person follows: preview, sign up, accept, and read as a viewer', async () => {
    const email = 'new.client@example.org';
    const sent = await owner.post(`/api/workspaces/${wid}/invitations`, { email, role: 'viewer' });
    expect(sent.status).toBe(201);
    const invitation = invitationResponseSchema.parse(sent.body).invitation;
    expect(invitation).toMatchObject({ email, role: 'viewer', status: 'pending' });
    // 7 days, as the issue asks.
    const days = (Date.parse(invitation.expiresAt) - Date.parse(invitation.createdAt)) / 86_400_000;
    expect(days).toBeCloseTo(7, 3);

    const mail = await app.mail.latestTo(email);
    expect(mail.subject).toContain("Hollow Brook Growers' Co-operative");
    const link = linkIn(mail, '/invitations/');
    const token = tokenOf(link);
    expect(token).toHaveLength(43);
    // Only a hash is stored, never the secret itself.
    const stored = await app.m.Invitation.findByPk(invitation.id);
    expect(JSON.stringify(stored?.get({ plain: true }))).not.toContain(token);

    const visitor = app.client();
    const preview = invitationPreviewSchema.parse((await visitor.get(`/api/invitations/${token}`)).body);
    expect(preview).toMatchObject({ workspaceName: "Hollow Brook Growers' Co-operative", role: 'viewer', email, status: 'pending' });

    expect((await visitor.post(`/api/invitations/${token}/accept`)).status).toBe(401);
    const invitee = await app.signUpAndIn(email, 'New Client');
    const accepted = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body.membership).toMatchObject({ workspaceId: wid, role: 'viewer' });

    expect((await invitee.get(`/api/workspaces/${wid}/scenarios`)).status).toBe(200);
    expect((await invitee.post(`/api/workspaces/${wid}/fixtures`, { key: 'x', label: 'x', technology: 'led', wallWatts: 1, photonEfficacy: 1, fixturePrice: '1' })).status).toBe(403);
    const members = (await owner.get(`/api/workspaces/${wid}/members`)).body.members;
    expect(members).toEqual(expect.arrayContaining([expect.objectContaining({ email, role: 'viewer' })]));

    // One use only.
    const again = await invitee.post(`/api/invitations/${token}/accept`);
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('gone');
    expect(invitationPreviewSchema.parse((await visitor.get(`/api/invitations/${token}`)).body).status).toBe('accepted');
  });

  it('refuses a link accepted by someone signed in as another address', async () => {
    await owner.post(`/api/workspaces/${wid}/invitations`, { email: 'intended@example.org', role: 'editor' });
    const token = tokenOf(linkIn(await app.mail.latestTo('intended@example.org'), '/invitations/'));
    const other = await app.signUpAndIn('someone-else@example.org');
    const reply = await other.post(`/api/invitations/${token}/accept`);
    expect(reply.status).toBe(403);
    expect(reply.body.error.message).toContain('intended@example.org');
  });

  it('stops a revoked invitation from working', async () => {
    const sent = await owner.post(`/api/workspaces/${wid}/invitations`, { email: 'revoked@example.org', role: 'viewer' });
    const token = tokenOf(linkIn(await app.mail.latestTo('revoked@example.org'), '/invitations/'));
    expect((await owner.delete(`/api/workspaces/${wid}/invitations/${sent.body.invitation.id}`)).status).toBe(204);
    const invitee = await app.signUpAndIn('revoked@example.org');
    expect((await invitee.post(`/api/invitations/${token}/accept`)).status).toBe(410);
  });

  it('stops an invitation older than 7 days from working', async () => {
    const sent = await owner.post(`/api/workspaces/${wid}/invitations`, { email: 'late@example.org', role: 'viewer' });
    const token = tokenOf(linkIn(await app.mail.latestTo('late@example.org'), '/invitations/'));
    await app.m.Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: sent.body.invitation.id } });
    const invitee = await app.signUpAndIn('late@example.org', 'Late', TEST_PASSWORD);
    const reply = await invitee.post(`/api/invitations/${token}/accept`);
    expect(reply.status).toBe(410);
    expect(reply.body.error.message).toContain('expired');
  });

  it('answers a made-up link with 404', async () => {
    const reply = await app.client().get(`/api/invitations/${'A'.repeat(43)}`);
    expect(reply.status).toBe(404);
  });

  it('refuses to invite someone who is already a member', async () => {
    const reply = await owner.post(`/api/workspaces/${wid}/invitations`, { email: 'odile.farrant@hollowbrook.example', role: 'viewer' });
    expect(reply.status).toBe(409);
  });

  it('lets owners change roles but never demote the last owner', async () => {
    const me = (await owner.get('/api/me')).body.user.id;
    const reply = await owner.patch(`/api/workspaces/${wid}/members/${me}`, { role: 'editor' });
    expect(reply.status).toBe(409);
    expect(reply.body.error.fields[0].path).toBe('role');
  });

  it('records invitations in the audit log', async () => {
    const rows = (await app.m.Audit.findAll()).map((r) => r.get({ plain: true }).action);
    expect(rows).toEqual(expect.arrayContaining(['invitation_sent', 'invitation_accepted', 'invitation_revoked', 'sign_in', 'sign_up']));
  });
});
