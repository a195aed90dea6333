import bcrypt from 'bcryptjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BCRYPT_COST } from '../../server/modules/users/users.service.ts';
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

const sessionCookie = (res: request.Response): string | undefined =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('bw.sid='));

describe('sign-up', () => {
  it('when the input is valid, then the account is created as a sewist and signed in', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/sign-up', {
      email: '  New.Person@Example.org ',
      displayName: 'New Person',
      password: 'a long enough password',
    });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: 'new.person@example.org', displayName: 'New Person', role: 'sewist' });
    expect(res.body.user).not.toHaveProperty('passwordHash');
    const me = await c.get('/api/auth/me').expect(200);
    expect(me.body.user.email).toBe('new.person@example.org');
  });

  it('when the password is stored, then it is a bcrypt hash of cost 12 (OWASP asks at least 10)', async () => {
    const user = await t.users.findByEmail('new.person@example.org');
    expect(user?.passwordHash).toMatch(/^\$2[aby]\$12\$/);
    expect(bcrypt.getRounds(user!.passwordHash)).toBe(BCRYPT_COST);
    expect(await bcrypt.compare('a long enough password', user!.passwordHash)).toBe(true);
  });

  it('when the e-mail is taken (in any letter case), then 409 email_taken', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/sign-up', {
      email: 'ADA@loomhollow.example',
      displayName: 'Someone',
      password: 'a long enough password',
    });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('email_taken');
    expect(res.body.error.fields.email).toBeTruthy();
  });

  it('when fields are missing or of the wrong type, then 400 with a message per field', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/sign-up', { email: 'not-an-email', displayName: 42, password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['displayName', 'email', 'password']);
  });
});

describe('sign-in and sign-out', () => {
  it('when the password is right, then 200, a new session id, and /me answers', async () => {
    const c = new Client(t.app);
    const before = sessionCookie(await c.get('/api/auth/csrf'));
    const res = await c.send('post', '/api/auth/sign-in', { email: 'rui@loomhollow.example', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('sewist');
    const after = sessionCookie(res);
    expect(before).toBeDefined();
    expect(after).toBeDefined();
    // The session id is regenerated at sign-in (session fixation defence).
    expect(after!.split(';')[0]).not.toBe(before!.split(';')[0]);
    expect(after).toMatch(/HttpOnly/i);
    expect(after).toMatch(/SameSite=Lax/i);
  });

  it('when the password is wrong, then 401 invalid_credentials and no session user', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/sign-in', { email: 'rui@loomhollow.example', password: 'wrong password' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
    await c.get('/api/auth/me').expect(401);
  });

  it('when the e-mail is unknown, then the same 401 as a wrong password', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/sign-in', { email: 'nobody@example.org', password: 'whatever it is' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it('when the e-mail is not a string (even an object whose toString is not a function), then 400 with the field', async () => {
    const c = new Client(t.app);
    for (const email of [{ toString: [] }, ['ada@loomhollow.example'], 42, null]) {
      const res = await c.send('post', '/api/auth/sign-in', { email, password: DEMO_PASSWORD });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields)).toContain('email');
    }
  });

  it('when signed out, then /me is 401 again', async () => {
    const c = new Client(t.app);
    await c.signIn('mina@loomhollow.example', DEMO_PASSWORD);
    await c.get('/api/auth/me').expect(200);
    const out = await c.send('post', '/api/auth/sign-out');
    expect(out.status).toBe(204);
    const me = await c.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });
});

describe('rate limit on sign-in', () => {
  it('when the attempts for one e-mail run out, then 429 too_many_attempts, even with the right password', async () => {
    const limited = await createTestApp({ signInAttempts: 3 });
    try {
      const c = new Client(limited.app);
      for (let i = 0; i < 3; i++) {
        const res = await c.send('post', '/api/auth/sign-in', { email: 'ada@loomhollow.example', password: `wrong ${i}` });
        expect(res.status).toBe(401);
      }
      const blocked = await c.send('post', '/api/auth/sign-in', { email: 'ada@loomhollow.example', password: DEMO_PASSWORD });
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe('too_many_attempts');
      // Another account from the same address is not locked out by it.
      const other = await c.send('post', '/api/auth/sign-in', { email: 'rui@loomhollow.example', password: DEMO_PASSWORD });
      expect(other.status).toBe(200);
    } finally {
      await limited.close();
    }
  });
});

describe('CSRF defence', () => {
  it('when a state-changing request has no token, then 403 csrf_invalid', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'ada@loomhollow.example', password: DEMO_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('when the token belongs to another session, then 403 csrf_invalid', async () => {
    const a = new Client(t.app);
    const b = new Client(t.app);
    const tokenOfA = await a.csrf();
    await b.csrf();
    const res = await b.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', tokenOfA)
      .send({ email: 'ada@loomhollow.example', password: DEMO_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });
});
