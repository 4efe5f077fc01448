import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listCaughtMail } from '../../server/repos/mail';
import { models } from '../../server/db/models';
import { shown, startHarness } from './harness';
import type { Harness, Session } from './harness';

// One story, step by step, against the real server: the steps share a browser session and data.
let h: Harness;
let owner: Session;
let scenarioUrl = '';
const ownerEmail = 'owner@grower.invalid';
const viewerEmail = 'viewer@grower.invalid';
const password = 'correct-horse-battery';

beforeAll(async () => {
  h = await startHarness();
  owner = await h.session();
});
afterAll(async () => {
  await h?.close();
});

async function signUp(s: Session, name: string, email: string, next?: string, shot?: string) {
  await s.page.goto(next ? `/sign-up?next=${encodeURIComponent(next)}` : '/sign-up');
  await s.page.getByLabel('Your name').fill(name);
  await s.page.getByLabel('E-mail address').fill(email);
  await s.page.getByLabel('Password').fill(password);
  if (shot) await s.screenshot(shot);
  await s.page.getByRole('button', { name: 'Create the account' }).click();
}

/**
 * The option row of the results table that carries the "lowest present value" mark, once the row
 * expected settles there (results follow the inputs after a short debounce), or whichever row has it.
 */
async function cheapestRow(s: Session, expected: string): Promise<string | null> {
  await shown(s.page.locator(`tr[data-option="${expected}"]`, { hasText: 'lowest present value' }), 5000);
  const row = s.page.locator('tr[data-option]', { hasText: 'lowest present value' });
  await row.first().waitFor();
  return row.first().getAttribute('data-option');
}

