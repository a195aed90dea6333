/**
 * Browser test of the fit planner's profiles and the fabrics page as Rui (demo sewist, inches):
 * a profile with several measurements and a girth below the waist, measured again later with
 * one change, both dates in the history with the change; a fabric with a hand stretch test, a
 * weight in oz/yd² and a wash test, shown as % and g/m²; both found again after a reload;
 * server refusals (staged) shown beside their fields; rename, edit and delete.
 *
 * Outside references: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959);
 * 12 oz/yd² = 406.9 g/m² (trade reference §6.8 [calc], from the exact ounce and yard);
 * stretch % = 100 × (stretched − relaxed) / relaxed (trade reference §4.2, common practice, no
 * source); shrinkage = −DC, DC = 100 × (after − before) / before (ISO 5077, via a secondary
 * summary in trade reference §4.4). The bodies and cloths are invented.
 */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { useBrowserSession } from '../support/browser.ts';

const session = useBrowserSession();
const screenshotDir = path.resolve('test-output', 'e2e');
const MM_PER_INCH = 25.4; // exact, 1959 international yard and pound agreement
const GSM_PER_OZ_PER_SQ_YD = 28.349523125 / (0.9144 * 0.9144); // exact ounce (g) / exact square yard (m²)

type GirthAtHeight = { offset: number; girth: number };
type ProfileDto = { id: string; name: string; takenOn: string; measurements: Record<string, number>; girthsAtHeights: GirthAtHeight[] };
type SetDto = { takenOn: string; note: string | null; measurements: Record<string, number>; girthsAtHeights: GirthAtHeight[] };
type FabricDto = { id: string; name: string; properties: Record<string, unknown> };

