/**
 * Browser test of the account flows the client owns end to end: a password reset through the
 * e-mailed link (read from the admin outbox), a display-name change that the app shell shows
 * at once, and a form token gone stale because the session changed in another tab.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startTestApp } from '../support/app-server.ts';
import { launchChromium } from '../support/browser.ts';

const DEMO_PASSWORD = 'demo-password-1';

let app: { url: string; close(): Promise<void> };
let profileDir: string;
let context: BrowserContext;
let page: Page;

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

beforeEach(async () => {
  await context.clearCookies();
});

async function signIn(target: Page, email: string, password = DEMO_PASSWORD) {
  await target.goto(`${app.url}/sign-in`);
  await target.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
  await target.getByLabel('E-mail address').fill(email);
  await target.getByLabel('Password').fill(password);
  await target.getByRole('button', { name: 'Sign in', exact: true }).click();
  await target.getByRole('heading', { name: /^Hello, /, level: 1 }).waitFor();
}

describe('when a sewist forgets their password', () => {
  it('then the e-mailed link sets a new one, once, and the new one signs in', async () => {
    await page.goto(`${app.url}/forgot-password`);
    await page.getByLabel('E-mail address').fill('rui@loomhollow.example');
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByText('we have sent it a link').waitFor();

    await signIn(page, 'admin@loomhollow.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
    await page.getByRole('heading', { name: 'Outbox', level: 1 }).waitFor();
    const message = page.getByRole('listitem').filter({ hasText: 'rui@loomhollow.example' }).first();
    await message.locator('summary').click();
    const href = await message.getByRole('link', { name: /\/reset-password\?token=/ }).getAttribute('href');
    // The link carries the server's public address: this test server's own.
    expect(href).toMatch(new RegExp(`^${app.url}/reset-password\\?token=[\\w-]+$`));
    const resetUrl = href!;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();

    const newPassword = 'a-new-password-for-rui';
    await page.goto(resetUrl);
    await page.getByLabel('New password').fill(newPassword);
    await page.getByLabel('Repeat password').fill(newPassword);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByText('Your new password is saved.').waitFor();

    // The same link a second time is refused, with the way to ask for a new one.
    await page.goto(resetUrl);
    await page.getByLabel('New password').fill('yet-another-password');
    await page.getByLabel('Repeat password').fill('yet-another-password');
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByRole('alert').filter({ hasText: 'expired or has already been used' }).waitFor();
    expect(await page.getByRole('link', { name: 'Ask for a new one' }).count()).toBe(1);

    await signIn(page, 'rui@loomhollow.example', newPassword);
    expect(await page.getByRole('heading', { name: 'Hello, Rui Tallis', level: 1 }).count()).toBe(1);
  });
});

describe('when a sewist renames themself after their session changed in another tab', () => {
  it('then the stale form token is replaced once and the new name shows in the shell', async () => {
    await signIn(page, 'ada@loomhollow.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Account' }).click();
    await page.getByRole('heading', { name: 'Account', level: 1 }).waitFor();
    // Saving once makes this tab fetch and keep a form token for the current session.
    await page.getByLabel('Display name').fill('Ada B.');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByText('Display name saved.').waitFor();

    // Signing out and in again in a second tab starts a new session; this tab's token is stale.
    const other = await context.newPage();
    await other.goto(app.url);
    await other.getByRole('button', { name: 'Sign out' }).click();
    await other.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    await signIn(other, 'ada@loomhollow.example');
    await other.close();

    const patches: number[] = [];
    page.on('response', (response) => {
      if (response.request().method() === 'PATCH' && new URL(response.url()).pathname === '/api/account') {
        patches.push(response.status());
      }
    });
    await page.getByLabel('Display name').fill('Ada Brightwater-Reyes');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByText('Display name saved.').waitFor();

    expect(patches).toEqual([403, 200]);
    expect(await page.getByRole('banner').first().innerText()).toContain('Ada Brightwater-Reyes');
  });
});
