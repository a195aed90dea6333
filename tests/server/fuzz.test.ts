/**
 * Property: whatever JSON a client sends to a state-changing route, the answer is a 2xx or a 4xx
 * in the one error shape — never a 500 (fast-check generates the bodies).
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPattern } from '../../geometry/index.ts';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
let admin: Client;
const ids: Record<string, string> = {};
beforeAll(async () => {
  t = await createTestApp();
  admin = new Client(t.app);
  await admin.signIn('admin@loomhollow.example', DEMO_PASSWORD);
  ids.id = (await admin.get('/api/auth/me')).body.user.id;
  ids.patternId = (await admin.upload('/api/patterns', { name: 'p.json', content: JSON.stringify(demoPattern()) })).body.pattern.id;
  ids.makeId = (await admin.send('post', '/api/makes', { name: 'fuzz', patternId: ids.patternId })).body.make.id;
  ids.profileId = (await admin.send('post', '/api/profiles', { name: 'fuzz' })).body.profile.id;
  ids.fabricId = (await admin.send('post', '/api/fabrics', { name: 'fuzz' })).body.fabric.id;
});
afterAll(async () => {
  await t.close();
});

const routes: Array<['post' | 'patch' | 'put', string]> = [
  ['post', '/api/auth/sign-in'],
  ['post', '/api/auth/sign-up'],
  ['post', '/api/auth/password-reset'],
  ['post', '/api/auth/password-reset/confirm'],
  ['patch', '/api/account'],
  ['post', '/api/account/password'],
  ['patch', '/api/admin/users/:id'],
  ['post', '/api/prints'],
  ['patch', '/api/patterns/:patternId'],
  ['post', '/api/makes'],
  ['patch', '/api/makes/:makeId'],
  ['post', '/api/makes/:makeId/duplicate'],
  ['post', '/api/makes/:makeId/revisions'],
  ['post', '/api/makes/:makeId/plan'],
  ['post', '/api/profiles'],
  ['patch', '/api/profiles/:profileId'],
  ['post', '/api/fabrics'],
  ['patch', '/api/fabrics/:fabricId'],
  ['put', '/api/makes/:makeId/fit-note'],
  ['put', '/api/patterns/:patternId/size-chart'],
];

/** Alteration lists shaped like real ones, with any numbers (huge, tiny, negative) and names. */
const amount = fc.oneof(fc.double({ noNaN: true }), fc.integer({ min: -2000, max: 2000 }));
const lineName = fc.constantFrom('lower leg', 'upper leg', 'rise', 'hip', 'nowhere');
const alteration = fc.record({
  id: fc.string({ minLength: 1, maxLength: 8 }),
  enabled: fc.boolean(),
  op: fc.oneof(
    fc.record({ op: fc.constant('lengthen'), line: lineName, amount }),
    fc.record({ op: fc.constant('rise'), line: lineName, amount }),
    fc.record({ op: fc.constant('shrinkage'), lengthwise: amount, crosswise: amount }),
    fc.record({ op: fc.constant('seam-allowance'), width: amount }),
    fc.record({ op: fc.constant('girth'), edge: fc.constantFrom('side seam', 'inseam'), level: fc.constantFrom('hip', 'knee'), amount }),
    fc.record({ op: fc.constant('blend'), levels: fc.array(fc.record({ level: fc.constantFrom('waist', 'hip', 'knee', 'hem'), size: fc.oneof(fc.constantFrom('0', '8', '20', '-4', '30'), amount) }), { maxLength: 4 }) }),
  ),
});

/** Bodies shaped like the real ones (right keys, any values) as well as anything at all. */
const body = fc.oneof(
  fc.jsonValue(),
  fc.record(
    {
      email: fc.jsonValue(),
      password: fc.jsonValue(),
      displayName: fc.jsonValue(),
      role: fc.jsonValue(),
      token: fc.jsonValue(),
      currentPassword: fc.jsonValue(),
      newPassword: fc.jsonValue(),
      pattern: fc.jsonValue(),
      options: fc.jsonValue(),
      name: fc.jsonValue(),
      units: fc.oneof(fc.constantFrom('in', 'cm'), fc.jsonValue()),
      published: fc.jsonValue(),
      patternId: fc.oneof(fc.constant('$patternId'), fc.jsonValue()),
      profileId: fc.oneof(fc.constant('$profileId'), fc.jsonValue()),
      makeId: fc.oneof(fc.constant('$makeId'), fc.jsonValue()),
      fabricNote: fc.jsonValue(),
      archived: fc.jsonValue(),
      measurements: fc.oneof(fc.dictionary(fc.constantFrom('waistGirth', 'hipGirth', 'height'), amount), fc.jsonValue()),
      baseRevision: fc.oneof(fc.integer({ min: 0, max: 5 }), fc.jsonValue()),
      alterations: fc.oneof(fc.array(alteration, { maxLength: 4 }), fc.jsonValue()),
      summary: fc.oneof(fc.constant('fuzzed'), fc.jsonValue()),
      restoredFrom: fc.jsonValue(),
      properties: fc.oneof(fc.record({ stretchAcross: amount, weightGsm: amount, weightOzPerSqYd: amount }, { requiredKeys: [] }), fc.jsonValue()),
      fabricId: fc.oneof(fc.constant('$fabricId'), fc.jsonValue()),
      takenOn: fc.oneof(fc.constantFrom('2026-01-01', '2026-02-30', '1899-12-31'), fc.jsonValue()),
      girthsAtHeights: fc.oneof(fc.array(fc.record({ offset: amount, girth: amount }), { maxLength: 3 }), fc.jsonValue()),
      note: fc.jsonValue(),
      chart: fc.oneof(
        fc.constantFrom('printed', 'measured'),
        fc.record({ sizes: fc.array(fc.record({ size: fc.oneof(fc.constantFrom('8', '10'), fc.jsonValue()), garment: fc.dictionary(fc.constantFrom('waist', 'hip', 'inseam'), amount) }), { maxLength: 3 }) }),
        fc.jsonValue(),
      ),
      levels: fc.oneof(fc.dictionary(fc.constantFrom('waist', 'hip', 'rise', 'length'), fc.record({ verdict: fc.constantFrom('tight', 'right', 'loose', 'short', 'long'), amount }, { requiredKeys: ['verdict'] })), fc.jsonValue()),
      nextTime: fc.jsonValue(),
    },
    { requiredKeys: [] },
  ),
);

