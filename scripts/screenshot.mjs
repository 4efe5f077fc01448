// Takes a full-page screenshot of a URL in Debian's headless chromium, and prints console errors:
//   node scripts/screenshot.mjs http://localhost:3000/ out.png [width] [height]
import { chromium } from 'playwright-core';

const [url, out, w = '1366', h = '900'] = process.argv.slice(2);
if (!url || !out) {
  console.error('usage: node scripts/screenshot.mjs URL OUT.png [width] [height]');
  process.exit(2);
}
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
const page = await browser.newPage({ viewport: { width: Number(w), height: Number(h) } });
const errors = [];
page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
page.on('pageerror', (e) => errors.push(String(e)));
await page.goto(url, { waitUntil: 'networkidle' });
await page.waitForTimeout(1000);
await page.screenshot({ path: out, fullPage: true });
if (errors.length) console.error(`console errors:\n${errors.join('\n')}`);
await browser.close();
