import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/db/demo-accounts';
import { models } from '../../server/db/models';
import { listCaughtMail } from '../../server/repos/mail';
import { shown, signIn, startHarness } from './harness';
import type { Harness } from './harness';

// The invented demo accounts (server/db/demo-accounts.ts), passwords as published in README.
let h: Harness;
const admin = DEMO_ACCOUNTS.find((a) => a.isSiteAdmin)!;
const grower = DEMO_ACCOUNTS.find((a) => a.role === 'owner')!;
const consultant = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!;

beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

describe('site administration in a browser', { timeout: 120_000 }, () => {
  it('shows the site admin a sign-in mail the fake mail server caught, with its link working', async () => {
    const visitor = await h.session();
    await visitor.page.goto('/sign-in');
    await visitor.page.getByLabel('E-mail address').fill(consultant.email);
    await visitor.page.getByRole('button', { name: 'E-mail me a sign-in link instead' }).click();
    expect(await shown(visitor.page.getByText(`A sign-in link is on its way to ${consultant.email}`))).toBe(true);
    await visitor.close();
    const caught = (await listCaughtMail(models(h.running.sequelize))).find((m) => m.to.includes(consultant.email));
    const url = /https?:\/\/\S+\/auth\/callback\/nodemailer\S+/.exec(caught?.text ?? '')?.[0];
    expect(url).toBeDefined();

    const s = await h.session();
    await signIn(s, admin.email, admin.password);
    await s.page.getByRole('link', { name: 'Site admin' }).click();
    await s.page.waitForURL('**/admin/mail');
    expect(await shown(s.page.getByText('Nothing on this page was delivered'))).toBe(true);
    const row = s.page.getByRole('table', { name: 'Caught messages' }).getByRole('row').filter({ hasText: consultant.email });
    expect(await shown(row)).toBe(true);
    const subject = row.getByRole('link', { name: 'Your Photon Parity sign-in link' });
    await subject.focus();
    await s.page.keyboard.press('Enter');
    const message = s.page.getByRole('article', { name: 'Your Photon Parity sign-in link' });
    expect(await shown(message)).toBe(true);
    expect(await message.getByText(`Hello ${consultant.name},`).count()).toBe(1);
    const link = message.getByRole('link', { name: url! });
    expect(await link.getAttribute('href')).toBe(url);
    await s.screenshot('50-admin-mail');

    // The link in the caught mail works: it signs this browser in as the person it was sent to.
    await link.click();
    expect(await shown(s.page.getByText(`Signed in as ${consultant.name}`))).toBe(true);
    expect(await s.page.getByRole('link', { name: 'Site admin' }).count()).toBe(0);
    expect(s.errors, s.errors.join('\n')).toEqual([]);
    await s.close();
  });

  it('lets the site admin disable and enable an account, and shows the server refusing an empty name beside the form', async () => {
    const s = await h.session();
    await signIn(s, admin.email, admin.password);
    await s.page.getByRole('link', { name: 'Site admin' }).click();
    await s.page.getByRole('navigation', { name: 'Site administration' }).getByRole('link', { name: 'Accounts' }).click();
    const table = s.page.getByRole('table', { name: 'Accounts' });
    for (const a of DEMO_ACCOUNTS) expect(await shown(table.getByRole('row').filter({ hasText: a.email }))).toBe(true);
    const row = table.getByRole('row').filter({ hasText: grower.email });
    expect(await row.getByText('active').count()).toBe(1);

    await row.getByRole('button', { name: `Disable ${grower.name}` }).click();
    await s.page.getByRole('button', { name: `Disable ${grower.name} and end their sessions` }).click();
    expect(await shown(row.getByText('disabled'))).toBe(true);
    const stored = await models(h.running.sequelize).User.findOne({ where: { email: grower.email } });
    expect(stored?.get({ plain: true }).disabledAt).toBeTruthy();
    await s.screenshot('51-admin-accounts');
    await row.getByRole('button', { name: `Enable ${grower.name}` }).click();
    expect(await shown(row.getByText('active'))).toBe(true);

    await row.getByRole('button', { name: `Rename ${grower.name}` }).click();
    await s.page.getByLabel(`New name for ${grower.email}`).fill('   ');
    await s.page.getByRole('button', { name: 'Save name' }).click();
    expect(await shown(row.getByRole('alert').getByText('name: must not be empty'))).toBe(true);
    await s.screenshot('52-admin-rename-refused');
    expect(s.errors.filter((e) => !e.startsWith('400 PATCH /api/admin/users/')), s.errors.join('\n')).toEqual([]);
    await s.close();
  });

  it('shows a person who is not a site admin no admin link, and a refusal at the address; the API refuses them too', async () => {
    const s = await h.session();
    await signIn(s, grower.email, grower.password);
    expect(await s.page.getByRole('link', { name: 'Site admin' }).count()).toBe(0);
    for (const section of ['mail', 'accounts']) {
      await s.page.goto(`/admin/${section}`);
      expect(await shown(s.page.getByRole('heading', { name: 'Only site admins can see this page' }))).toBe(true);
    }
    expect(await s.page.getByRole('table').count()).toBe(0);
    await s.screenshot('53-admin-refused');
    expect((await s.page.request.get('/api/admin/mail')).status()).toBe(403);
    expect((await s.page.request.get('/api/admin/users')).status()).toBe(403);
    expect(s.errors, s.errors.join('\n')).toEqual([]);
    await s.close();
  });
});
