/**
 * Property: whatever JSON a client sends to a state-changing route, the answer is a 2xx or a 4xx
 * in the one error shape — never a 500 (fast-check generates the bodies).
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
let admin: Client;
let adminId: string;
beforeAll(async () => {
  t = await createTestApp();
  admin = new Client(t.app);
  await admin.signIn('admin@loomhollow.example', DEMO_PASSWORD);
  adminId = (await admin.get('/api/auth/me')).body.user.id;
});
afterAll(async () => {
  await t.close();
});

const routes: Array<['post' | 'patch', string]> = [
  ['post', '/api/auth/sign-in'],
  ['post', '/api/auth/sign-up'],
  ['post', '/api/auth/password-reset'],
  ['post', '/api/auth/password-reset/confirm'],
  ['patch', '/api/account'],
  ['post', '/api/account/password'],
  ['patch', '/api/admin/users/:id'],
  ['post', '/api/prints'],
];

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
    },
    { requiredKeys: [] },
  ),
);

describe('no 500 on any JSON body', () => {
  for (const [method, path] of routes) {
    it(`when ${method.toUpperCase()} ${path} gets arbitrary JSON, then it answers 2xx or 4xx`, async () => {
      const url = path.replace(':id', adminId);
      await fc.assert(
        fc.asyncProperty(body, async (b) => {
          const res = await admin.agent[method](url)
            .set('x-csrf-token', await admin.csrf())
            .set('content-type', 'application/json')
            .send(JSON.stringify(b));
          expect(res.status).toBeLessThan(500);
          if (res.status >= 400) expect(typeof res.body.error?.code).toBe('string');
        }),
        { numRuns: 25 },
      );
    });
  }
});