describe('when Rui keeps measurement profiles', () => {
  it('then a profile typed in inches is saved, measured again later, and the history shows both dates with the change', async () => {
    const { page } = session;
    await session.signIn(page, 'rui@loomhollow.example');
    await page.getByRole('link', { name: 'Fit planner' }).first().click();
    await page.getByRole('heading', { name: 'Fit planner', level: 1 }).waitFor();

    await page.getByRole('button', { name: 'New profile' }).click();
    await page.getByLabel('Profile name').fill('Rui, winter');
    await page.getByLabel('Waist girth', { exact: true }).fill('32 1/2');
    await page.getByLabel('Hip girth', { exact: true }).fill('37 1/2');
    await page.getByLabel('Thigh girth', { exact: true }).fill('22');
    await page.getByLabel('Body rise', { exact: true }).fill('11 1/4');
    await page.getByLabel('Inside leg length', { exact: true }).fill('34');
    // A typed unit is honoured; the field says what it read.
    await page.getByLabel('Height', { exact: true }).fill('186 cm');
    await page.getByText('Reads as 73 1/4 in').waitFor(); // 1860 / 25.4 = 73.23 → nearest 1/16 is 73 1/4
    await page.getByRole('button', { name: 'Add a height' }).click();
    await page.getByLabel('Height 1: distance from the waist').fill('2');
    await page.getByLabel('Height 1: where').selectOption('below');
    await page.getByLabel('Height 1: girth there').fill('35');
    await page.getByLabel('Taken on').fill('2026-01-10');
    await page.getByLabel('Note (optional)').fill('Measured by a friend');
    await page.screenshot({ path: path.join(screenshotDir, 'fit-planner-new-profile.png'), fullPage: true });
    await page.getByRole('button', { name: 'Save the profile' }).click();
    await page.getByRole('heading', { name: 'Rui, winter', level: 2 }).waitFor();

    const created = (await session.getJson<{ profiles: ProfileDto[] }>(page, '/api/profiles')).profiles.find((p) => p.name === 'Rui, winter');
    expect(created).toBeDefined();
    expect(created!.takenOn).toBe('2026-01-10');
    expect(created!.measurements.waistGirth).toBeCloseTo(32.5 * MM_PER_INCH, 9); // 825.5 mm
    expect(created!.measurements.hipGirth).toBeCloseTo(37.5 * MM_PER_INCH, 9);
    expect(created!.measurements.bodyRise).toBeCloseTo(11.25 * MM_PER_INCH, 9);
    expect(created!.measurements.height).toBeCloseTo(1860, 9);
    expect(created!.girthsAtHeights).toHaveLength(1);
    expect(created!.girthsAtHeights[0]!.offset).toBeCloseTo(-2 * MM_PER_INCH, 9);
    expect(created!.girthsAtHeights[0]!.girth).toBeCloseTo(35 * MM_PER_INCH, 9);

    // Measure again: a bad length is refused beside its field and nothing is sent.
    await page.getByRole('button', { name: 'Take new measurements' }).click();
    expect(await page.getByLabel('Waist girth', { exact: true }).inputValue()).toBe('32 1/2 in');
    await page.getByLabel('Waist girth', { exact: true }).fill('thirty three');
    await page.getByRole('button', { name: 'Save as a new dated set' }).click();
    await page.getByText('is not a length').waitFor();
    expect((await session.getJson<{ profile: { history: SetDto[] } }>(page, `/api/profiles/${created!.id}`)).profile.history).toHaveLength(1);

    await page.getByLabel('Waist girth', { exact: true }).fill('33');
    await page.getByLabel('Taken on').fill('2026-02-20');
    await page.getByLabel('Note (optional)').fill('After the holidays');
    // A refusal from the server lands beside the field it names (the answer is staged once).
    await page.route(
      `**/api/profiles/${created!.id}`,
      (route) =>
        route.request().method() === 'PATCH'
          ? route.fulfill({
              status: 400,
              contentType: 'application/json',
              body: JSON.stringify({ error: { code: 'invalid_input', message: 'Some fields of the request are not valid.', fields: { 'girthsAtHeights.0.girth': 'must be 3 m or less' } } }),
            })
          : route.fallback(),
      { times: 1 },
    );
    await page.getByRole('button', { name: 'Save as a new dated set' }).click();
    await page.getByText('must be 3 m or less').waitFor();
    expect(await page.getByLabel('Height 1: girth there').getAttribute('aria-invalid')).toBe('true');
    await page.getByRole('button', { name: 'Save as a new dated set' }).click();
    await page.getByText(/^Measurements of .+ saved\.$/).waitFor();

    const history = page.getByRole('table');
    await history.locator('time[datetime="2026-02-20"]').waitFor();
    await history.locator('time[datetime="2026-01-10"]').waitFor();
    const waistRow = history.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Waist girth', exact: true }) });
    const waistCells = await waistRow.getByRole('cell').allInnerTexts();
    expect(waistCells[0]).toContain('33 in');
    expect(waistCells[0]).toContain('+1/2 in');
    expect(waistCells[1]).toContain('32 1/2 in');
    const hipRow = history.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Hip girth', exact: true }) });
    expect((await hipRow.getByRole('cell').allInnerTexts())[0]).toContain('no change');
    const lowRow = history.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Girth 2 in below the waist' }) });
    expect((await lowRow.getByRole('cell').allInnerTexts())[0]).toContain('35 in');
    await page.screenshot({ path: path.join(screenshotDir, 'fit-planner-history.png'), fullPage: true });

    // The API keeps both sets, newest first; the first is unchanged and the unchanged hip is exact.
    const detail = (await session.getJson<{ profile: { takenOn: string; history: SetDto[] } }>(page, `/api/profiles/${created!.id}`)).profile;
    expect(detail.takenOn).toBe('2026-02-20');
    expect(detail.history.map((s) => s.takenOn)).toEqual(['2026-02-20', '2026-01-10']);
    expect(detail.history[0]!.measurements.waistGirth).toBeCloseTo(33 * MM_PER_INCH, 9);
    expect(detail.history[0]!.measurements.hipGirth).toBe(detail.history[1]!.measurements.hipGirth);
    expect(detail.history[0]!.measurements.height).toBe(1860);
    expect(detail.history[0]!.note).toBe('After the holidays');
    expect(detail.history[1]!.measurements.waistGirth).toBeCloseTo(32.5 * MM_PER_INCH, 9);

    // After a reload the profile and its history are found again from the list.
    await page.reload();
    await page.getByRole('heading', { name: 'Fit planner', level: 1 }).waitFor();
    await page.getByRole('button', { name: /^Rui, winter/ }).click();
    await page.getByRole('heading', { name: 'Rui, winter', level: 2 }).waitFor();
    await page.getByRole('table').locator('time[datetime="2026-01-10"]').waitFor();

    // Rename, then delete after a confirm; Rui's demo profile stays.
    await page.getByRole('button', { name: 'Rename Rui, winter' }).click();
    await page.getByLabel('New name for “Rui, winter”').fill('Rui, cold months');
    await page.getByRole('button', { name: 'Save name' }).click();
    await page.getByRole('heading', { name: 'Rui, cold months', level: 2 }).waitFor();
    await page.getByRole('button', { name: 'Delete Rui, cold months' }).click();
    await page.getByRole('alertdialog').getByText('Delete “Rui, cold months” and its 2 dated sets?').waitFor();
    await page.getByRole('button', { name: 'Delete for good' }).click();
    await page.getByRole('button', { name: /^Rui, cold months/ }).waitFor({ state: 'detached' });
    const left = (await session.getJson<{ profiles: ProfileDto[] }>(page, '/api/profiles')).profiles.map((p) => p.name);
    expect(left).toEqual(['Rui']);
  });
});