describe('the workbench in a browser', { timeout: 120_000 }, () => {
  it('signs up, signs out and signs in again through the pages', async () => {
    await signUp(owner, 'Olive Owner', ownerEmail);
    expect(await shown(owner.page.getByText('You are not in any workspace yet'))).toBe(true);
    await owner.screenshot('10-workspaces-empty');
    await owner.page.getByRole('button', { name: 'Sign out' }).click();
    expect(await shown(owner.page.getByRole('link', { name: 'Sign in' }).first())).toBe(true);

    await owner.page.goto('/sign-in');
    await owner.page.getByLabel('E-mail address').fill(ownerEmail);
    await owner.page.getByLabel('Password').fill('wrong password here');
    await owner.page.getByRole('button', { name: 'Sign in', exact: true }).click();
    expect(await shown(owner.page.getByText('do not match an account'))).toBe(true);
    expect(await owner.page.getByLabel('E-mail address').inputValue()).toBe(ownerEmail);
    await owner.screenshot('11-sign-in-refused');
    await owner.page.getByLabel('Password').fill(password);
    await owner.page.getByRole('button', { name: 'Sign in', exact: true }).click();
    expect(await shown(owner.page.getByText('Signed in as'))).toBe(true);
  });

  it('builds a scenario from an empty workspace with fixtures from the library', async () => {
    const p = owner.page;
    await p.goto('/workspaces');
    await p.getByLabel('Name').fill('Test greenhouse');
    await p.getByRole('button', { name: 'Create the workspace' }).click();
    expect(await shown(p.getByText('No scenarios yet'))).toBe(true);
    await owner.screenshot('12-scenarios-empty');

    await p.getByRole('link', { name: 'Fixture library' }).click();
    expect(await shown(p.getByText('The library is empty'))).toBe(true);
    await owner.screenshot('13-library-empty');

    const header = 'key,label,technology,wallWatts,photonEfficacy,fixturePrice,dataSource';
    await p.getByLabel('Or paste the CSV text').fill(`${header}\ntest-led,Test LED bar,led,600,2.8,1200,datasheet\ntest-hps,Test sodium,hps,-640,1.1,150,estimate\n`);
    await p.getByRole('button', { name: 'Import', exact: true }).click();
    const badLine = p.getByRole('list', { name: 'The CSV lines with their problems' }).locator('li', { hasText: 'line 3, wallWatts' });
    expect(await shown(badLine)).toBe(true);
    expect(await badLine.locator('span').first().innerText()).toBe('3');
    await owner.screenshot('14-library-import-errors');

    await p.getByLabel('Or paste the CSV text').fill(`${header}\ntest-led,Test LED bar,led,600,2.8,1200,datasheet\ntest-hps,Test sodium,hps,640,1.1,150,estimate\n`);
    await p.getByRole('button', { name: 'Import', exact: true }).click();
    expect(await shown(p.getByText('Imported: 2 added, 0 updated.'))).toBe(true);
    expect(await shown(p.locator('tr[data-fixture="test-hps"]').getByText('estimate'))).toBe(true);
    await p.getByRole('button', { name: 'Edit Wall power of Test sodium' }).click();
    await p.getByLabel('Wall power of Test sodium').fill('645');
    await p.getByLabel('Wall power of Test sodium').press('Enter');
    expect(await shown(p.locator('tr[data-fixture="test-hps"]').getByText('645'))).toBe(true);
    await owner.screenshot('15-library');
    const [download] = await Promise.all([p.waitForEvent('download'), p.getByRole('button', { name: 'Export as CSV' }).click()]);
    const exported = await download.path().then((file) => import('node:fs').then((fs) => fs.readFileSync(file, 'utf8')));
    expect(exported.split(/\r?\n/)[0]).toContain('key,label,technology,wallWatts');
    expect(exported).toContain('test-hps');

    await p.getByRole('link', { name: 'Scenarios' }).click();
    await p.getByRole('button', { name: 'Start a new scenario' }).click();
    await p.getByLabel('Add from the fixture library').selectOption({ label: 'Test LED bar (datasheet)' });
    await p.getByRole('button', { name: 'Add this fixture' }).click();
    await p.getByLabel('Add from the fixture library').selectOption({ label: 'Test sodium (estimate)' });
    await p.getByRole('button', { name: 'Add this fixture' }).click();
    await p.getByRole('article', { name: /^Option 1:/ }).getByRole('button', { name: 'Remove option' }).click();
    await p.getByLabel('Title', { exact: true }).fill('Test room, LED or sodium');
    await owner.screenshot('16-editor-built');
    expect(await cheapestRow(owner, 'test-led')).toBe('test-led');
    await p.getByRole('button', { name: 'Save as revision 2' }).click();
    expect(await shown(p.getByText('Revision 2'))).toBe(true);
    scenarioUrl = new URL(p.url()).pathname;
    await owner.screenshot('16-editor');

    // DLI = PPFD × hours × 3600 / 10⁶: 600 µmol m⁻² s⁻¹ over 12 h is 25.92 mol m⁻² d⁻¹ (the relation in
    // Faust & Logan, "Daily Light Integral: A Research Review and High-resolution Maps of the United States", HortScience 53(9), 2018;
    // citation recalled from memory).
    await p.getByRole('radio', { name: 'DLI over the photoperiod' }).check();
    expect(await p.getByLabel('Target DLI').inputValue()).toBe('25.92');
    expect(await shown(p.locator('tr[data-option="test-led"] td', { hasText: /^600$/ }))).toBe(true);
    await p.getByRole('radio', { name: 'PPFD' }).check();
    expect(await p.getByLabel('Target PPFD').inputValue()).toBe('600');
  });

  it('moves the cheapest option when the electricity price changes, and undo and redo bring it back', async () => {
    const p = owner.page;
    const price = p.getByLabel('Price', { exact: true });
    expect(await price.inputValue()).toBe('0.2');
    expect(await cheapestRow(owner, 'test-led')).toBe('test-led');
    await price.fill('0.02');
    expect(await cheapestRow(owner, 'test-hps')).toBe('test-hps');
    await owner.screenshot('17-editor-cheap-power');

    await p.getByRole('button', { name: 'Undo' }).click();
    expect(await price.inputValue()).toBe('0.2');
    expect(await cheapestRow(owner, 'test-led')).toBe('test-led');

    await p.getByRole('button', { name: 'Redo' }).click();
    expect(await price.inputValue()).toBe('0.02');
    expect(await cheapestRow(owner, 'test-hps')).toBe('test-hps');

    await price.fill('');
    expect(await shown(p.getByText('Price is required.'))).toBe(true);
    await p.keyboard.press('Control+z');
    expect(await price.inputValue()).toBe('0.02');
    await p.getByRole('button', { name: 'Save as revision 3' }).click();
    expect(await shown(p.getByText('Revision 3'))).toBe(true);
    // The only refusals so far are the ones this story provoked: a wrong password and a bad CSV line.
    expect(owner.errors.filter((e) => !/^(401 POST \/auth\/|400 POST \/api\/workspaces\/[^/]+\/fixtures\/import)/.test(e))).toEqual([]);
  });

  it('keeps every keystroke while results recompute, and logs the slowest time to paint', async () => {
    const p = owner.page;
    await p.evaluate(() => {
      const w = window as unknown as { slowest: number; longTasks: number };
      w.slowest = 0;
      w.longTasks = 0;
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) w.slowest = Math.max(w.slowest, e.duration);
      }).observe({ type: 'event', durationThreshold: 16, buffered: false } as PerformanceObserverInit);
      new PerformanceObserver((list) => {
        w.longTasks += list.getEntries().length;
      }).observe({ type: 'longtask' });
    });
    const length = p.getByLabel('Canopy length');
    await length.click();
    await length.press('End');
    await length.pressSequentially('.123456789', { delay: 30 });
    await p.waitForTimeout(500);
    const { slowest, longTasks } = await p.evaluate(() => {
      const w = window as unknown as { slowest: number; longTasks: number };
      return { slowest: w.slowest, longTasks: w.longTasks };
    });
    console.info(`typing: slowest keystroke ${slowest.toFixed(0)} ms to next paint, ${longTasks} main-thread tasks over 50 ms`);
    // Speed is measured, not asserted, here (targets belong to `npm run bench`); what must hold is that
    // every keystroke landed while results recomputed.
    expect(Number.isFinite(slowest)).toBe(true);
    expect(await length.inputValue()).toMatch(/\.123456789$/);
    await length.fill('4');
    await p.getByRole('button', { name: 'Undo' }).waitFor();
  });

  it('shows the revision history', async () => {
    await owner.page.goto(`${scenarioUrl}/history`);
    expect(await shown(owner.page.getByText('Revision 3', { exact: true }))).toBe(true);
    expect(await shown(owner.page.getByText('electricity.pricePerKwh'))).toBe(true);
    // Revision 3 changed only the price: 0.2 before, 0.02 after (the previous story typed it).
    await owner.page.getByRole('button', { name: 'Show' }).nth(0).click();
    const changes = owner.page.getByRole('table', { name: 'Changes from revision 2' });
    const price = changes.locator('tr[data-path="electricity.pricePerKwh"] td');
    expect(await shown(price.nth(1))).toBe(true);
    expect([await price.nth(0).innerText(), await price.nth(1).innerText()]).toEqual(['0.2', '0.02']);
    expect(await shown(owner.page.getByRole('region', { name: 'Inputs of revision 3' }).getByText('Test room, LED or sodium'))).toBe(true);
    await owner.screenshot('18-history');
    await owner.page.getByRole('button', { name: 'Show' }).nth(1).click();
    await owner.page.getByText('The scenario file of this revision (JSON)').click();
    expect(await shown(owner.page.getByText('"title": "Test room, LED or sodium"'))).toBe(true);
  });

  it('keeps typed input when someone else saved first, and saves both editors’ changes merged, with a choice where they clash', async () => {
    const other = await h.session();
    await other.page.goto('/sign-in');
    await other.page.getByLabel('E-mail address').fill(ownerEmail);
    await other.page.getByLabel('Password').fill(password);
    await other.page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await other.page.getByText('Signed in as').waitFor();
    await other.page.goto(scenarioUrl);
    await other.page.getByLabel('Price', { exact: true }).fill('0.31');

    await owner.page.goto(scenarioUrl);
    await owner.page.getByLabel('Demand charge').fill('2.5');
    await owner.page.getByRole('button', { name: 'Save as revision 4' }).click();
    expect(await shown(owner.page.getByText('Revision 4', { exact: true }))).toBe(true);

    // Different fields: both changes fit together, and the owner's demand charge survives the second save.
    await other.page.getByRole('button', { name: 'Save as revision 4' }).click();
    expect(await shown(other.page.getByText('Someone else saved this scenario while you were editing'))).toBe(true);
    expect(await other.page.getByLabel('Price', { exact: true }).inputValue()).toBe('0.31');
    const theirs = other.page.getByRole('table', { name: 'What they changed (revision 4)' });
    expect(await shown(theirs.locator('tr[data-path="electricity.demandChargePerKwMonth"]', { hasText: '2.5' }))).toBe(true);
    const mine = other.page.getByRole('table', { name: 'What you changed' });
    expect(await mine.locator('tr[data-path="electricity.pricePerKwh"] td').allInnerTexts()).toEqual(['0.02', '0.31']);
    expect(await other.page.getByRole('table', { name: 'Fields you both changed' }).count()).toBe(0);
    await other.screenshot('22-editor-conflict');
    await other.page.getByRole('button', { name: 'Save the merged version' }).click();
    expect(await shown(other.page.getByText('Revision 5', { exact: true }))).toBe(true);
    expect(await other.page.getByLabel('Price', { exact: true }).inputValue()).toBe('0.31');
    expect(await other.page.getByRole('textbox', { name: 'Demand charge' }).inputValue()).toBe('2.5');
    const stored = async () =>
      other.page.evaluate(async (path) => {
        const res = await fetch(`/api${path.replace(/^\/w\//, '/workspaces/')}`);
        const body = (await res.json()) as { scenario: { revision: number; document: { electricity: Record<string, unknown> } } };
        return { revision: body.scenario.revision, electricity: body.scenario.document.electricity };
      }, scenarioUrl);
    expect(await stored()).toEqual({ revision: 5, electricity: { pricePerKwh: '0.31', escalationPctPerYear: 0, demandChargePerKwMonth: '2.5' } });

    // The same field on both sides: nothing is saved until the second editor chooses, here their value.
    await owner.page.goto(scenarioUrl);
    await owner.page.getByLabel('Price', { exact: true }).fill('0.25');
    await owner.page.getByRole('button', { name: 'Save as revision 6' }).click();
    expect(await shown(owner.page.getByText('Revision 6', { exact: true }))).toBe(true);
    await other.page.getByLabel('Price', { exact: true }).fill('0.4');
    await other.page.getByRole('textbox', { name: 'Price rise' }).fill('2');
    await other.page.getByRole('button', { name: 'Save as revision 6' }).click();
    const clashes = other.page.getByRole('table', { name: 'Fields you both changed' });
    expect(await shown(clashes.locator('tr[data-path="electricity.pricePerKwh"]'))).toBe(true);
    const saveMerged = other.page.getByRole('button', { name: 'Save the merged version' });
    expect(await saveMerged.isDisabled()).toBe(true);
    expect(await shown(other.page.getByText('Choose a value for the 1 field you both changed.'))).toBe(true);
    const takeTheirs = other.page.getByRole('radio', { name: 'Take theirs for Electricity price, year 1' });
    await takeTheirs.focus();
    await other.page.keyboard.press('Space');
    expect(await takeTheirs.isChecked()).toBe(true);
    await other.screenshot('23-editor-conflict-choice');
    await saveMerged.click();
    expect(await shown(other.page.getByText('Revision 7', { exact: true }))).toBe(true);
    expect(await other.page.getByLabel('Price', { exact: true }).inputValue()).toBe('0.25');
    expect(await other.page.getByRole('textbox', { name: 'Price rise' }).inputValue()).toBe('2');
    expect(await stored()).toEqual({ revision: 7, electricity: { pricePerKwh: '0.25', escalationPctPerYear: 2, demandChargePerKwMonth: '2.5' } });
    await other.close();
  });

  it('lets an owner invite a viewer, who sees no edit controls and whose write the API refuses', async () => {
    const p = owner.page;
    await p.getByRole('link', { name: 'Members and settings' }).click();
    await p.getByLabel('E-mail address').fill(viewerEmail);
    await p.getByLabel('Role', { exact: true }).selectOption('viewer');
    await p.getByRole('button', { name: 'Send the invitation' }).click();
    expect(await shown(p.getByText(`Invitation sent to ${viewerEmail}`))).toBe(true);
    await owner.screenshot('19-settings');

    const mail = (await listCaughtMail(models(h.running.sequelize))).find((m) => m.to.includes(viewerEmail));
    const link = /\/invitations\/[A-Za-z0-9_-]{43}/.exec(mail?.text ?? '')?.[0];
    expect(link).toBeDefined();

    const viewer = await h.session({ width: 1024, height: 768 });
    await signUp(viewer, 'Vera Viewer', viewerEmail, link, '24-sign-up');
    await viewer.page.getByRole('button', { name: 'Accept and open the workspace' }).waitFor();
    await viewer.screenshot('25-invitation-accept');
    await viewer.page.getByRole('button', { name: 'Accept and open the workspace' }).click();
    await viewer.page.getByRole('link', { name: 'Test room, LED or sodium' }).click();
    await viewer.page.getByRole('table', { name: /leveled options/i }).waitFor();
    expect(await viewer.page.getByRole('button', { name: /Save/ }).count()).toBe(0);
    expect(await viewer.page.getByRole('button', { name: 'Undo' }).count()).toBe(0);
    expect(await viewer.page.getByRole('button', { name: 'Remove option' }).count()).toBe(0);
    expect(await viewer.page.getByLabel('Price', { exact: true }).isDisabled()).toBe(true);
    await viewer.screenshot('20-editor-viewer-tablet');

    const status = await viewer.page.evaluate(async (path) => {
      const api = `/api${path.replace(/^\/w\//, '/workspaces/')}`;
      const me = (await (await fetch('/api/me')).json()) as { csrfToken: string };
      const current = (await (await fetch(api)).json()) as { scenario: { document: unknown; revision: number } };
      const res = await fetch(api, {
        method: 'PUT',
        headers: { 'content-type': 'application/json', 'x-csrf-token': me.csrfToken, 'if-match': String(current.scenario.revision) },
        body: JSON.stringify({ document: current.scenario.document }),
      });
      return { status: res.status, code: ((await res.json()) as { error?: { code?: string } }).error?.code };
    }, scenarioUrl);
    expect(status).toEqual({ status: 403, code: 'forbidden' });

    await viewer.page.goto(scenarioUrl.replace(/\/scenarios\/.*$/, '/fixtures'));
    await viewer.page.locator('tr[data-fixture="test-led"]').waitFor();
    expect(await viewer.page.getByRole('button', { name: /^Edit / }).count()).toBe(0);
    await viewer.screenshot('21-library-viewer-tablet');
  });
});
