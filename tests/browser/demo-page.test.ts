import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeScenario, parseScenario } from '../../src/engine';
import { shown, startHarness } from './harness';
import type { Harness } from './harness';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

describe('the start page', { timeout: 120_000 }, () => {
  it('loads a demo scenario through /api/examples and shows the result the engine computes, in the browser', async () => {
    const s = await h.session();
    const apiCalls: string[] = [];
    s.page.on('request', (r) => {
      if (r.url().includes('/api/')) apiCalls.push(new URL(r.url()).pathname);
    });
    await s.page.goto('/');
    const table = s.page.getByRole('table', { name: /leveled options/i });
    await table.waitFor();

    const file = JSON.parse(readFileSync('scenarios/room-a-relamp-or-replace.scenario.json', 'utf8'));
    const checked = parseScenario(file);
    if (!checked.ok) throw new Error('demo scenario does not parse');
    const expected = computeScenario(checked.value);
    const cheapestLabel = checked.value.options.find((o) => o.id === expected.cheapest)?.label ?? '';

    const cheapestRow = s.page.locator(`tr[data-option="${expected.cheapest}"]`);
    expect(await shown(cheapestRow.getByText('lowest present value'))).toBe(true);
    expect(await shown(s.page.getByText(`Lowest present value: ${cheapestLabel}`))).toBe(true);
    // The whole fixture count the page shows is the engine's, for every option.
    for (const o of expected.options) {
      const cells = s.page.locator(`tr[data-option="${o.id}"] td`);
      expect(await cells.nth(1).innerText()).toBe(String(o.fixturesWhole));
    }
    expect(apiCalls).toContain('/api/examples/room-a-relamp-or-replace');
    expect(apiCalls.some((p) => p.includes('/result'))).toBe(false);
    await s.screenshot('01-start-page');

    await s.page.getByRole('button', { name: 'Show charts' }).click();
    await s.page.locator('.recharts-surface').first().waitFor();
    await s.screenshot('02-start-page-charts');
    expect(s.errors, s.errors.join("\n")).toEqual([]);
    await s.close();
  });

  it('ships under 250 KB of gzipped JavaScript on the first load, with the chart code left for later', async () => {
    const s = await h.session();
    const scripts: Array<{ path: string; gz: number }> = [];
    s.page.on('response', async (r) => {
      const path = new URL(r.url()).pathname;
      if (!path.endsWith('.js')) return;
      const body = await r.body().catch(() => Buffer.alloc(0));
      scripts.push({ path, gz: gzipSync(body, { level: 9 }).length });
    });
    await s.page.goto('/');
    await s.page.getByRole('table', { name: /leveled options/i }).waitFor();
    await s.page.waitForLoadState('networkidle');
    const total = scripts.reduce((sum, x) => sum + x.gz, 0);
    console.info(`first load: ${scripts.length} scripts, ${(total / 1024).toFixed(1)} KB gzipped`);
    expect(total).toBeLessThan(250 * 1024);
    expect(scripts.some((x) => /CartesianChart|cost-breakdown-chart|cumulative-chart/.test(x.path))).toBe(false);
    await s.close();
  });
});
