/**
 * Makes over HTTP: create, list, rename, duplicate ("sew it again"), archive; revisions are
 * append-only and a save from a stale revision gets 409. Also profiles (private to their owner),
 * the user's units, and printing a make.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type AlterationEntry, demoPattern, edgeLength, parsePattern, replayAlterations } from '../../geometry/index.ts';
import { DEMO_ADA_ALTERATIONS, DEMO_PASSWORD, DEMO_PATTERN_NAME } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
let ada: Client;
let rui: Client;
let anon: Client;
let libraryId: string;
beforeAll(async () => {
  t = await createTestApp();
  [ada, rui, anon] = [new Client(t.app), new Client(t.app), new Client(t.app)];
  await ada.signIn('ada@loomhollow.example', DEMO_PASSWORD);
  await rui.signIn('rui@loomhollow.example', DEMO_PASSWORD);
  const library = (await ada.get('/api/patterns?scope=library').expect(200)).body.patterns as { id: string; name: string }[];
  libraryId = library.find((p) => p.name === DEMO_PATTERN_NAME)!.id;
});
afterAll(async () => {
  await t.close();
});

interface MakeDto {
  id: string;
  name: string;
  latestRevision: number;
  alterationCount: number;
  archived: boolean;
  sourceMakeId: string | null;
  pattern: { id: string; name: string };
  profile: { id: string; name: string } | null;
  revision: { number: number; alterations: AlterationEntry[]; summary: string; author: { displayName: string } | null };
}

async function newMake(c: Client, name = 'Test make'): Promise<MakeDto> {
  const res = await c.send('post', '/api/makes', { name, patternId: libraryId, fabricNote: 'stretch denim' });
  expect(res.status).toBe(201);
  return res.body.make as MakeDto;
}

const shorten: AlterationEntry = { id: 'a1', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -76.2 } };
const rise: AlterationEntry = { id: 'a2', enabled: true, op: { op: 'rise', line: 'rise', amount: 50.8 } };

describe('makes', () => {
  it('when a sewist starts a make from the shared library, then it has revision 1 with no alterations', async () => {
    const make = await newMake(ada);
    expect(make).toMatchObject({ name: 'Test make', latestRevision: 1, alterationCount: 0, archived: false, pattern: { id: libraryId, name: DEMO_PATTERN_NAME } });
    expect(make.revision).toMatchObject({ number: 1, alterations: [], author: { displayName: 'Ada Brightwater' } });
  });

  it('when the demo is seeded, then Ada has her make with the blend, shortening and rise', async () => {
    const list = (await ada.get('/api/makes').expect(200)).body.makes as MakeDto[];
    const seeded = list.find((m) => m.name === 'Everyday jeans')!;
    expect(seeded).toMatchObject({ latestRevision: 2, alterationCount: 3, profile: { name: 'Ada' } });
    const detail = (await ada.get(`/api/makes/${seeded.id}`).expect(200)).body.make as MakeDto;
    expect(detail.revision.alterations).toEqual(DEMO_ADA_ALTERATIONS);
  });

  it('when saving on the newest revision, then a new revision is appended; the history keeps every one', async () => {
    const make = await newMake(ada);
    const r2 = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [shorten], summary: 'Shortened the legs 3 in' });
    expect(r2.status).toBe(201);
    expect(r2.body.revision).toMatchObject({ number: 2, alterationCount: 1, summary: 'Shortened the legs 3 in', author: { displayName: 'Ada Brightwater' } });
    const r3 = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 2, alterations: [shorten, rise], summary: 'Added 2 in of rise' });
    expect(r3.status).toBe(201);
    const history = (await ada.get(`/api/makes/${make.id}/revisions`).expect(200)).body.revisions as { number: number; alterationCount: number }[];
    expect(history.map((r) => [r.number, r.alterationCount])).toEqual([
      [3, 2],
      [2, 1],
      [1, 0],
    ]);
    const old = (await ada.get(`/api/makes/${make.id}/revisions/2`).expect(200)).body.revision;
    expect(old.alterations).toEqual([shorten]);
    // Restoring an earlier revision appends a new one that says so.
    const restored = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 3, alterations: old.alterations, summary: 'Restored revision 2', restoredFrom: 2 });
    expect(restored.body.revision).toMatchObject({ number: 4, restoredFrom: 2 });
    expect((await ada.get(`/api/makes/${make.id}/revisions/9`)).status).toBe(404);
    expect((await ada.get(`/api/makes/${make.id}/revisions/zero`)).status).toBe(400);
  });

  it('when two people save from the same revision, then the second gets 409 stale_revision and nothing of the first is lost', async () => {
    const make = await newMake(ada);
    const second = new Client(t.app);
    await second.signIn('ada@loomhollow.example', DEMO_PASSWORD);
    const first = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [shorten], summary: 'first' });
    expect(first.status).toBe(201);
    const stale = await second.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [rise], summary: 'second' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_revision');
    expect(stale.body.error.message).toMatch(/newest is 2/);
    const now = (await ada.get(`/api/makes/${make.id}`).expect(200)).body.make as MakeDto;
    expect(now.revision.alterations).toEqual([shorten]);
    // "apply my change on top": the same change based on the newest revision is accepted.
    const onTop = await second.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 2, alterations: [shorten, rise], summary: 'second, on top' });
    expect(onTop.status).toBe(201);
  });

  it('when many saves race from one revision, then exactly one wins', async () => {
    const make = await newMake(ada);
    const results = await Promise.all(
      Array.from({ length: 6 }, (_, i) => ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [{ ...shorten, id: `r${i}` }], summary: `racer ${i}` })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409]);
    expect(((await ada.get(`/api/makes/${make.id}/revisions`).expect(200)).body.revisions as unknown[]).length).toBe(2);
  });

  it('when the alterations are malformed or refused by the engine, then 400/422 names the entry and nothing is saved', async () => {
    const make = await newMake(ada);
    const bad = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [{ id: 'x', op: { op: 'lengthen', line: 'lower leg' } }], summary: 'x' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).join()).toMatch(/alterations\.0/);
    const dup = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [shorten, shorten], summary: 'x' });
    expect(dup.status).toBe(400);
    const refused = await ada.send('post', `/api/makes/${make.id}/revisions`, {
      baseRevision: 1,
      alterations: [shorten, { id: 'nope', enabled: true, op: { op: 'lengthen', line: 'no such line', amount: 10 } }],
      summary: 'x',
    });
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields['alterations.1']).toMatch(/no such line/);
    // a switched-off entry is not replayed, so it may be anything the schema allows
    const off = await ada.send('post', `/api/makes/${make.id}/revisions`, {
      baseRevision: 1,
      alterations: [{ id: 'off', enabled: false, op: { op: 'lengthen', line: 'no such line', amount: 10 } }],
      summary: 'kept for later',
    });
    expect(off.status).toBe(201);
    expect((await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 2, alterations: [], summary: '' })).status).toBe(400);
  });

  it('when renaming, changing the fabric note and archiving, then the list follows; an archived make takes no saves', async () => {
    const make = await newMake(ada, 'Rename me');
    const renamed = await ada.send('patch', `/api/makes/${make.id}`, { name: 'Renamed', fabricNote: 'linen' });
    expect(renamed.body.make).toMatchObject({ name: 'Renamed', fabricNote: 'linen' });
    await ada.send('patch', `/api/makes/${make.id}`, { archived: true });
    const active = (await ada.get('/api/makes').expect(200)).body.makes as MakeDto[];
    expect(active.some((m) => m.id === make.id)).toBe(false);
    const archived = (await ada.get('/api/makes?archived=true').expect(200)).body.makes as MakeDto[];
    expect(archived.find((m) => m.id === make.id)?.archived).toBe(true);
    const save = await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [], summary: 'x' });
    expect(save.status).toBe(409);
    await ada.send('patch', `/api/makes/${make.id}`, { archived: false });
    expect(((await ada.get('/api/makes').expect(200)).body.makes as MakeDto[]).some((m) => m.id === make.id)).toBe(true);
    expect((await ada.send('patch', `/api/makes/${make.id}`, {})).status).toBe(400);
    expect((await ada.send('patch', `/api/makes/${make.id}`, { name: '' })).body.error.fields.name).toBeDefined();
  });

  it('when sewing it again, then the new make starts from the last make\'s newest alterations', async () => {
    const make = await newMake(ada, 'First pair');
    await ada.send('post', `/api/makes/${make.id}/revisions`, { baseRevision: 1, alterations: [shorten, rise], summary: 'fitted' });
    const again = await ada.send('post', `/api/makes/${make.id}/duplicate`, {});
    expect(again.status).toBe(201);
    expect(again.body.make).toMatchObject({ name: 'First pair (again)', sourceMakeId: make.id, latestRevision: 1, fabricNote: 'stretch denim' });
    expect(again.body.make.revision.alterations).toEqual([shorten, rise]);
    expect(again.body.make.revision.summary).toMatch(/First pair.*revision 2/);
  });

  it('when someone else reaches for a make, then 403 on every route; a missing one 404; signed out 401', async () => {
    const make = await newMake(ada);
    const routes: [string, 'get' | 'post' | 'patch', unknown?][] = [
      [`/api/makes/${make.id}`, 'get'],
      [`/api/makes/${make.id}`, 'patch', { name: 'x' }],
      [`/api/makes/${make.id}/duplicate`, 'post', {}],
      [`/api/makes/${make.id}/revisions`, 'get'],
      [`/api/makes/${make.id}/revisions`, 'post', { baseRevision: 1, alterations: [], summary: 'x' }],
      [`/api/makes/${make.id}/revisions/1`, 'get'],
    ];
    for (const [url, method, body] of routes) {
      const res = method === 'get' ? await rui.get(url) : await rui.send(method, url, body);
      expect(res.status, `${method} ${url}`).toBe(403);
      const out = method === 'get' ? await anon.get(url) : await anon.send(method, url, body);
      expect(out.status, `${method} ${url} signed out`).toBe(401);
    }
    expect(((await rui.get('/api/makes').expect(200)).body.makes as MakeDto[]).some((m) => m.id === make.id)).toBe(false);
    expect((await ada.get('/api/makes/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });

  it('when creating with a bad or someone else\'s pattern or profile, then 400/403', async () => {
    expect((await ada.send('post', '/api/makes', { name: 'x' })).body.error.fields.patternId).toBeDefined();
    expect((await ada.send('post', '/api/makes', { name: 'x', patternId: '00000000-0000-4000-8000-000000000000' })).status).toBe(400);
    const ruis = await rui.upload('/api/patterns', { name: 'p.json', content: JSON.stringify(demoPattern()) });
    expect(ruis.status).toBe(201);
    expect((await ada.send('post', '/api/makes', { name: 'x', patternId: ruis.body.pattern.id })).status).toBe(403);
    const ruiProfile = ((await rui.get('/api/profiles').expect(200)).body.profiles as { id: string }[])[0]!;
    expect((await ada.send('post', '/api/makes', { name: 'x', patternId: libraryId, profileId: ruiProfile.id })).status).toBe(403);
  });

  it('when a make\'s pattern is later withdrawn from the library, then the make\'s owner can still open its pattern, others cannot', async () => {
    const mina = new Client(t.app);
    await mina.signIn('mina@loomhollow.example', DEMO_PASSWORD);
    const up = await mina.upload('/api/patterns', { name: 'class.json', content: JSON.stringify(demoPattern()) });
    await mina.send('patch', `/api/patterns/${up.body.pattern.id}`, { published: true });
    expect((await rui.send('post', '/api/makes', { name: 'Class pair', patternId: up.body.pattern.id })).status).toBe(201);
    await mina.send('patch', `/api/patterns/${up.body.pattern.id}`, { published: false });
    expect((await rui.get(`/api/patterns/${up.body.pattern.id}`)).status).toBe(200);
    expect((await ada.get(`/api/patterns/${up.body.pattern.id}`)).status).toBe(403);
  });
});

describe('printing a make', () => {
  it('when printing a make, then the server replays its newest revision: the printed pattern has the shortened inseam', async () => {
    const list = (await ada.get('/api/makes').expect(200)).body.makes as MakeDto[];
    const seeded = list.find((m) => m.name === 'Everyday jeans')!;
    const res = await ada.send('post', '/api/prints', { makeId: seeded.id, options: { format: 'svg' } });
    expect(res.status).toBe(202);
    expect(res.body.print.title).toBe('Everyday jeans');
    const stored = await t.database.db.query('SELECT pattern FROM print_jobs WHERE id = $1', [res.body.print.id]);
    const printed = parsePattern(stored[0].pattern);
    const expected = replayAlterations(demoPattern(), DEMO_ADA_ALTERATIONS).pattern;
    const front = (p: typeof printed) => p.pieces.find((x) => x.name === 'front')!;
    expect(edgeLength(front(printed), front(printed).outlines[0]!.size, 'inseam')).toBeCloseTo(edgeLength(front(expected), front(expected).outlines[0]!.size, 'inseam')!, 6);
    expect((await rui.send('post', '/api/prints', { makeId: seeded.id, options: {} })).status).toBe(403);
    expect((await ada.send('post', '/api/prints', { makeId: 'nope', options: {} })).status).toBe(400);
  });

  it('when a sewist has printed two makes and a bare pattern, then each make lists only its own prints, newest first', async () => {
    const first = await newMake(ada, 'Print list one');
    const second = await newMake(ada, 'Print list two');
    const queue = async (body: object) => {
      const res = await ada.send('post', '/api/prints', body);
      expect(res.status).toBe(202);
      return res.body.print as { id: string; makeId: string | null };
    };
    const a1 = await queue({ makeId: first.id, options: { format: 'svg' } });
    const b1 = await queue({ makeId: second.id, options: { format: 'svg' } });
    const a2 = await queue({ makeId: first.id, options: { format: 'svg' } });
    const bare = await queue({ pattern: demoPattern(), options: { format: 'svg', size: '8' } });
    expect([a1.makeId, b1.makeId, bare.makeId]).toEqual([first.id, second.id, null]);

    const ids = async (c: Client, query: string) => ((await c.get(`/api/prints${query}`).expect(200)).body.prints as { id: string }[]).map((p) => p.id);
    expect(await ids(ada, `?makeId=${first.id}`)).toEqual([a2.id, a1.id]);
    expect(await ids(ada, `?makeId=${second.id}`)).toEqual([b1.id]);
    const all = await ids(ada, '');
    for (const id of [a1.id, a2.id, b1.id, bare.id]) expect(all).toContain(id);
    // another user's list never shows them, even asked by the make's id
    expect(await ids(rui, `?makeId=${first.id}`)).toEqual([]);
    const bad = await ada.get('/api/prints?makeId=nope');
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatchObject({ code: 'invalid_input', fields: { makeId: 'Not a valid make id.' } });
  });
});

describe('profiles and units', () => {
  it('when a sewist keeps profiles, then they are private and validated', async () => {
    const created = await ada.send('post', '/api/profiles', { name: 'My sister', measurements: { waistGirth: 700, hipGirth: 980 } });
    expect(created.status).toBe(201);
    const id = created.body.profile.id as string;
    expect((await rui.get(`/api/profiles/${id}`)).status).toBe(403);
    expect((await rui.send('patch', `/api/profiles/${id}`, { name: 'x' })).status).toBe(403);
    expect((await rui.send('delete', `/api/profiles/${id}`)).status).toBe(403);
    const bad = await ada.send('post', '/api/profiles', { name: '', measurements: { waistGirth: -5, shoeSize: 40 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.name).toBeDefined();
    const updated = await ada.send('patch', `/api/profiles/${id}`, { measurements: { waistGirth: 710 } });
    expect(updated.body.profile.measurements).toEqual({ waistGirth: 710 });
    expect((await ada.send('delete', `/api/profiles/${id}`)).status).toBe(204);
    expect((await ada.get(`/api/profiles/${id}`)).status).toBe(404);
  });

  it('when a user picks centimetres, then the account says so; anything else is refused', async () => {
    const me = await ada.get('/api/auth/me').expect(200);
    expect(me.body.user.units).toBe('in');
    const set = await ada.send('patch', '/api/account', { units: 'cm' });
    expect(set.status).toBe(200);
    expect(set.body.user.units).toBe('cm');
    expect((await ada.send('patch', '/api/account', { units: 'furlong' })).status).toBe(400);
    await ada.send('patch', '/api/account', { units: 'in' });
  });
});

describe('the fit plan of a make', () => {
  it('when Ada asks for the plan of her make, then it has a size per level and alterations the engine accepts as a revision', async () => {
    const seeded = ((await ada.get('/api/makes').expect(200)).body.makes as MakeDto[]).find((m) => m.name === 'Everyday jeans')!;
    const res = await ada.send('post', `/api/makes/${seeded.id}/plan`, { fabric: { stretchAcross: 2, weightOzPerSqYd: 12 }, options: { fit: 'regular' } });
    expect(res.status).toBe(200);
    const plan = res.body.plan as { levels: { level: string; size: string; reason: string }[]; ops: { op: string }[] };
    expect(plan.levels.map((l) => l.level)).toEqual(expect.arrayContaining(['waist', 'hip', 'thigh']));
    for (const l of plan.levels) expect(l.reason.length).toBeGreaterThan(10);
    expect(plan.ops.some((o) => o.op === 'blend')).toBe(true);
    // Accepting it: the plan's operations saved as the make's list (the server replays them).
    const detail = (await ada.get(`/api/makes/${seeded.id}`).expect(200)).body.make as MakeDto;
    const accepted = await ada.send('post', `/api/makes/${seeded.id}/revisions`, {
      baseRevision: detail.latestRevision,
      alterations: plan.ops.map((op, i) => ({ id: `plan-${i}`, enabled: true, op })),
      summary: 'Accepted the fit plan',
    });
    expect(accepted.status).toBe(201);
  });

  it('when the make has no profile, the options are wrong, or it is someone else\'s, then 409 / 400 / 403', async () => {
    const make = await newMake(ada, 'No profile');
    const none = await ada.send('post', `/api/makes/${make.id}/plan`, {});
    expect(none.status).toBe(409);
    expect(none.body.error.message).toMatch(/no measurement profile/);
    const seeded = ((await ada.get('/api/makes').expect(200)).body.makes as MakeDto[]).find((m) => m.name === 'Everyday jeans')!;
    const bad = await ada.send('post', `/api/makes/${seeded.id}/plan`, { options: { fit: 'baggy' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid_input');
    expect((await ada.send('post', `/api/makes/${seeded.id}/plan`, { colour: 'blue' })).status).toBe(400);
    expect((await rui.send('post', `/api/makes/${seeded.id}/plan`, {})).status).toBe(403);
    expect((await anon.send('post', `/api/makes/${seeded.id}/plan`, {})).status).toBe(401);
  });
});

describe('fabrics', () => {
  it('when a sewist keeps a fabric, then it is private, validated by the planner\'s rules, and a plan can use it', async () => {
    const created = await ada.send('post', '/api/fabrics', {
      name: 'Stretch denim',
      properties: { stretchAcross: 18, weightOzPerSqYd: 11, width: 1500, shrinkage: { warp: 3, weft: 2 } },
    });
    expect(created.status).toBe(201);
    const id = created.body.fabric.id as string;
    expect(created.headers.location).toBe(`/api/fabrics/${id}`);
    expect(((await ada.get('/api/fabrics').expect(200)).body.fabrics as { id: string }[]).map((f) => f.id)).toContain(id);
    expect((await rui.get(`/api/fabrics/${id}`)).status).toBe(403);
    expect((await rui.send('patch', `/api/fabrics/${id}`, { name: 'x' })).status).toBe(403);
    expect((await rui.send('delete', `/api/fabrics/${id}`)).status).toBe(403);
    expect((await anon.get('/api/fabrics')).status).toBe(401);

    // 1 oz/yd² = 33.906 g/m² (exact definitions of the ounce and the yard): 11 oz/yd² is 373 g/m², not 200.
    const mismatch = await ada.send('post', '/api/fabrics', { name: 'x', properties: { weightGsm: 200, weightOzPerSqYd: 11 } });
    expect(mismatch.status).toBe(400);
    expect(Object.keys(mismatch.body.error.fields).join()).toMatch(/properties\.weightOzPerSqYd/);
    expect((await ada.send('post', '/api/fabrics', { name: 'x', properties: { stretchAcross: 'lots' } })).status).toBe(400);
    expect((await ada.send('post', '/api/fabrics', { properties: {} })).body.error.fields.name).toBeDefined();

    const seeded = ((await ada.get('/api/makes').expect(200)).body.makes as MakeDto[]).find((m) => m.name === 'Everyday jeans')!;
    const plan = await ada.send('post', `/api/makes/${seeded.id}/plan`, { fabricId: id, options: { fit: 'close' } });
    expect(plan.status).toBe(200);
    // The wash test's shrinkage is compensated: the plan ends with a shrinkage operation.
    expect((plan.body.plan.ops as { op: string }[]).some((o) => o.op === 'shrinkage')).toBe(true);
    const ruis = await rui.send('post', '/api/fabrics', { name: 'Linen', properties: {} });
    expect((await ada.send('post', `/api/makes/${seeded.id}/plan`, { fabricId: ruis.body.fabric.id })).status).toBe(403);
    expect((await ada.send('post', `/api/makes/${seeded.id}/plan`, { fabricId: id, fabric: {} })).status).toBe(400);

    expect((await ada.send('patch', `/api/fabrics/${id}`, { properties: { stretchAcross: 2 } })).body.fabric.properties).toEqual({ stretchAcross: 2 });
    expect((await ada.send('delete', `/api/fabrics/${id}`)).status).toBe(204);
    expect((await ada.get(`/api/fabrics/${id}`)).status).toBe(404);
  });
});
