import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Scenario } from '../../src/contracts/scenario';
import { breakevenPrice, parseScenario, runSweep, runUncertainty } from '../../src/engine';
import { defaultAnalysisSettings } from '../../src/features/sensitivity/lib/analysis-settings';
import { sweepFromDraft, uncertaintyFromDraft } from '../../src/features/sensitivity/lib/draft-settings';
import { shortName } from '../../src/features/sensitivity/lib/labels';
import { spreadIndices } from '../../src/features/sensitivity/components/sweep/sweep-csv';
import { formatMoney, formatNumber } from '../../src/lib/format';
import { DEMO_ACCOUNTS } from '../../server/db/demo-accounts';
import { SCREENSHOT_DIR, shown, startHarness } from './harness';
import type { Harness, Session } from './harness';

// The invented demo (server/db/demo-steps.ts) puts the shipped Room A scenario into the demo workspace.
let h: Harness;
let url = '';
let scenario: Scenario;
const owner = DEMO_ACCOUNTS.find((a) => a.role === 'owner')!;

async function signIn(s: Session) {
  await s.page.goto('/sign-in');
  await s.page.getByLabel('E-mail address').fill(owner.email);
  await s.page.getByLabel('Password').fill(owner.password);
  await s.page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await s.page.getByText('Signed in as').first().waitFor();
}

async function openPage(s: Session) {
  await s.page.goto(url);
  await s.page.getByRole('heading', { name: /Where the answer changes/ }).waitFor();
}

beforeAll(async () => {
  h = await startHarness();
  const s = await h.session();
  await signIn(s);
  const found = await s.page.evaluate(async () => {
    const me = (await (await fetch('/api/me')).json()) as { memberships: Array<{ workspaceId: string }> };
    const wid = me.memberships[0]!.workspaceId;
    const list = (await (await fetch(`/api/workspaces/${wid}/scenarios`)).json()) as { items: Array<{ id: string; title: string }> };
    return { wid, sid: list.items.find((i) => i.title.includes('Room A'))!.id };
  });
  url = `/w/${found.wid}/scenarios/${found.sid}/sensitivity`;
  await s.close();
  const checked = parseScenario(JSON.parse(readFileSync('scenarios/room-a-relamp-or-replace.scenario.json', 'utf8')));
  if (!checked.ok) throw new Error('the demo scenario does not parse');
  scenario = checked.value;
});
afterAll(async () => {
  await h?.close();
});

