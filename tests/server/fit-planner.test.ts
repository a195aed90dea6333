/**
 * The fit planner over HTTP: dated measurement profiles (history kept, never rewritten), a
 * pattern's printed size table beside the one measured on its pieces, a make's fabric and fit
 * note, and the plan reading them ("sew it again" carries the note into the next plan).
 * Bodies and tables are invented (the demo's own).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MM_PER_INCH, chartFromPattern, demoPattern, parsePattern } from '../../geometry/index.ts';
import { DEMO_PASSWORD, DEMO_PATTERN_NAME, demoPrintedSizeChart } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
let ada: Client;
let rui: Client;
let mina: Client;
let anon: Client;
let libraryId: string;
beforeAll(async () => {
  t = await createTestApp();
  [ada, rui, mina, anon] = [new Client(t.app), new Client(t.app), new Client(t.app), new Client(t.app)];
  await ada.signIn('ada@loomhollow.example', DEMO_PASSWORD);
  await rui.signIn('rui@loomhollow.example', DEMO_PASSWORD);
  await mina.signIn('mina@loomhollow.example', DEMO_PASSWORD);
  const library = (await ada.get('/api/patterns?scope=library').expect(200)).body.patterns as { id: string; name: string }[];
  libraryId = library.find((p) => p.name === DEMO_PATTERN_NAME)!.id;
});
afterAll(async () => {
  await t.close();
});

interface SetDto {
  id: string;
  takenOn: string;
  measurements: Record<string, number>;
  girthsAtHeights: { offset: number; girth: number }[];
  note: string;
}
interface ProfileDto extends Omit<SetDto, 'id' | 'note'> {
  id: string;
  name: string;
  history?: SetDto[];
}

describe('dated measurement profiles', () => {
  it('when measurements change, then a new dated set is appended and the newest by date is current; an older date joins the history without becoming current', async () => {
    const created = await ada.send('post', '/api/profiles', { name: 'My brother', takenOn: '2026-05-01', measurements: { waistGirth: 800, hipGirth: 960 }, note: 'first try' });
    expect(created.status).toBe(201);
    const p0 = created.body.profile as ProfileDto;
    expect(p0).toMatchObject({ takenOn: '2026-05-01', measurements: { waistGirth: 800, hipGirth: 960 }, girthsAtHeights: [] });
    expect(p0.history).toHaveLength(1);

    const later = await ada.send('patch', `/api/profiles/${p0.id}`, { takenOn: '2026-10-02', measurements: { waistGirth: 812, hipGirth: 965 }, girthsAtHeights: [{ offset: 50.8, girth: 790 }] });
    expect(later.status).toBe(200);
    expect(later.body.profile).toMatchObject({ takenOn: '2026-10-02', measurements: { waistGirth: 812 }, girthsAtHeights: [{ offset: 50.8, girth: 790 }] });

    // a set remembered from earlier: kept in the history, the current stays the newest
    const earlier = await ada.send('patch', `/api/profiles/${p0.id}`, { takenOn: '2026-01-15', measurements: { waistGirth: 790 } });
    expect(earlier.status).toBe(200);
    const p = (await ada.get(`/api/profiles/${p0.id}`).expect(200)).body.profile as ProfileDto;
    expect(p.takenOn).toBe('2026-10-02');
    expect(p.measurements.waistGirth).toBe(812);
    expect(p.history!.map((s) => s.takenOn)).toEqual(['2026-10-02', '2026-05-01', '2026-01-15']);
    expect(p.history![1]).toMatchObject({ measurements: { waistGirth: 800, hipGirth: 960 }, note: 'first try' });
    // girths at heights alone: the measurements are carried over from the current set
    const heights = await ada.send('patch', `/api/profiles/${p0.id}`, { takenOn: '2026-10-03', girthsAtHeights: [{ offset: -40, girth: 900 }] });
    expect(heights.body.profile).toMatchObject({ takenOn: '2026-10-03', measurements: { waistGirth: 812, hipGirth: 965 }, girthsAtHeights: [{ offset: -40, girth: 900 }] });
    // a rename appends nothing
    const renamed = await ada.send('patch', `/api/profiles/${p0.id}`, { name: 'Brother' });
    expect(renamed.body.profile.history).toHaveLength(4);
    // lists carry the current set, not the history
    const list = (await ada.get('/api/profiles').expect(200)).body.profiles as ProfileDto[];
    expect(list.find((x) => x.id === p0.id)).toMatchObject({ name: 'Brother', takenOn: '2026-10-03' });
    expect(list.find((x) => x.id === p0.id)!.history).toBeUndefined();
  });

  it('when two saves of one profile arrive at the same moment, then both sets are appended and the newer one carries the other change too', async () => {
    const p = (await ada.send('post', '/api/profiles', { name: 'Saved twice', takenOn: '2026-03-01', measurements: { waistGirth: 760, hipGirth: 940 } })).body.profile as ProfileDto;
    for (let round = 1; round <= 20; round++) {
      const takenOn = `2026-04-${String(round).padStart(2, '0')}`; // a later date each round: the newest set is this round's
      // one save changes only the girths at heights, the other only the measurements: each copies
      // what it does not send from the current set, which the row lock makes the other's
      const [heights, girths] = await Promise.all([
        ada.send('patch', `/api/profiles/${p.id}`, { takenOn, girthsAtHeights: [{ offset: 40, girth: 800 + round }] }),
        ada.send('patch', `/api/profiles/${p.id}`, { takenOn, measurements: { waistGirth: 760 + round, hipGirth: 940 + round } }),
      ]);
      expect([heights.status, girths.status]).toEqual([200, 200]);
      const now = (await ada.get(`/api/profiles/${p.id}`).expect(200)).body.profile as ProfileDto;
      expect(now.history).toHaveLength(1 + 2 * round);
      expect(now).toMatchObject({ takenOn, measurements: { waistGirth: 760 + round, hipGirth: 940 + round }, girthsAtHeights: [{ offset: 40, girth: 800 + round }] });
    }
  });

  it('when someone tries to rewrite history in the database, then it refuses (append-only)', async () => {
    await expect(t.database.db.query(`UPDATE profile_measurement_sets SET note = 'changed'`)).rejects.toThrow(/append-only/);
  });

  it('when the input is wrong, then 400 names each field and nothing is stored', async () => {
    const p = (await ada.send('post', '/api/profiles', { name: 'Checks', measurements: { hipGirth: 990 } })).body.profile as ProfileDto;
    const bad = await ada.send('patch', `/api/profiles/${p.id}`, {
      takenOn: '2999-01-01',
      measurements: { hipGirth: -3 },
      girthsAtHeights: [
        { offset: 0, girth: 700 },
        { offset: 30, girth: 700 },
        { offset: 30, girth: 710 },
      ],
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['takenOn', 'measurements.hipGirth', 'girthsAtHeights.0.offset', 'girthsAtHeights.2.offset']));
    expect((await ada.send('patch', `/api/profiles/${p.id}`, { takenOn: '2026-02-30', measurements: {} })).body.error.fields).toHaveProperty('takenOn');
    // a date without measurements belongs to nothing
    expect((await ada.send('patch', `/api/profiles/${p.id}`, { takenOn: '2026-02-03' })).status).toBe(400);
    expect(((await ada.get(`/api/profiles/${p.id}`)).body.profile as ProfileDto).history).toHaveLength(1);
  });

  it('when someone else asks, then profiles and their history stay private', async () => {
    const p = (await ada.send('post', '/api/profiles', { name: 'Private', measurements: { hipGirth: 990 } })).body.profile as ProfileDto;
    expect((await rui.get(`/api/profiles/${p.id}`)).status).toBe(403);
    expect((await rui.send('patch', `/api/profiles/${p.id}`, { measurements: { hipGirth: 1 } })).status).toBe(403);
    expect((await anon.get(`/api/profiles/${p.id}`)).status).toBe(401);
    expect(((await rui.get('/api/profiles')).body.profiles as ProfileDto[]).some((x) => x.id === p.id)).toBe(false);
  });

  it('when the demo is seeded, then Ada has two dated sets and the girths where a higher or lower waistband sits', async () => {
    const list = (await ada.get('/api/profiles').expect(200)).body.profiles as ProfileDto[];
    const mine = (await ada.get(`/api/profiles/${list.find((p) => p.name === 'Ada')!.id}`).expect(200)).body.profile as ProfileDto;
    expect(mine.history!.map((s) => s.takenOn)).toEqual(['2026-11-20', '2026-03-14']);
    expect(mine.girthsAtHeights.length).toBeGreaterThan(0);
  });
});

interface Chart {
  source: string;
  sizes: { size: string; garment: Record<string, number>; body?: Record<string, number> }[];
}

describe("a pattern's size tables", () => {
  it('when anyone who can see the pattern asks, then they get the printed table and the one measured on the pieces (girth = piece widths × 2, less seam allowances)', async () => {
    const res = await ada.get(`/api/patterns/${libraryId}/size-chart`).expect(200);
    const { printed, measured } = res.body as { printed: Chart; measured: Chart };
    expect(printed.source).toBe('printed');
    expect(measured.source).toBe('geometry');
    // the measured table is the engine's own measurement of the same pieces
    expect(measured.sizes).toEqual(chartFromPattern(parsePattern(demoPattern())).sizes);
    // the demo's printed table is that, rounded to 5 mm as a printed table would be
    for (const [i, s] of printed.sizes.entries()) expect(Math.abs(s.garment.hip! - measured.sizes[i]!.garment.hip!)).toBeLessThanOrEqual(2.5);
    expect((await ada.get('/api/patterns?scope=library')).body.patterns.find((p: { id: string }) => p.id === libraryId).hasSizeChart).toBe(true);
    expect((await ada.get(`/api/patterns/${libraryId}/size-chart?seamAllowance=-1`)).status).toBe(400);
    expect((await anon.get(`/api/patterns/${libraryId}/size-chart`)).status).toBe(401);
  });

  it('when the owner types a table, then it is kept; a bad one is 400 naming the cell; others may not change it', async () => {
    const chart = { sizes: [{ size: '8', garment: { hip: 1030, waist: 760 } }, { size: '10', garment: { hip: 1080, waist: 810 }, body: { hipGirth: 1030 } }] };
    expect((await ada.send('put', `/api/patterns/${libraryId}/size-chart`, { chart })).status).toBe(403);
    const bad = await mina.send('put', `/api/patterns/${libraryId}/size-chart`, { chart: { sizes: [{ size: '8', garment: { hip: -4, elbow: 3 } }, { size: '8', garment: {} }] } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['chart.sizes.0.garment.hip', 'chart.sizes.1.size']));
    // the demo table is still there
    expect(((await mina.get(`/api/patterns/${libraryId}/size-chart`)).body.printed as Chart).sizes.length).toBeGreaterThan(2);

    // the owner (Mina published it) replaces it whole, clears it, and puts the demo's back
    const put = await mina.send('put', `/api/patterns/${libraryId}/size-chart`, { chart });
    expect(put.status).toBe(200);
    expect(put.body.printed).toMatchObject({ source: 'printed', sizes: chart.sizes });
    expect(((await ada.get(`/api/patterns/${libraryId}/size-chart`)).body.printed as Chart).sizes.map((x) => x.size)).toEqual(['8', '10']);
    expect((await mina.send('delete', `/api/patterns/${libraryId}/size-chart`)).status).toBe(204);
    expect((await ada.get(`/api/patterns/${libraryId}/size-chart`)).body.printed).toBeNull();
    expect((await mina.get(`/api/patterns/${libraryId}`)).body.pattern.hasSizeChart).toBe(false);
    // sizes written differently from the pattern's are kept under its labels; an unknown one as typed
    const loose = await mina.send('put', `/api/patterns/${libraryId}/size-chart`, { chart: { sizes: [{ size: 'Size 08', garment: { hip: 1030 } }, { size: 'SIZE: 10', garment: { hip: 1080 } }, { size: 'XXL', garment: { hip: 1300 } }] } });
    expect(loose.status).toBe(200);
    expect((loose.body.printed as Chart).sizes.map((x) => x.size)).toEqual(['8', '10', 'XXL']);
    expect(((await ada.get(`/api/patterns/${libraryId}/size-chart`)).body.printed as Chart).sizes.map((x) => [x.size, x.garment.hip])).toEqual([['8', 1030], ['10', 1080], ['XXL', 1300]]);
    expect((await mina.send('put', `/api/patterns/${libraryId}/size-chart`, { chart: demoPrintedSizeChart() })).status).toBe(200);
  });
});

describe("a make's fabric, fit note and plan", () => {
  async function adaMake(): Promise<{ id: string; name: string; fabricId: string | null; fitNote: unknown; sourceMakeId: string | null }> {
    const list = (await ada.get('/api/makes').expect(200)).body.makes as { id: string; name: string }[];
    return (await ada.get(`/api/makes/${list.find((m) => m.name === 'Everyday jeans')!.id}`).expect(200)).body.make;
  }

  it('when the demo is seeded, then Ada\'s jeans have her denim and a fit note', async () => {
    const make = await adaMake();
    expect(make.fabricId).not.toBeNull();
    expect(make.fitNote).toMatchObject({ levels: { waist: { verdict: 'tight', amount: 12.7 } }, nextTime: expect.stringMatching(/shorter/) });
  });

  it('when a fit note is written, then it is kept whole and validated; only the owner may', async () => {
    const make = (await ada.send('post', '/api/makes', { name: 'Note test', patternId: libraryId })).body.make as { id: string };
    const note = { levels: { hip: { verdict: 'tight', amount: 10 }, length: { verdict: 'short', amount: 25.4 } }, nextTime: 'More room at the seat.' };
    const put = await ada.send('put', `/api/makes/${make.id}/fit-note`, note);
    expect(put.status).toBe(200);
    expect(put.body.fitNote).toMatchObject(note);
    const bad = await ada.send('put', `/api/makes/${make.id}/fit-note`, { levels: { hip: { verdict: 'snug' }, rise: { verdict: 'loose', amount: 5 } } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['levels.hip.verdict', 'levels.rise.verdict']));
    expect((await rui.send('put', `/api/makes/${make.id}/fit-note`, note)).status).toBe(403);
    expect((await rui.send('delete', `/api/makes/${make.id}/fit-note`)).status).toBe(403);
    expect(((await ada.get(`/api/makes/${make.id}`)).body.make as { fitNote: unknown }).fitNote).toMatchObject(note);
    expect((await ada.send('delete', `/api/makes/${make.id}/fit-note`)).status).toBe(204);
    expect(((await ada.get(`/api/makes/${make.id}`)).body.make as { fitNote: unknown }).fitNote).toBeNull();
    // sewn again before a note was written: the plan names the make, with no note yet
    const again = (await ada.send('post', `/api/makes/${make.id}/duplicate`, {})).body.make as { id: string };
    await ada.send('patch', `/api/makes/${again.id}`, { profileId: ((await ada.get('/api/profiles')).body.profiles as { id: string }[])[0]!.id });
    const plan = await ada.send('post', `/api/makes/${again.id}/plan`, { chart: 'measured' });
    expect(plan.status).toBe(200);
    expect(plan.body.previous).toEqual({ makeId: make.id, makeName: 'Note test', fitNote: null });
    expect(plan.body.plan.fromPrevious).toEqual([]);
  });

  it('when a make names a fabric, then it must be the owner\'s', async () => {
    const make = (await rui.send('post', '/api/makes', { name: 'Fabric test', patternId: libraryId })).body.make as { id: string };
    const adaFabricId = (await adaMake()).fabricId!;
    expect((await rui.send('patch', `/api/makes/${make.id}`, { fabricId: adaFabricId })).status).toBe(403);
    expect((await rui.send('patch', `/api/makes/${make.id}`, { fabricId: 'not-an-id' })).status).toBe(400);
    const own = (await rui.send('post', '/api/fabrics', { name: 'Linen', properties: { weightGsm: 180 } })).body.fabric as { id: string };
    const ok = await rui.send('patch', `/api/makes/${make.id}`, { fabricId: own.id });
    expect(ok.body.make.fabricId).toBe(own.id);
  });

  it('when Ada plans her jeans, then the printed table is used by default, the measured one on request, her denim is read, and the garment is measured before and after', async () => {
    const make = await adaMake();
    const printed = await ada.send('post', `/api/makes/${make.id}/plan`, {});
    expect(printed.status).toBe(200);
    const plan = printed.body.plan as { chart: Chart; fabric?: { weightGsm?: number }; garment: { before: { label: string; measures: Record<string, number> } | null; after: { measures: Record<string, number> } | null }; levels: { level: string; garmentAtSize: number }[] };
    expect(plan.chart.source).toBe('printed');
    // 12 oz/yd² × 33.906 = 406.9 g/m² (trade reference §4.5)
    expect(plan.fabric?.weightGsm).toBeCloseTo(12 * 33.906, 0);
    expect(plan.garment.before?.label).toBe('your alterations now'); // her list blends 0/4/8/10
    expect(plan.garment.after?.measures.hip).toBeGreaterThan(0);
    const measured = await ada.send('post', `/api/makes/${make.id}/plan`, { chart: 'measured' });
    expect((measured.body.plan as { chart: Chart }).chart.source).toBe('geometry');
    expect(printed.body.previous).toBeNull(); // her first pair repeats no earlier make
  });

  it('when she sews it again, then the new plan reads the note: ½ in more ease at the waist, less at the calf, legs ½ in shorter — and says so', async () => {
    const make = await adaMake();
    const before = (await ada.send('post', `/api/makes/${make.id}/plan`, { chart: 'measured' })).body.plan as { levels: { level: string; ease: number }[]; ops: { op: string; amount?: number }[] };
    const again = (await ada.send('post', `/api/makes/${make.id}/duplicate`, { name: 'Everyday jeans, second pair' })).body.make as { id: string; fabricId: string | null };
    expect(again.fabricId).toBe(make.fabricId);
    const res = await ada.send('post', `/api/makes/${again.id}/plan`, { chart: 'measured' });
    expect(res.status).toBe(200);
    expect(res.body.previous).toMatchObject({ makeId: make.id, makeName: 'Everyday jeans', fitNote: { nextTime: expect.any(String) } });
    const plan = res.body.plan as { levels: { level: string; ease: number }[]; ops: { op: string; amount?: number }[]; fromPrevious: string[]; cautions: string[] };
    const ease = (p: { levels: { level: string; ease: number }[] }, l: string) => p.levels.find((x) => x.level === l)!.ease;
    expect(ease(plan, 'waist') - ease(before, 'waist')).toBeCloseTo(MM_PER_INCH / 2, 9);
    expect(ease(plan, 'calf') - ease(before, 'calf')).toBeCloseTo(-20, 9);
    expect(ease(plan, 'hip')).toBe(ease(before, 'hip'));
    // the legs aim ½ in shorter (the blend also moved, which changes the inseam it starts from;
    // the exact amount is checked in tests/geometry/fit-notes.test.ts)
    const legs = (p: { ops: { op: string; amount?: number }[] }) => p.ops.filter((o) => o.op === 'lengthen').reduce((s, o) => s + o.amount!, 0);
    expect(legs(plan)).toBeLessThan(legs(before));
    expect(plan.fromPrevious.join('\n')).toMatch(/Leg length: “Everyday jeans” was .* too long/);
    expect(plan.fromPrevious.join('\n')).toMatch(/Waist: “Everyday jeans” was .* too tight/);
    expect(plan.cautions.join('\n')).toMatch(/Hem half an inch shorter/);
    // a printed table the pattern does not have cannot be asked for
    const rmake = (await rui.send('post', '/api/makes', { name: 'No table', patternId: libraryId })).body.make as { id: string };
    expect((await rui.send('post', `/api/makes/${rmake.id}/plan`, { chart: 'printed' })).status).toBe(409); // no profile yet
  });
});
