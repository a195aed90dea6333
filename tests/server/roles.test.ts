import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function as(email: string): Promise<Client> {
  const c = new Client(t.app);
  const res = await c.signIn(email, DEMO_PASSWORD);
  expect(res.status).toBe(200);
  return c;
}

describe('role guards', () => {
  it('when nobody is signed in, then every guarded route answers 401', async () => {
    for (const url of ['/api/auth/me', '/api/admin/users', '/api/admin/outbox']) {
      const res = await request(t.app).get(url);
      expect(res.status, url).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    }
  });

  it('when a sewist or a coach calls an admin route, then 403 forbidden', async () => {
    for (const email of ['ada@loomhollow.example', 'mina@loomhollow.example']) {
      const c = await as(email);
      const list = await c.get('/api/admin/users');
      expect(list.status).toBe(403);
      expect(list.body.error.code).toBe('forbidden');
      const me = await c.get('/api/auth/me');
      const change = await c.send('patch', `/api/admin/users/${me.body.user.id}`, { role: 'admin' });
      expect(change.status).toBe(403);
      expect((await t.users.findById(me.body.user.id))?.role).not.toBe('admin');
    }
  });

  it('when an admin lists users, then every account is there without password hashes', async () => {
    const c = await as('admin@loomhollow.example');
    const res = await c.get('/api/admin/users').expect(200);
    const emails = res.body.users.map((u: { email: string }) => u.email);
    expect(emails).toEqual(
      expect.arrayContaining(['ada@loomhollow.example', 'rui@loomhollow.example', 'mina@loomhollow.example', 'admin@loomhollow.example']),
    );
    expect(JSON.stringify(res.body)).not.toMatch(/password/i);
  });

  it('when an admin makes a sewist a coach, then the next request of that sewist has the new role', async () => {
    const rui = await as('rui@loomhollow.example');
    const me = await rui.get('/api/auth/me').expect(200);
    const admin = await as('admin@loomhollow.example');
    const res = await admin.send('patch', `/api/admin/users/${me.body.user.id}`, { role: 'coach' });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('coach');
    expect((await rui.get('/api/auth/me')).body.user.role).toBe('coach');
    await admin.send('patch', `/api/admin/users/${me.body.user.id}`, { role: 'sewist' });
  });

  it('when the last admin would be demoted, then 409 last_admin and the role stays', async () => {
    const admin = await as('admin@loomhollow.example');
    const me = await admin.get('/api/auth/me').expect(200);
    const res = await admin.send('patch', `/api/admin/users/${me.body.user.id}`, { role: 'sewist' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_admin');
    expect((await t.users.findById(me.body.user.id))?.role).toBe('admin');
  });

  it('when the role or the id is not valid, then 400 with field messages; an unknown id is 404', async () => {
    const admin = await as('admin@loomhollow.example');
    const badId = await admin.send('patch', '/api/admin/users/not-a-uuid', { role: 'coach' });
    expect(badId.status).toBe(400);
    expect(badId.body.error.fields.id).toBeTruthy();
    const me = await admin.get('/api/auth/me');
    const badRole = await admin.send('patch', `/api/admin/users/${me.body.user.id}`, { role: 'superuser' });
    expect(badRole.status).toBe(400);
    expect(badRole.body.error.fields.role).toBeTruthy();
    const unknown = await admin.send('patch', '/api/admin/users/00000000-0000-4000-8000-000000000000', { role: 'coach' });
    expect(unknown.status).toBe(404);
  });
});
