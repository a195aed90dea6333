/**
 * Browser tests of the make workspace (issue 5): what a sewist does at the drafting table.
 * Screenshots are kept in test-output/e2e/.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { useBrowserSession } from '../support/browser.ts';

const session = useBrowserSession();
const shots = 'test-output/e2e';

async function signIn(target: Page, email: string) {
  await target.goto(`${session.url}/sign-in`);
  await target.getByLabel('E-mail address').fill(email);
  await target.getByLabel('Password').fill(DEMO_PASSWORD);
  await target.getByRole('button', { name: 'Sign in', exact: true }).click();
  await target.getByRole('heading', { name: /^Hello, /, level: 1 }).waitFor();
}

async function openMake(target: Page, name: string) {
  await target.goto(`${session.url}/makes`);
  await target.getByRole('link', { name }).first().click();
  await target.getByRole('heading', { name, level: 1 }).waitFor();
  await target.getByRole('list', { name: 'Alterations' }).or(target.getByText('No alterations yet')).first().waitFor();
}

describe('the seeded make', () => {
  it('when Ada opens her make, then the pieces, the alterations and the measurements are there', async () => {
    const errors: string[] = [];
    session.page.on('pageerror', (e) => errors.push(e.message));
    await signIn(session.page, 'ada@loomhollow.example');
    await openMake(session.page, 'Everyday jeans');
    const list = session.page.getByRole('list', { name: 'Alterations' });
    expect(await list.getByRole('listitem').count()).toBe(3);
    await session.page.getByRole('table', { name: 'Seam lengths' }).waitFor();
    await session.page.screenshot({ path: `${shots}/workspace-seeded.png` });
    expect(errors).toEqual([]);
  });
});
