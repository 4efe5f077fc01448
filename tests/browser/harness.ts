import { existsSync, mkdirSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { chromium } from 'playwright-core';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { boot } from '../../server/boot';
import type { Running } from '../../server/boot';
import { buildClientIfNeeded } from '../../server/build-client';
import { readConfig } from '../../server/config';
import { createLogger } from '../../server/logger';

/** Debian's chromium, driven by playwright-core; never a downloaded browser. */
export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const SCREENSHOT_DIR = join(process.cwd(), 'test-results', 'screenshots');

/** A running server on a temporary SQLite file, and browser sessions against it. */
export interface Harness {
  baseUrl: string;
  running: Running;
  /** a fresh browser profile (its own cookies), at a laptop-sized window */
  session(viewport?: { width: number; height: number }): Promise<Session>;
  close(): Promise<void>;
}

export interface Session {
  context: BrowserContext;
  page: Page;
  /** console errors and failed page scripts seen so far */
  errors: string[];
  screenshot(name: string): Promise<string>;
  close(): Promise<void>;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * Builds the client when dist/ is missing or stale, one test file at a time: test files run in
 * parallel processes, and two builds writing dist/ at once would leave it half written.
 */
async function buildClientOnce(root: string): Promise<void> {
  const lock = join(root, 'node_modules', '.cache', 'photon-parity-client-build.lock');
  mkdirSync(dirname(lock), { recursive: true });
  for (;;) {
    try {
      mkdirSync(lock);
      break;
    } catch {
      const age = Date.now() - (statSafe(lock) ?? Date.now());
      if (age > 5 * 60_000) rmSync(lock, { recursive: true, force: true });
      await sleep(250);
    }
  }
  // Vitest sets NODE_ENV=test, which Vite would honour and bundle React's development build.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await buildClientIfNeeded(root);
  } finally {
    process.env.NODE_ENV = nodeEnv;
    rmSync(lock, { recursive: true, force: true });
  }
}

function statSafe(path: string): number | null {
  try {
    return statSync(path).mtimeMs;
  } catch {
    return null;
  }
}

/**
 * Builds the client when dist/ is missing or stale, boots the real server (server/boot.ts) on a free
 * port with a temporary database, and hands out isolated browser sessions.
 */
export async function startHarness(env: Record<string, string> = {}): Promise<Harness> {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`the browser tests need Debian's chromium at ${CHROMIUM} (apt-get install chromium, or set CHROMIUM_PATH); .ci/run installs it`);
  }
  const root = process.cwd();
  await buildClientOnce(root);
  const dir = mkdtempSync(join(tmpdir(), 'photon-parity-browser-'));
  const config = readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: join(dir, 'test.sqlite'), ...env });
  const running = await boot(config, createLogger('silent'), root);
  const baseUrl = `http://127.0.0.1:${running.port}`;
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const sessions = new Set<Session>();

  const session = async (viewport = { width: 1366, height: 900 }): Promise<Session> => {
    const profile = mkdtempSync(join(dir, 'profile-'));
    const context = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      args: CHROMIUM_ARGS,
      viewport,
      baseURL: baseUrl,
      locale: 'en-GB',
      timezoneId: 'UTC',
    });
    const page = context.pages()[0] ?? (await context.newPage());
    const errors: string[] = [];
    page.on('console', (m) => {
      // Failed requests are recorded with their status and path by the response listener below.
      if (m.type() === 'error' && !m.text().startsWith('Failed to load resource')) errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(e.message));
    page.on('response', (r) => {
      if (r.status() >= 400) errors.push(`${r.status()} ${r.request().method()} ${new URL(r.url()).pathname}`);
    });
    const s: Session = {
      context,
      page,
      errors,
      screenshot: async (name) => {
        const path = join(SCREENSHOT_DIR, `${name}.png`);
        await page.screenshot({ path, fullPage: true });
        return path;
      },
      close: async () => {
        sessions.delete(s);
        await context.close();
      },
    };
    sessions.add(s);
    return s;
  };

  return {
    baseUrl,
    running,
    session,
    close: async () => {
      for (const s of [...sessions]) await s.close();
      await running.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Waits for a locator to be visible and reports whether it is (vitest has no web-first assertions). */
export async function shown(locator: Locator, timeout = 10_000): Promise<boolean> {
  try {
    await locator.first().waitFor({ state: 'visible', timeout });
    return true;
  } catch {
    return false;
  }
}

/** Signs a session in through the sign-in page, as a person would, and waits for the header to say so. */
export async function signIn(s: Session, email: string, password: string): Promise<void> {
  await s.page.goto('/sign-in');
  await s.page.getByLabel('E-mail address').fill(email);
  await s.page.getByLabel('Password').fill(password);
  await s.page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await s.page.getByText('Signed in as').waitFor();
}
