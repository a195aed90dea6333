/**
 * Browser test of the account flows the client owns end to end: a password reset through the
 * e-mailed link (read from the admin outbox), a display-name change that the app shell shows
 * at once, and a form token gone stale because the session changed in another tab.
 */
import { describe, expect, it } from 'vitest';
import { useBrowserSession } from '../support/browser.ts';


const session = useBrowserSession();

describe('when a sewist forgets their password', () => {
  it('then the e-mailed link sets a new one, once, and the new one signs in', async () => {
    await session.page.goto(`${session.url}/forgot-password`);
    await session.page.getByLabel('E-mail address').fill('rui@loomhollow.example');
    await session.page.getByRole('button', { name: 'Send reset link' }).click();
    await session.page.getByText('we have sent it a link').waitFor();

    await session.signIn(session.page, 'admin@loomhollow.example');
    await session.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
    await session.page.getByRole('heading', { name: 'Outbox', level: 1 }).waitFor();
    const message = session.page.getByRole('listitem').filter({ hasText: 'rui@loomhollow.example' }).first();
    await message.locator('summary').click();
    const href = await message.getByRole('link', { name: /\/reset-password\?token=/ }).getAttribute('href');
    // The link carries the server's public address: this test server's own.
    expect(href).toMatch(new RegExp(`^${session.url}/reset-password\\?token=[\\w-]+$`));
    const resetUrl = href!;
    await session.page.getByRole('button', { name: 'Sign out' }).click();
    await session.page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();

    const newPassword = 'a-new-password-for-rui';
    await session.page.goto(resetUrl);
    await session.page.getByLabel('New password').fill(newPassword);
    await session.page.getByLabel('Repeat password').fill(newPassword);
    await session.page.getByRole('button', { name: 'Save new password' }).click();
    await session.page.getByText('Your new password is saved.').waitFor();

    // The same link a second time is refused, with the way to ask for a new one.
    await session.page.goto(resetUrl);
    await session.page.getByLabel('New password').fill('yet-another-password');
    await session.page.getByLabel('Repeat password').fill('yet-another-password');
    await session.page.getByRole('button', { name: 'Save new password' }).click();
    await session.page.getByRole('alert').filter({ hasText: 'expired or has already been used' }).waitFor();
    expect(await session.page.getByRole('link', { name: 'Ask for a new one' }).count()).toBe(1);

    await session.signIn(session.page, 'rui@loomhollow.example', newPassword);
    expect(await session.page.getByRole('heading', { name: 'Hello, Rui Tallis', level: 1 }).count()).toBe(1);
  });
});

describe('when a sewist renames themself after their session changed in another tab', () => {
  it('then the stale form token is replaced once and the new name shows in the shell', async () => {
    await session.signIn(session.page, 'ada@loomhollow.example');
    await session.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Account' }).click();
    await session.page.getByRole('heading', { name: 'Account', level: 1 }).waitFor();
    // Saving once makes this tab fetch and keep a form token for the current session.
    await session.page.getByLabel('Display name').fill('Ada B.');
    await session.page.getByRole('button', { name: 'Save name' }).click();
    await session.page.getByText('Display name saved.').waitFor();

    // Signing out and in again in a second tab starts a new session; this tab's token is stale.
    const other = await session.context.newPage();
    await other.goto(session.url);
    await other.getByRole('button', { name: 'Sign out' }).click();
    await other.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    await session.signIn(other, 'ada@loomhollow.example');
    await other.close();

    const patches: number[] = [];
    session.page.on('response', (response) => {
      if (response.request().method() === 'PATCH' && new URL(response.url()).pathname === '/api/account') {
        patches.push(response.status());
      }
    });
    await session.page.getByLabel('Display name').fill('Ada Brightwater-Reyes');
    await session.page.getByRole('button', { name: 'Save name' }).click();
    await session.page.getByText('Display name saved.').waitFor();

    expect(patches).toEqual([403, 200]);
    expect(await session.page.getByRole('banner').first().innerText()).toContain('Ada Brightwater-Reyes');
  });
});
