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
  await target.getByRole('link', { name: `Open ${name}` }).click();
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

/** The length the measurements table shows for a piece's seam, in mm (from the cell's data-mm). */
async function seam(target: Page, piece: string, label: string): Promise<{ now: number; change: number | undefined }> {
  const row = target.getByRole('table', { name: 'Seam lengths' }).getByRole('row', { name: `${piece} ${label}`, exact: true });
  const cells = row.locator('td[data-mm]');
  const now = Number(await cells.nth(0).getAttribute('data-mm'));
  const change = (await cells.count()) > 1 ? Number(await cells.nth(1).getAttribute('data-mm')) : undefined;
  return { now, change };
}

async function savedAs(target: Page): Promise<number> {
  const status = target.getByRole('status', { name: 'Save status' });
  await status.filter({ hasText: /^Saved · revision \d+$/ }).waitFor({ timeout: 15_000 });
  return Number((await status.textContent())!.match(/revision (\d+)/)![1]);
}

describe('altering a make', () => {
  it('when Rui blends sizes by level, shortens the legs 3 in and adds 2 in of rise, then the measurements move by those amounts, it is all saved, and undo/redo work', async () => {
    const page = session.page;
    await signIn(page, 'rui@loomhollow.example');
    await openMake(page, 'Linen summer trousers');
    const tools = page.getByRole('region', { name: 'Tools' });
    const alterations = page.getByRole('list', { name: 'Alterations' });

    // Blend: size 0 at the waist, 4 at the hip, 8 at the thigh, 10 at the calf (issue 3's example).
    await tools.getByRole('tab', { name: 'Blend sizes' }).click();
    for (const [level, size] of [['waist', '0'], ['hip', '4'], ['thigh', '8'], ['calf', '10']] as const) await tools.getByLabel(`Size at ${level}`).fill(size);
    await tools.getByRole('button', { name: 'Blend' }).click();
    await alterations.getByRole('listitem').first().waitFor();
    const blendRevision = await savedAs(page);

    // Shorten the legs 3 in at the lower-leg line.
    await tools.getByRole('tab', { name: 'Lengthen / shorten' }).click();
    await tools.getByLabel('Lengthen/shorten line').selectOption('lower leg');
    await tools.getByLabel('Amount').fill('-3');
    await tools.getByLabel('Amount').press('Enter');
    await tools.getByRole('button', { name: 'Shorten' }).click();
    await alterations.getByRole('listitem', { name: 'Shorten at “lower leg” by 3 in' }).waitFor();
    // Trade fact (common practice, no source; issue 3): shortening the legs 3 in shortens the inseam by 3 in.
    for (const piece of ['front', 'back']) {
      const inseam = await seam(page, piece, 'Inseam');
      expect(Math.abs(inseam.change! + 76.2)).toBeLessThan(0.3);
    }
    expect(await savedAs(page)).toBe(blendRevision + 1);

    // Add 2 in of rise: centre front and back about 2 in longer, the leg unchanged.
    await tools.getByRole('tab', { name: 'Rise' }).click();
    await tools.getByLabel('Amount').fill('2');
    await tools.getByLabel('Amount').press('Enter');
    await tools.getByRole('button', { name: 'Change the rise' }).click();
    await alterations.getByRole('listitem', { name: 'Raise the rise by 2 in' }).waitFor();
    const cf = await seam(page, 'front', 'Centre front');
    expect(Math.abs(cf.change! - 50.8)).toBeLessThan(2.5);
    expect(Math.abs((await seam(page, 'front', 'Inseam')).change!)).toBeLessThan(0.05);
    const inseamNow = (await seam(page, 'front', 'Inseam')).now;
    await savedAs(page);
    await page.screenshot({ path: `${shots}/workspace-altered.png` });

    // Reload: all of it was saved.
    await page.reload();
    await alterations.getByRole('listitem').first().waitFor();
    expect(await alterations.getByRole('listitem').count()).toBe(3);
    expect(Math.abs((await seam(page, 'front', 'Inseam')).now - inseamNow)).toBeLessThan(0.01);

    // Undo (Ctrl+Z) takes the rise off, redo (Ctrl+Shift+Z) puts it back; each is saved.
    await page.getByRole('heading', { name: 'Alterations' }).click();
    await page.keyboard.press('Control+z');
    await alterations.getByRole('listitem', { name: 'Raise the rise by 2 in' }).waitFor({ state: 'detached' });
    expect(await alterations.getByRole('listitem').count()).toBe(2);
    await savedAs(page);
    await page.keyboard.press('Control+Shift+z');
    await alterations.getByRole('listitem', { name: 'Raise the rise by 2 in' }).waitFor();
    await savedAs(page);
    await page.reload();
    await alterations.getByRole('listitem').first().waitFor();
    expect(await alterations.getByRole('listitem').count()).toBe(3);
  }, 120_000);
});
