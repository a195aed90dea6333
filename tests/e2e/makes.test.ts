/**
 * Browser test of the makes page as Rui (demo sewist): start a make from the shared library
 * pattern with a new measurement profile typed in inches, rename it, sew it again, archive the
 * copy and find it under "Archived"; switch to centimetres on the account page and see a length
 * in cm; print a make from its dialog, follow the job to its download and read the PDF back.
 *
 * Outside references: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959);
 * A4 = 210 × 297 mm (ISO 216); a PDF point is 1/72 in (ISO 32000-1 §8.3.2.3); the PDF is read
 * back with pdfjs-dist (Mozilla's general-purpose PDF reader).
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { DEMO_PATTERN_NAME } from '../../server/seed/demo.ts';
import { useBrowserSession } from '../support/browser.ts';

const session = useBrowserSession();
const screenshotDir = path.resolve('test-output', 'e2e');
const MM_PER_INCH = 25.4; // exact, by the 1959 international yard and pound agreement
const PT_PER_MM = 72 / MM_PER_INCH; // ISO 32000-1: default user space unit 1/72 in

type MakeSummary = { id: string; name: string; sourceMakeId: string | null; profile: { name: string } | null; archived: boolean };

const makeCard = (page: Page, name: string) =>
  page.getByRole('article').filter({ has: page.getByRole('heading', { name, exact: true, level: 3 }) });

describe('when Rui keeps makes', () => {
  it('then a make starts from the library pattern with a new profile, is renamed, sewn again and archived', async () => {
    const { page } = session;
    await session.signIn(page, 'rui@loomhollow.example');

    // The library links to /makes?new=<patternId>: the form opens with that pattern chosen.
    const { patterns } = await session.getJson<{ patterns: { id: string; name: string }[] }>(page, '/api/patterns?scope=library');
    const libraryPattern = patterns.find((p) => p.name === DEMO_PATTERN_NAME);
    expect(libraryPattern).toBeDefined();
    await page.goto(`${session.url}/makes?new=${libraryPattern!.id}`);
    await page.getByRole('heading', { name: 'New make', level: 2 }).waitFor();
    await expect.poll(() => page.getByLabel('Pattern', { exact: true }).inputValue()).toBe(libraryPattern!.id);

    // A measurement that is not a length is refused beside its field, and nothing is sent.
    await page.getByLabel('Name of the make').fill('Wool winter trousers');
    await page.getByLabel('Profile', { exact: true }).selectOption({ label: 'New profile…' });
    await page.getByLabel('Profile name').fill('Rui, December');
    await page.getByLabel('Waist girth').fill('thirty');
    await page.getByRole('button', { name: 'Start the make' }).click();
    await page.getByText('is not a length').waitFor();
    expect((await session.getJson<{ profiles: unknown[] }>(page, '/api/profiles')).profiles).toHaveLength(1);

    // Rui's units are inches: a bare number is inches, and a typed unit is honoured.
    await page.getByLabel('Waist girth').fill('32 1/2');
    await page.getByLabel('Hip girth').fill('94 cm');
    await page.getByLabel('Fabric note').fill('Navy wool flannel, 150 cm wide, steamed.');
    await page.getByRole('button', { name: 'Start the make' }).click();
    await page.getByText('“Wool winter trousers” is started.').waitFor();
    const created = makeCard(page, 'Wool winter trousers');
    expect(await created.innerText()).toContain('Rui, December');
    expect(await created.innerText()).toContain(DEMO_PATTERN_NAME);

    const { profiles } = await session.getJson<{ profiles: { name: string; measurements: Record<string, number> }[] }>(page, '/api/profiles');
    const profile = profiles.find((p) => p.name === 'Rui, December');
    expect(profile?.measurements.waistGirth).toBeCloseTo(32.5 * MM_PER_INCH, 6); // 825.5 mm
    expect(profile?.measurements.hipGirth).toBeCloseTo(940, 6);

    // Rename in place.
    await page.getByRole('button', { name: 'Rename Wool winter trousers' }).click();
    await page.getByLabel('New name for “Wool winter trousers”').fill('Navy wool trousers');
    await page.getByRole('button', { name: 'Save name' }).click();
    await makeCard(page, 'Navy wool trousers').waitFor();
    expect(await makeCard(page, 'Wool winter trousers').count()).toBe(0);

    // Sew it again: a new make from this one, opened at once.
    const before = (await session.getJson<{ makes: MakeSummary[] }>(page, '/api/makes?archived=false')).makes;
    const original = before.find((m) => m.name === 'Navy wool trousers')!;
    await page.getByRole('button', { name: 'Sew Navy wool trousers again' }).click();
    await page.waitForURL((url) => /^\/makes\/[0-9a-f-]{36}$/.test(url.pathname) && !url.pathname.endsWith(original.id));
    const copyId = new URL(page.url()).pathname.split('/').pop()!;
    const copy = (await session.getJson<{ make: MakeSummary }>(page, `/api/makes/${copyId}`)).make;
    expect(copy.sourceMakeId).toBe(original.id);
    expect(copy.name).toBe('Navy wool trousers (again)');
    expect(copy.profile?.name).toBe('Rui, December');

    // Archive the copy; it leaves the active list and waits under "Archived".
    await page.goto(`${session.url}/makes`);
    await makeCard(page, 'Navy wool trousers (again)').waitFor();
    await page.getByRole('button', { name: 'Archive Navy wool trousers (again)' }).click();
    await makeCard(page, 'Navy wool trousers (again)').waitFor({ state: 'detached' });
    expect(await makeCard(page, 'Navy wool trousers').count()).toBe(1);
    await page.getByRole('tab', { name: 'Archived' }).click();
    await makeCard(page, 'Navy wool trousers (again)').waitFor();
    expect(await page.getByRole('button', { name: 'Bring back Navy wool trousers (again)' }).count()).toBe(1);
    expect(new URL(page.url()).searchParams.get('show')).toBe('archived');
    await page.screenshot({ path: path.join(screenshotDir, 'makes-archived.png'), fullPage: true });
    const archived = (await session.getJson<{ makes: MakeSummary[] }>(page, '/api/makes?archived=true')).makes;
    expect(archived.map((m) => m.id)).toEqual([copyId]);
  });
});

describe('when Rui switches to centimetres and prints a make', () => {
  it('then lengths show in cm, a bad margin is refused, and the print arrives as an A4 PDF', async () => {
    const { page } = session;
    await session.signIn(page, 'rui@loomhollow.example');

    // In inches, the default margin of 6.35 mm reads 1/4 in (6.35 / 25.4 = 0.25).
    await page.goto(`${session.url}/makes`);
    await page.getByRole('button', { name: 'Print Linen summer trousers' }).click();
    const dialog = page.getByRole('dialog', { name: 'Linen summer trousers' });
    expect(await dialog.getByLabel('Margin').inputValue()).toBe('1/4 in');
    await dialog.getByRole('button', { name: 'Close' }).click();

    await page.goto(`${session.url}/account`);
    await page.getByLabel('Centimetres').check();
    await page.getByRole('button', { name: 'Save units' }).click();
    await page.getByText('Units saved.').waitFor();

    await page.goto(`${session.url}/makes`);
    await page.getByRole('button', { name: 'Print Linen summer trousers' }).click();
    await dialog.waitFor();
    // 6.35 mm = 0.635 cm, shown to the nearest millimetre.
    expect(await dialog.getByLabel('Margin').inputValue()).toBe('0.6 cm');
    expect(await dialog.getByRole('note', { name: 'Before you print' }).innerText()).toContain('Print at 100 %');

    // A margin past the API's 50 mm is refused on the spot and queues nothing.
    const printsBefore = (await session.getJson<{ prints: unknown[] }>(page, '/api/prints')).prints.length;
    await dialog.getByLabel('Margin').fill('2 in');
    await dialog.getByRole('button', { name: 'Make the print' }).click();
    await dialog.getByText('Use a length from 0 cm to 5 cm.').waitFor();
    expect((await session.getJson<{ prints: unknown[] }>(page, '/api/prints')).prints).toHaveLength(printsBefore);

    await dialog.getByLabel('Margin').fill('0.635');
    await dialog.getByLabel('Paper').selectOption('a4');
    await dialog.getByRole('button', { name: 'Make the print' }).click();
    const ready = dialog.getByRole('status').filter({ hasText: 'Ready:' });
    await ready.waitFor({ timeout: 20_000 });
    const readyText = await ready.innerText();
    await page.screenshot({ path: path.join(screenshotDir, 'makes-print.png'), fullPage: true });

    const href = await ready.getByRole('link', { name: 'Download PDF' }).getAttribute('href');
    expect(href).toMatch(/^\/api\/prints\/[0-9a-f-]{36}\/file$/);
    const printId = href!.split('/')[3]!;
    const job = (await session.getJson<{ print: { pageCount: number; emptyPages: string[]; options: Record<string, unknown> } }>(page, `/api/prints/${printId}`)).print;
    expect(job.options).toMatchObject({ paper: 'a4', format: 'pdf', orientation: 'auto' });
    expect(job.options.margin).toBeCloseTo(6.35, 9);
    expect(readyText).toContain(`${job.pageCount} pages`);
    for (const label of job.emptyPages) expect(readyText).toContain(label);

    const file = await page.request.get(`${session.url}${href}`);
    expect(file.status()).toBe(200);
    const pdf = await getDocument({ data: new Uint8Array(await file.body()), verbosity: 0 }).promise;
    expect(pdf.numPages).toBe(job.pageCount);
    // Every tiled page is an A4 sheet (ISO 216: 210 × 297 mm), upright or sideways.
    for (let n = 1; n <= pdf.numPages; n++) {
      const [x0, y0, x1, y1] = (await pdf.getPage(n)).view as [number, number, number, number];
      const sides = [x1 - x0, y1 - y0].sort((a, b) => a - b);
      expect(sides[0]).toBeCloseTo(210 * PT_PER_MM, 1);
      expect(sides[1]).toBeCloseTo(297 * PT_PER_MM, 1);
    }
    await pdf.destroy();

    // The print stays in the list of earlier prints, with its download link.
    const history = dialog.getByRole('region', { name: 'Earlier prints' });
    await history.getByRole('link', { name: 'Download Linen summer trousers (PDF)' }).waitFor();

    // A print of another make is listed with that make, not with this one.
    const linen = (await session.getJson<{ makes: (MakeSummary & { pattern: { id: string } })[] }>(page, '/api/makes')).makes.find((m) => m.name === 'Linen summer trousers')!;
    const csrf = ((await (await page.request.get(`${session.url}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;
    const headers = { 'x-csrf-token': csrf };
    const second = await page.request.post(`${session.url}/api/makes`, { data: { name: 'Second linen pair', patternId: linen.pattern.id }, headers });
    expect(second.status()).toBe(201);
    const secondId = ((await second.json()) as { make: MakeSummary }).make.id;
    expect((await page.request.post(`${session.url}/api/prints`, { data: { makeId: secondId, options: { format: 'svg' } }, headers })).status()).toBe(202);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await page.getByRole('button', { name: 'Print Linen summer trousers' }).click();
    await history.getByRole('link', { name: 'Download Linen summer trousers (PDF)' }).waitFor();
    expect(await history.getByText('Second linen pair').count()).toBe(0);
    await page.getByRole('dialog', { name: 'Linen summer trousers' }).getByRole('button', { name: 'Close' }).click();
    await page.reload(); // the make was started through the API, after the list was loaded
    await page.getByRole('button', { name: 'Print Second linen pair' }).click();
    const secondHistory = page.getByRole('dialog', { name: 'Second linen pair' }).getByRole('region', { name: 'Earlier prints' });
    await secondHistory.getByText('Second linen pair').waitFor();
    expect(await secondHistory.getByText('Linen summer trousers').count()).toBe(0);
  });
});