describe('when Rui records a fabric', () => {
  it('then a hand stretch test and a weight in oz/yd² show as % and g/m², are kept, and a refusal lands beside its field', async () => {
    const { page } = session;
    await session.signIn(page, 'rui@loomhollow.example');
    await page.goto(`${session.url}/fabrics`);
    await page.getByRole('heading', { name: 'Fabrics', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'New fabric' }).click();

    await page.getByLabel('Fabric name').fill('Stretch twill');
    // Hand test: 4 in relaxed, 5 1/2 in stretched → 100 × 1.5 / 4 = 37.5 %.
    await page.getByLabel('Stretch across: relaxed length').fill('4');
    await page.getByLabel('Stretch across: stretched length').fill('5 1/2');
    await page.getByText('Stretch across: 37.5 %').waitFor();
    await page.getByLabel('Weight unit').selectOption('oz');
    await page.getByLabel('Weight', { exact: true }).fill('12');
    await page.getByText(`= ${(12 * GSM_PER_OZ_PER_SQ_YD).toFixed(1)} g/m²`).waitFor(); // 406.9
    // Wash test along the warp: 20 in → 19 1/4 in = 3.75 % shrinkage; over 0.5 %, so a plan enlarges.
    await page.getByLabel('Along the warp: before washing').fill('20');
    await page.getByLabel('Along the warp: after washing').fill('19 1/4');
    await page.getByText('Along the warp: 3.8 %').waitFor();
    expect(await page.getByLabel('What a plan does about shrinkage').innerText()).toContain('Plans will enlarge the pieces');
    await page.screenshot({ path: path.join(screenshotDir, 'fabrics-new.png'), fullPage: true });

    // A refusal from the server is shown beside the field it names (the answer is staged once).
    await page.route(
      '**/api/fabrics',
      (route) =>
        route.request().method() === 'POST'
          ? route.fulfill({
              status: 400,
              contentType: 'application/json',
              body: JSON.stringify({ error: { code: 'invalid_input', message: 'Some properties of the fabric are not valid.', fields: { 'properties.weightOzPerSqYd': 'must be 60 or less' } } }),
            })
          : route.fallback(),
      { times: 1 },
    );
    await page.getByRole('button', { name: 'Save the fabric' }).click();
    await page.getByText('must be 60 or less').waitFor();
    expect(await page.getByLabel('Weight', { exact: true }).getAttribute('aria-invalid')).toBe('true');
    expect((await session.getJson<{ fabrics: FabricDto[] }>(page, '/api/fabrics')).fabrics).toHaveLength(0);

    await page.getByRole('button', { name: 'Save the fabric' }).click();
    await page.getByText('“Stretch twill” is saved.').waitFor();
    const card = page.getByRole('article').filter({ has: page.getByRole('heading', { name: 'Stretch twill', level: 3 }) });
    expect(await card.innerText()).toContain('37.5 %');
    expect(await card.innerText()).toContain('406.9 g/m² · 12.00 oz/yd²');
    await page.screenshot({ path: path.join(screenshotDir, 'fabrics.png'), fullPage: true });

    const fabric = (await session.getJson<{ fabrics: FabricDto[] }>(page, '/api/fabrics')).fabrics.find((f) => f.name === 'Stretch twill');
    expect(fabric?.properties).toMatchObject({ weightOzPerSqYd: 12 });
    const across = fabric!.properties.stretchAcross as { relaxed: number; stretched: number };
    expect(across.relaxed).toBeCloseTo(4 * MM_PER_INCH, 9);
    expect(across.stretched).toBeCloseTo(5.5 * MM_PER_INCH, 9);
    const warp = (fabric!.properties.shrinkage as { warp: { before: number; after: number } }).warp;
    expect(warp.before).toBeCloseTo(20 * MM_PER_INCH, 9);
    expect(warp.after).toBeCloseTo(19.25 * MM_PER_INCH, 9);

    // Found again after a reload; edited (recovery) and then deleted after a confirm.
    await page.reload();
    await card.waitFor();
    expect(await card.innerText()).toContain('406.9 g/m²');
    await page.getByRole('button', { name: 'Edit Stretch twill' }).click();
    await page.getByLabel('Recovery').fill('90');
    await page.getByRole('button', { name: 'Save the fabric' }).click();
    await card.getByText('90 %').waitFor();
    const edited = (await session.getJson<{ fabric: FabricDto }>(page, `/api/fabrics/${fabric!.id}`)).fabric;
    expect(edited.properties).toMatchObject({ recovery: 90, weightOzPerSqYd: 12, stretchAcross: across });
    await page.getByRole('button', { name: 'Delete Stretch twill' }).click();
    await page.getByRole('button', { name: 'Delete for good' }).click();
    await card.waitFor({ state: 'detached' });
    expect((await session.getJson<{ fabrics: FabricDto[] }>(page, '/api/fabrics')).fabrics).toHaveLength(0);
  });
});
