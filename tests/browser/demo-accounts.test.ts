import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/db/demo-accounts';
import { models } from '../../server/db/models';
import { listCaughtMail } from '../../server/repos/mail';
import { shown, signIn, startHarness } from './harness';
import type { Harness } from './harness';

// The invented demo co-operative, seen through its invented people (server/db/demo-accounts.ts).
let h: Harness;
const grower = DEMO_ACCOUNTS.find((a) => a.role === 'owner')!;
const consultant = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!;

beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

describe('the demo co-operative in a browser', { timeout: 120_000 }, () => {
  it('signs the demo grower in and finds the scenarios by searching their titles', async () => {
    const s = await h.session();
    await signIn(s, grower.email, grower.password);
    await s.page.getByRole('link', { name: /Open your scenarios/ }).click();
    const rows = s.page.getByRole('table', { name: /Scenarios/ }).locator('tbody tr');
    await rows.first().waitFor();
    const all = await rows.count();
    expect(all).toBeGreaterThan(0);
    await s.screenshot('50-demo-scenarios');

    await s.page.getByLabel('Search by title').fill('Room B');
    await s.page.waitForURL(/q=Room\+B|q=Room%20B/);
    // The previous page stays on screen until the filtered one arrives; wait for that one.
    await s.page
      .waitForFunction(() => {
        const cells = [...document.querySelectorAll('table tbody tr td:first-child')];
        return cells.length > 0 && cells.every((c) => c.textContent?.includes('Room B'));
      }, undefined, { timeout: 10_000 })
      .catch(() => undefined);
    const titles = await s.page.getByRole('table', { name: /Scenarios/ }).locator('tbody tr td:first-child').allInnerTexts();
    expect(titles.length).toBeGreaterThan(0);
    expect(titles.every((t) => t.includes('Room B'))).toBe(true);

    await s.page.getByLabel('Search by title').fill('no such room anywhere');
    expect(await shown(s.page.getByText('No scenario title contains “no such room anywhere”'))).toBe(true);
    await s.close();
  });

  it('shows lengths in feet and lamp heat in BTU/h after the owner switches the workspace to imperial units', async () => {
    const s = await h.session();
    await signIn(s, grower.email, grower.password);
    await s.page.getByRole('link', { name: /Open your scenarios/ }).click();
    await s.page.getByRole('link', { name: 'Members and settings' }).click();
    await s.page.getByLabel('Units shown').selectOption('imperial');
    await s.page.getByRole('button', { name: 'Save settings' }).click();
    expect(await shown(s.page.getByText('Settings saved.'))).toBe(true);
    await s.screenshot('51-demo-settings');

    await s.page.getByRole('link', { name: 'Scenarios' }).click();
    await s.page.getByRole('table', { name: /Scenarios/ }).locator('tbody tr a').first().click();
    await s.page.getByRole('table', { name: /leveled options/i }).waitFor();
    expect(await s.page.getByRole('radio', { name: 'feet' }).isChecked()).toBe(true);
    expect(await shown(s.page.getByRole('table', { name: 'Branch circuits per option' }).getByText('BTU/h'))).toBe(true);
    expect(await shown(s.page.getByText(/ft²/))).toBe(true);
    await s.screenshot('52-demo-editor-imperial');
    await s.close();
  });

  it('signs the demo consultant in with a link sent by e-mail', async () => {
    const s = await h.session();
    await s.page.goto('/sign-in');
    await s.page.getByLabel('E-mail address').fill(consultant.email);
    await s.page.getByRole('button', { name: 'E-mail me a sign-in link instead' }).click();
    expect(await shown(s.page.getByText(`A sign-in link is on its way to ${consultant.email}`))).toBe(true);
    await s.screenshot('53-sign-in-link-sent');
    const mail = (await listCaughtMail(models(h.running.sequelize))).find((m) => m.to.includes(consultant.email));
    const url = /https?:\/\/\S+\/auth\/callback\/nodemailer\S+/.exec(mail?.text ?? '')?.[0];
    expect(url).toBeDefined();
    const path = new URL(url!).pathname + new URL(url!).search;
    await s.page.goto(path);
    expect(await shown(s.page.getByText(`Signed in as ${consultant.name}`))).toBe(true);
    await s.close();
  });
});