describe('no 500 on any JSON body', () => {
  for (const [method, path] of routes) {
    it(`when ${method.toUpperCase()} ${path} gets arbitrary JSON, then it answers 2xx or 4xx`, async () => {
      const url = path.replace(/:(\w+)/g, (_, key: string) => ids[key]!);
      await fc.assert(
        fc.asyncProperty(body, async (b) => {
          const res = await admin.agent[method](url)
            .set('x-csrf-token', await admin.csrf())
            .set('content-type', 'application/json')
            .send(JSON.stringify(b, (_k, v: unknown) => (typeof v === 'string' && v.startsWith('$') && ids[v.slice(1)] ? ids[v.slice(1)] : v)));
          expect(res.status).toBeLessThan(500);
          if (res.status >= 400) expect(typeof res.body.error?.code).toBe('string');
        }),
        { numRuns: 25 },
      );
    });
  }
});

describe('no 500 from the alteration engine', () => {
  it('when a revision carries alterations with any amounts and names, then it is saved (201) or refused (400/422), never a 500', async () => {
    const seen = new Set<number>();
    await fc.assert(
      fc.asyncProperty(fc.array(alteration, { minLength: 1, maxLength: 4 }), async (alterations) => {
        const latest = (await admin.get(`/api/makes/${ids.makeId}`)).body.make.latestRevision as number;
        const unique = alterations.map((a, i) => ({ ...a, id: `${i}` }));
        const res = await admin.send('post', `/api/makes/${ids.makeId}/revisions`, { baseRevision: latest, alterations: unique, summary: 'fuzzed' });
        seen.add(res.status);
        expect([201, 400, 422]).toContain(res.status);
        if (res.status >= 400) expect(typeof res.body.error?.message).toBe('string');
      }),
      // Two fixed lists among the random ones, so both answers are always exercised (the random
      // lists often carry a number JSON cannot hold, a 400, which can hide the engine's 422s):
      // shortening at a line the pattern has (201) and lengthening at one it lacks (422).
      {
        numRuns: 40,
        examples: [
          [[{ id: 'a', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -25.4 } }]],
          [[{ id: 'b', enabled: true, op: { op: 'lengthen', line: 'nowhere', amount: 10 } }]],
        ],
      },
    );
    // The property reaches the engine: some lists are saved and some refused by it.
    expect(seen.has(201)).toBe(true);
    expect(seen.has(422)).toBe(true);
  });
});

describe('no 500 on any query string', () => {
  // Every route that reads its query; the keys it knows, others, repeats (read as arrays) and
  // bracketed keys, with any text as values.
  const listRoutes = ['/api/patterns', '/api/prints', '/api/makes', '/api/patterns/:patternId/size-chart'];
  const key = fc.oneof(fc.constantFrom('scope', 'makeId', 'archived', 'seamAllowance', 'toString', '__proto__', 'scope[toString]', 'makeId[]'), fc.string({ maxLength: 6 }));
  const value = fc.oneof(fc.constantFrom('', 'mine', 'library', 'true', '1e309', '-1', '$makeId', 'NaN'), fc.string({ maxLength: 12 }));
  const query = fc.array(fc.tuple(key, value), { maxLength: 5 });
  for (const path of listRoutes) {
    it(`when GET ${path} gets any query, then it answers 2xx or 4xx`, async () => {
      const url = path.replace(/:(\w+)/g, (_, k: string) => ids[k]!);
      await fc.assert(
        fc.asyncProperty(query, async (pairs) => {
          const qs = pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v.startsWith('$') && ids[v.slice(1)] ? ids[v.slice(1)]! : v)}`).join('&');
          const res = await admin.get(`${url}?${qs}`);
          expect(res.status).toBeLessThan(500);
          if (res.status >= 400) expect(typeof res.body.error?.code).toBe('string');
        }),
        { numRuns: 40 },
      );
    });
  }
});
