import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import type { Response } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/db/demo-accounts';
import { models } from '../../server/db/models';
import { listCaughtMail } from '../../server/repos/mail';
import { saveAnalysis } from '../../server/repos/scenario-analysis';
import type { AnalysisSettings } from '../../src/contracts/api/analysis';
import { pdfText } from '../support/pdf-text';
import { SCREENSHOT_DIR, shown, startHarness } from './harness';
import type { Harness, Session } from './harness';

// One story against the real server: a consultant (the demo editor) shares a comparison with a
// client who has no account, then withdraws it.
let h: Harness;
let consultant: Session;
let client: Session;
let link = '';
const editor = DEMO_ACCOUNTS.find((a) => a.role === 'editor')!;

/** The golden seeded run of the demo's Room A (scenarios/golden): the page must rerun it to the same numbers. */
const golden = JSON.parse(readFileSync('scenarios/golden/room-a-relamp-or-replace.uncertainty.json', 'utf8')) as {
  settings: { seed: number; draws: number; inputs: Array<{ path: string; low: number; likely: number; high: number }> };
  summary: { options: Array<{ id: string; chanceCheapest: number; p10: number; p50: number; p90: number }> };
};

beforeAll(async () => {
  h = await startHarness();
  consultant = await h.session();
  client = await h.session();
  // The consultant kept the golden uncertainty settings with Room A before publishing.
  const [[room], [user]] = await Promise.all([
    h.running.sequelize.query("SELECT id FROM scenarios WHERE title LIKE '%Room A%'").then(([r]) => r as Array<{ id: string }>),
    h.running.sequelize.query('SELECT id FROM users WHERE email = ?', { replacements: [editor.email] }).then(([r]) => r as Array<{ id: string }>),
  ]);
  const text = (v: number) => String(v);
  const kept: AnalysisSettings = {
    version: 1,
    sweep: { vary: 'led-bar-650', tariffLo: '0', tariffHi: '0.7', tariffN: '100', factorLo: '0.5', factorHi: '2', factorN: '100', showValueOf: 'led-bar-650' },
    swings: { pct: '20', measure: 'option', a: 'owned-hps-600', b: 'led-bar-650' },
    breakeven: { a: 'owned-hps-600', b: 'led-bar-650' },
    uncertainty: {
      seed: text(golden.settings.seed),
      draws: text(golden.settings.draws),
      inputs: golden.settings.inputs.map((r) => ({ path: r.path, low: text(r.low), likely: text(r.likely), high: text(r.high) })),
    },
  };
  await saveAnalysis(models(h.running.sequelize), room!.id, kept, user!.id);
});
afterAll(async () => {
  await h?.close();
});