describe('the sensitivity page', () => {
  it('runs a sweep in a worker and shows the engine’s winners on the grid and in its table', async () => {
    const s = await h.session();
    await signIn(s);
    await s.page.goto(url.replace('/sensitivity', ''));
    await s.page.getByRole('link', { name: 'Sensitivity and uncertainty of the saved version' }).click();
    await s.page.getByRole('heading', { name: /Where the answer changes/ }).waitFor();
    await s.screenshot('30-sensitivity-start');

    const p = s.page;
    await p.getByLabel('Price steps').fill('200');
    await p.getByLabel('Multiplier steps').fill('200');
    await p.getByRole('button', { name: 'Run the sweep' }).click();
    await p.getByTestId('sweep-result').waitFor();
    expect(await p.getByText(/Done in \d+ ms, in a background worker/).first().isVisible()).toBe(true);
    expect(await shown(p.getByTestId('sweep-current'))).toBe(true);

    const box = (await p.getByTestId('sweep-current').locator('circle').first().boundingBox())!;
    await p.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    const readout = await p.getByTestId('sweep-readout').innerText();
    expect(readout).toMatch(/At 0\.2\d{3} EUR per kWh and ×1\.0\d\d on .*, the cheapest is .*\. Present value of .*: €[\d,]+\.\d\d\./);
    await p.mouse.move(0, 0);
    expect(await shown(p.getByTestId('sweep-readout').getByText(/Point at the grid/))).toBe(true);
    await p.getByRole('group', { name: /Grid of the cheapest option/ }).focus();
    await p.keyboard.press('ArrowUp');
    expect(await shown(p.getByTestId('sweep-readout').getByText(/the cheapest is/))).toBe(true);
    await s.screenshot('31-sweep-cell-read-with-keys');
    await p.getByTestId('sweep-result').screenshot({ path: join(SCREENSHOT_DIR, '31a-sweep-cell-close-up.png') });

    // Every sampled cell of the table names the winner the engine finds for the same settings.
    const d = defaultAnalysisSettings(scenario, 1).sweep;
    const expected = runSweep(scenario, sweepFromDraft({ ...d, tariffN: '200', factorN: '200' }) as Parameters<typeof runSweep>[1]);
    await p.getByText('The grid as a table').click();
    const table = p.getByRole('table', { name: 'Cheapest option by price and efficacy multiplier' });
    const rows = spreadIndices(200, 9);
    const cols = spreadIndices(200, 5);
    for (const [ri, t] of rows.entries()) {
      const cells = table.locator('tbody tr').nth(ri).locator('td');
      for (const [ci, e] of cols.entries()) {
        expect(await cells.nth(ci).locator('span').first().innerText()).toBe(shortName(scenario, expected.winner[t]![e]!));
      }
    }
    await s.screenshot('32-sweep-table');
    await p.getByTestId('sweep-result').screenshot({ path: join(SCREENSHOT_DIR, '32a-sweep-close-up.png') });
    expect(s.errors, s.errors.join('\n')).toEqual([]);
    await s.close();
  });

  it('ranks swings, states the break-even price the engine finds, and shows field errors in words', async () => {
    const s = await h.session();
    await signIn(s);
    await openPage(s);
    const p = s.page;
    await p.getByRole('button', { name: 'Run the swings' }).click();
    await p.getByTestId('swings-result').waitFor();
    await p.getByTestId('swings-chart').locator('.recharts-surface').last().waitFor();
    expect(await p.getByRole('table', { name: 'Swings, largest first' }).locator('tbody tr').count()).toBeGreaterThan(20);

    await p.getByRole('button', { name: 'Find the break-even' }).click();
    await p.getByTestId('breakeven-result').waitFor();
    const d = defaultAnalysisSettings(scenario, 1).breakeven;
    const be = breakevenPrice(scenario, d);
    expect(be.pricePerKwh).not.toBeNull();
    expect(await p.getByTestId('breakeven-price').innerText()).toContain(`${formatNumber(be.pricePerKwh!, 6, 'en-GB')} EUR per kWh`);
    await s.screenshot('33-swings-and-breakeven');
    await p.getByTestId('swings-result').screenshot({ path: join(SCREENSHOT_DIR, '33a-swings-close-up.png') });
    await p.getByTestId('breakeven-result').screenshot({ path: join(SCREENSHOT_DIR, '33b-breakeven-close-up.png') });

    await p.getByLabel('Highest price').fill('abc');
    expect(await shown(p.getByText('Highest price must be a number.'))).toBe(true);
    expect(await p.getByRole('button', { name: 'Run the sweep' }).isDisabled()).toBe(true);
    await p.getByLabel('Highest price').fill('0.6');
    expect(s.errors, s.errors.join('\n')).toEqual([]);
    await s.close();
  });

  it('runs 10,000 seeded draws, gives the engine’s figures, keeps the seed over a reload and repeats them', async () => {
    const s = await h.session();
    await signIn(s);
    await openPage(s);
    const p = s.page;
    // Settings are kept with the scenario, so earlier stories' edits are still there: start from the suggested ones.
    await p.getByRole('button', { name: 'Start again from the suggested settings' }).click();
    const seed = Number(await p.getByLabel('Seed').inputValue());
    expect(Number.isInteger(seed)).toBe(true);
    await p.getByRole('button', { name: 'Run the draws' }).click();
    await p.getByTestId('uncertainty-result').waitFor();
    await p.getByTestId('uncertainty-chance-chart').locator('.recharts-surface').last().waitFor();
    const table = p.getByRole('table', { name: 'Uncertainty results by option' });
    const first = await table.innerText();

    const expected = runUncertainty(scenario, uncertaintyFromDraft(defaultAnalysisSettings(scenario, seed).uncertainty) as Parameters<typeof runUncertainty>[1]);
    for (const o of expected.options) {
      const row = table.locator(`tr[data-option="${o.id}"] td`);
      expect(await row.nth(0).innerText()).toBe(`${formatNumber(100 * o.chanceCheapest, 1, 'en-GB')} %`);
      expect(await row.nth(2).innerText()).toBe(formatMoney(String(o.p50), 'EUR', 'en-GB'));
    }
    await s.screenshot('34-uncertainty');
    await p.getByTestId('uncertainty-result').screenshot({ path: join(SCREENSHOT_DIR, '34a-uncertainty-close-up.png') });

    // A reload before the server has the new seed would rightly show the old one: wait for the page to say it is kept.
    await p.getByRole('status').filter({ hasText: 'Settings kept with the scenario.' }).waitFor();
    // The server holds the seed the page shows (read through the API, as another member's browser would).
    const keptSeed = await p.evaluate(async (page) => {
      const [, wid, sid] = /\/w\/([^/]+)\/scenarios\/([^/]+)/.exec(page)!;
      const reply = (await (await fetch(`/api/workspaces/${wid}/scenarios/${sid}/analysis`)).json()) as { settings?: { uncertainty?: { seed?: string } } };
      return Number(reply.settings?.uncertainty?.seed);
    }, url);
    expect(keptSeed, s.errors.join('\n')).toBe(seed);
    await p.reload();
    await p.getByRole('heading', { name: /Where the answer changes/ }).waitFor();
    expect(Number(await p.getByLabel('Seed').inputValue()), s.errors.join('\n')).toBe(seed);
    await p.getByRole('button', { name: 'Run the draws' }).click();
    await p.getByTestId('uncertainty-result').waitFor();
    expect(await table.innerText()).toBe(first);
    expect(s.errors, s.errors.join('\n')).toEqual([]);
    await s.close();
  });

  it('cancels a long run from its progress bar, in the worker and on the page where workers are missing', async () => {
    for (const where of ['worker', 'page'] as const) {
      const s = await h.session();
      if (where === 'page') await s.context.addInitScript(() => Reflect.deleteProperty(globalThis, 'Worker'));
      await signIn(s);
      await openPage(s);
      const p = s.page;
      await p.getByLabel('Draws').fill('1000000');
      await p.getByRole('button', { name: 'Run the draws' }).click();
      const bar = p.getByRole('progressbar', { name: 'Run the draws: progress' });
      await bar.waitFor();
      await p.waitForFunction(() => Number(document.querySelector('[aria-label="Run the draws: progress"]')?.getAttribute('aria-valuenow') ?? 0) >= 2);
      // The page stays responsive while the draws run: typing lands at once.
      await p.getByLabel('Move each input by').fill('15');
      expect(await p.getByLabel('Move each input by').inputValue()).toBe('15');
      await s.screenshot(`35-uncertainty-running-${where}`);
      await p.getByRole('button', { name: 'Cancel' }).click();
      expect(await shown(p.getByText(/Cancelled after [\d,]+ of 1,000,000 draws/))).toBe(true);
      expect(await bar.count()).toBe(0);
      const status = await p.getByText(/Cancelled after/).innerText();
      expect(status).toContain(where === 'worker' ? 'in a background worker' : 'on this page, in small steps');
      await s.screenshot(`36-uncertainty-cancelled-${where}`);
      if (where === 'page') {
        await p.getByLabel('Draws').fill('2000');
        await p.getByRole('button', { name: 'Run the draws' }).click();
        expect(await shown(p.getByText(/Done in \d+ ms, on this page, in small steps/))).toBe(true);
      }
      expect(s.errors, s.errors.join('\n')).toEqual([]);
      await s.close();
    }
  });
});
