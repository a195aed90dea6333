import fs from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, expect } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { installDebianPackages } from '../../server/system/debian.ts';
import { startTestApp } from './app-server.ts';

/** Debian's chromium; never a browser downloaded by a test tool. */
export const CHROMIUM = '/usr/bin/chromium';

/** Flags for a headless chromium on a machine with no network but loopback. */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Install Debian's chromium when missing (as root with apt), else say what to install. */
export function ensureChromium(): string {
  if (fs.existsSync(CHROMIUM)) return CHROMIUM;
  installDebianPackages(['chromium'], (line) => process.stdout.write(`${line}\n`));
  if (!fs.existsSync(CHROMIUM))
    throw new Error('The browser tests need Debian\'s chromium: install it with "apt-get install chromium".');
  return CHROMIUM;
}

/** A headless chromium with its own throw-away profile folder. */
export function launchChromium(profileDir: string, viewport = { width: 1280, height: 860 }): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profileDir, {
    executablePath: ensureChromium(),
    headless: true,
    viewport,
    args: CHROMIUM_ARGS,
  });
}

export interface BrowserSession {
  /** The app under test (fresh database, demo studio, built client). */
  readonly url: string;
  readonly context: BrowserContext;
  /** The context's first page. */
  readonly page: Page;
  /** Sign in on the sign-in page as a demo account (or with `password`), and wait for the home page. */
  signIn(page: Page, email: string, password?: string): Promise<void>;
  /** GET an API address with the page's cookies; expects 200 and returns the JSON body. */
  getJson<T>(page: Page, url: string): Promise<T>;
}

/**
 * For a browser test file: start the app and a chromium before the tests, close both after,
 * and sign out (clear cookies) before each test. Read the fields inside tests, not at load time.
 */
export function useBrowserSession(): BrowserSession {
  let app: { url: string; close(): Promise<void> } | undefined;
  let profileDir: string | undefined;
  let context: BrowserContext | undefined;
  let page: Page | undefined;
  beforeAll(async () => {
    app = await startTestApp();
    profileDir = await mkdtemp(path.join(tmpdir(), 'blockwright-e2e-'));
    context = await launchChromium(profileDir);
    // Fail on the step that stalls, well inside the test's own time limit.
    context.setDefaultTimeout(10_000);
    page = context.pages()[0] ?? (await context.newPage());
  });
  afterAll(async () => {
    await context?.close();
    await app?.close();
    if (profileDir) await rm(profileDir, { recursive: true, force: true });
  });
  // Each test starts signed out, whatever the one before it left behind. The page leaves the
  // app first: a request the last test's page still had in flight could otherwise answer after
  // the cookies are cleared and set the (rolling) session cookie again.
  beforeEach(async () => {
    await page?.goto('about:blank');
    await context?.clearCookies();
  });
  const ready = <T>(value: T | undefined): T => {
    if (value === undefined) throw new Error('the browser session is not started yet');
    return value;
  };
  return {
    get url() {
      return ready(app).url;
    },
    get context() {
      return ready(context);
    },
    get page() {
      return ready(page);
    },
    async signIn(target: Page, email: string, password = DEMO_PASSWORD) {
      await target.goto(`${ready(app).url}/sign-in`);
      await target.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
      await target.getByLabel('E-mail address').fill(email);
      await target.getByLabel('Password').fill(password);
      await target.getByRole('button', { name: 'Sign in', exact: true }).click();
      await target.getByRole('heading', { name: /^Hello, /, level: 1 }).waitFor();
    },
    async getJson<T>(target: Page, url: string): Promise<T> {
      const response = await target.request.get(`${ready(app).url}${url}`);
      expect(response.status(), url).toBe(200);
      return (await response.json()) as T;
    },
  };
}