describe('sharing a snapshot in a browser', () => {
  it('lets the consultant publish a snapshot of a saved scenario from the editor', async () => {
    const p = consultant.page;
    await p.goto('/sign-in');
    await p.getByLabel('E-mail address').fill(editor.email);
    await p.getByLabel('Password').fill(editor.password);
    await p.getByRole('button', { name: 'Sign in', exact: true }).click();
    expect(await shown(p.getByText('Signed in as'))).toBe(true);
    await p.getByRole('link', { name: /Open your scenarios/ }).click();
    await p.getByRole('link', { name: /Room A/ }).first().click();
    await p.getByRole('button', { name: 'Share a read-only snapshot…' }).click();
    await p.getByLabel('Notes for readers').fill('Options for the board meeting; prices are this spring’s quotes.');
    await p.getByRole('button', { name: /Publish snapshot of revision/ }).click();
    const row = p.locator('li[data-snapshot]').first();
    await row.waitFor();
    link = (await row.getByRole('link').first().getAttribute('href')) ?? '';
    await row.getByRole('button', { name: 'Send by e-mail' }).click();
    await row.getByLabel('Send to').fill('treasurer@hollowbrook.example');
    await row.getByLabel('Note').fill('The comparison we discussed.');
    await row.getByRole('button', { name: 'Send the link' }).click();
    expect(await shown(row.getByText('Sent to treasurer@hollowbrook.example.'))).toBe(true);
    const mail = (await listCaughtMail(models(h.running.sequelize))).find((m) => m.to.includes('treasurer@hollowbrook.example'));
    expect(mail?.text).toContain(link);
    expect(mail?.text).toContain('The comparison we discussed.');
    expect(link).toMatch(/\/s\/[A-Za-z0-9_-]{21}$/);
    await consultant.screenshot('40-share-panel');
    await p.locator('section', { has: p.getByRole('heading', { name: 'Share a read-only snapshot' }) }).screenshot({ path: `${SCREENSHOT_DIR}/40b-share-panel-close-up.png` });
  }, 90_000);

  it('shows the client, without an account, the read-only page that says the figures reproduce, under 200 KB of gzipped JavaScript', async () => {
    const p = client.page;
    const scripts: Array<{ path: string; gz: number }> = [];
    const onResponse = async (r: Response) => {
      const path = new URL(r.url()).pathname;
      if (!path.endsWith('.js')) return;
      const body = await r.body().catch(() => Buffer.alloc(0));
      scripts.push({ path, gz: gzipSync(body, { level: 9 }).length });
    };
    p.on('response', onResponse);
    const reply = await p.goto(link);
    expect(reply?.status()).toBe(200);
    expect(await shown(p.getByText('These figures reproduce'))).toBe(true);
    await p.waitForLoadState('networkidle');
    p.off('response', onResponse);
    const total = scripts.reduce((sum, s) => sum + s.gz, 0);
    console.info(`public page first load: ${scripts.length} scripts, ${(total / 1024).toFixed(1)} KB gzipped`);
    expect(total).toBeLessThan(200 * 1024);
    expect(scripts.some((s) => /build-report|jspdf|CartesianChart/.test(s.path))).toBe(false);
    expect(await shown(p.getByRole('table', { name: /leveled options/i }))).toBe(true);
    expect(await shown(p.getByText('Options for the board meeting'))).toBe(true);
    expect(await shown(p.getByRole('complementary', { name: 'Safety notes' }))).toBe(true);
    expect(await p.getByText('Signed in as').count()).toBe(0);
    await client.screenshot('41-shared-snapshot');
  }, 90_000);

  it('shows the uncertainty settings kept with the snapshot, and rerunning them in the browser gives the golden numbers exactly', async () => {
    const p = client.page;
    const section = p.getByTestId('snapshot-uncertainty');
    expect(await shown(section)).toBe(true);
    expect(await section.innerText()).toContain(String(golden.settings.seed));
    await section.getByRole('button', { name: 'Run these draws here' }).click();
    const rows = section.locator('tr[data-exact]');
    await rows.first().waitFor({ timeout: 60_000 });
    const got = await rows.evaluateAll((trs) => trs.map((tr) => ({ id: tr.getAttribute('data-option'), ...JSON.parse(tr.getAttribute('data-exact') ?? '{}') })));
    expect(got).toEqual(golden.summary.options.map((o) => ({ id: o.id, chanceCheapest: o.chanceCheapest, p10: o.p10, p50: o.p50, p90: o.p90 })));
    await section.screenshot({ path: `${SCREENSHOT_DIR}/41b-shared-snapshot-uncertainty.png` });
  }, 90_000);

  it('builds the PDF report in the browser when asked, and its text holds the title', async () => {
    const p = client.page;
    const title = (await p.getByRole('heading', { level: 1 }).innerText()).trim();
    const [download] = await Promise.all([p.waitForEvent('download', { timeout: 60_000 }), p.getByRole('button', { name: 'PDF report' }).click()]);
    const path = await download.path();
    const bytes = new Uint8Array(readFileSync(path));
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
    const text = (await pdfText(bytes)).replace(/\s+/g, ' ');
    expect(text).toContain(title);
    expect(text).toContain(link.replace(/^https?:\/\/[^/]+/, ''));
    await p.getByRole('button', { name: 'Draw the charts' }).click();
    await p.locator('.recharts-surface').first().waitFor();
    await client.screenshot('42-shared-snapshot-charts');
    expect(client.errors, client.errors.join('\n')).toEqual([]);
  }, 90_000);

  it('gives the client the 410 page once the consultant withdraws the link', async () => {
    const p = consultant.page;
    p.once('dialog', (d) => void d.accept());
    await p.locator('li[data-snapshot]').first().getByRole('button', { name: 'Withdraw link' }).click();
    expect(await shown(p.locator('li[data-snapshot]').first().getByText('withdrawn', { exact: true }))).toBe(true);
    await p.locator('section', { has: p.getByRole('heading', { name: 'Share a read-only snapshot' }) }).screenshot({ path: `${SCREENSHOT_DIR}/43-share-panel-withdrawn.png` });
    const reply = await client.page.goto(link);
    expect(reply?.status()).toBe(410);
    expect(await shown(client.page.getByRole('heading', { name: 'This shared snapshot is no longer available' }))).toBe(true);
    await client.screenshot('44-withdrawn-link');
  });
});
