/**
 * Browser test: each demo role signs in through the form and sees exactly its navigation.
 * Drives Debian's chromium (never a downloaded browser) against the real app started by
 * startTestApp (fresh database, demo data seeded, built client from dist/, environment
 * "test", so the sign-in page lists no demo passwords and this file knows them itself).
 */
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startTestApp } from '../support/app-server.ts';
import { launchChromium } from '../support/browser.ts';

// The demo scenario's accounts, as the seed creates them (invented people).
const DEMO_PASSWORD = 'demo-password-1';
const demo = {
  sewist: { email: 'ada@loomhollow.example', displayName: 'Ada Brightwater' },
  coach: { email: 'mina@loomhollow.example', displayName: 'Mina Okafor-Lund' },
  admin: { email: 'admin@loomhollow.example', displayName: 'Studio Admin' },
} as const;

// What each role's main navigation lists, in order.
const expectedLinks = {
  sewist: ['Home', 'Makes', 'Patterns', 'Fit planner', 'Fabrics', 'Shared library', 'Account'],
  coach: ['Home', 'Makes', 'Patterns', 'Fit planner', 'Fabrics', 'Shared library', 'Coaching', 'Account'],
  admin: [
    'Home', 'Makes', 'Patterns', 'Fit planner', 'Fabrics', 'Shared library', 'Coaching',
    'Users', 'Outbox', 'Account',
  ],
} as const;
const allLinks = [...new Set(Object.values(expectedLinks).flat())];

const screenshotDir = path.resolve('test-output', 'e2e');

let app: { url: string; close(): Promise<void> };
let profileDir: string;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  app = await startTestApp();
  profileDir = await mkdtemp(path.join(tmpdir(), 'blockwright-e2e-'));
  await mkdir(screenshotDir, { recursive: true });
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

// Each test starts signed out, whatever the one before it left behind.
beforeEach(async () => {
  await context.clearCookies();
});

const mainNav = () => page.getByRole('navigation', { name: 'Main' });

async function signIn(email: string) {
  await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

async function signOut() {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
}

describe('when signed out', () => {
  it('then a guarded page sends the visitor to sign-in, and back after signing in', async () => {
    await page.goto(`${app.url}/makes`);
    await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    const landed = new URL(page.url());
    expect(landed.pathname).toBe('/sign-in');
    expect(landed.searchParams.get('redirectTo')).toBe('/makes');
    expect(await mainNav().count()).toBe(0);

    await signIn(demo.sewist.email);
    await page.getByRole('heading', { name: 'Makes', level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/makes');
    await signOut();
  });

  it('then the sign-in page does not list demo passwords outside development', async () => {
    await page.goto(`${app.url}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    expect(await page.getByText(DEMO_PASSWORD).count()).toBe(0);
    expect(await page.getByRole('heading', { name: 'Demo accounts' }).count()).toBe(0);
  });
});

describe.each(['sewist', 'coach', 'admin'] as const)('when the demo %s signs in', (role) => {
  it(`then the navigation shows exactly the ${role}'s links`, async () => {
    await page.goto(`${app.url}/sign-in`);
    await signIn(demo[role].email);
    await page.getByRole('heading', { name: `Hello, ${demo[role].displayName}`, level: 1 }).waitFor();
    await page.screenshot({ path: path.join(screenshotDir, `${role}.png`), fullPage: true });

    const shown = (await mainNav().getByRole('link').allInnerTexts()).map((text) => text.trim());
    expect(shown).toEqual(expectedLinks[role]);
    // The same names are the links' accessible names; the other roles' links are absent.
    for (const name of allLinks) {
      const expected = (expectedLinks[role] as readonly string[]).includes(name) ? 1 : 0;
      expect(await mainNav().getByRole('link', { name, exact: true }).count(), name).toBe(expected);
    }

    await signOut();
  });
});

describe('when a sewist opens an admin page', () => {
  it('then the not-allowed page shows and no account list is loaded', async () => {
    await page.goto(`${app.url}/sign-in`);
    await signIn(demo.sewist.email);
    await page.getByRole('heading', { name: `Hello, ${demo.sewist.displayName}`, level: 1 }).waitFor();

    await page.goto(`${app.url}/admin/users`);
    await page.getByRole('heading', { name: 'This page is not open to your account', level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/admin/users');
    expect(await page.getByRole('table').count()).toBe(0);
    expect(await page.getByText(demo.admin.email).count()).toBe(0);
    await signOut();
  });
});
