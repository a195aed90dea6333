/**
 * Browser test: each demo role signs in through the form and sees exactly its navigation.
 * Drives Debian's chromium (never a downloaded browser) against the real app started by
 * startTestApp (fresh database, demo data seeded, built client from dist/, environment
 * "test", so the sign-in page lists no demo passwords and this file knows them itself).
 */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { useBrowserSession } from '../support/browser.ts';

// The demo scenario's accounts, as the seed creates them (invented people).
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
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

const session = useBrowserSession();

const mainNav = () => session.page.getByRole('navigation', { name: 'Main' });

async function signIn(email: string) {
  await session.page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
  await session.page.getByLabel('E-mail address').fill(email);
  await session.page.getByLabel('Password').fill(DEMO_PASSWORD);
  await session.page.getByRole('button', { name: 'Sign in', exact: true }).click();
}

async function signOut() {
  await session.page.getByRole('button', { name: 'Sign out' }).click();
  await session.page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
}

describe('when signed out', () => {
  it('then a guarded page sends the visitor to sign-in, and back after signing in', async () => {
    await session.page.goto(`${session.url}/makes`);
    await session.page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    const landed = new URL(session.page.url());
    expect(landed.pathname).toBe('/sign-in');
    expect(landed.searchParams.get('redirectTo')).toBe('/makes');
    expect(await mainNav().count()).toBe(0);

    await signIn(demo.sewist.email);
    await session.page.getByRole('heading', { name: 'Makes', level: 1 }).waitFor();
    expect(new URL(session.page.url()).pathname).toBe('/makes');
    await signOut();
  });

  it('then the sign-in page does not list demo passwords outside development', async () => {
    await session.page.goto(`${session.url}/sign-in`);
    await session.page.getByRole('heading', { name: 'Sign in', level: 1 }).waitFor();
    expect(await session.page.getByText(DEMO_PASSWORD).count()).toBe(0);
    expect(await session.page.getByRole('heading', { name: 'Demo accounts' }).count()).toBe(0);
  });
});

describe.each(['sewist', 'coach', 'admin'] as const)('when the demo %s signs in', (role) => {
  it(`then the navigation shows exactly the ${role}'s links`, async () => {
    await session.page.goto(`${session.url}/sign-in`);
    await signIn(demo[role].email);
    await session.page.getByRole('heading', { name: `Hello, ${demo[role].displayName}`, level: 1 }).waitFor();
    await session.page.screenshot({ path: path.join(screenshotDir, `${role}.png`), fullPage: true });

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
    await session.page.goto(`${session.url}/sign-in`);
    await signIn(demo.sewist.email);
    await session.page.getByRole('heading', { name: `Hello, ${demo.sewist.displayName}`, level: 1 }).waitFor();

    await session.page.goto(`${session.url}/admin/users`);
    await session.page.getByRole('heading', { name: 'This page is not open to your account', level: 1 }).waitFor();
    expect(new URL(session.page.url()).pathname).toBe('/admin/users');
    expect(await session.page.getByRole('table').count()).toBe(0);
    expect(await session.page.getByText(demo.admin.email).count()).toBe(0);
    await signOut();
  });
});
