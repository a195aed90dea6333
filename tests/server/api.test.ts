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

describe('health', () => {
  it('when the database answers, then 200 ok', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });
});

describe('bad input never yields 500', () => {
  it('when the body is malformed JSON, then 400 invalid_json', async () => {
    const c = new Client(t.app);
    const token = await c.csrf();
    const res = await c.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', token)
      .set('content-type', 'application/json')
      .send('{"email": "ada@loomhollow.example", ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
  });

  it('when the body is a bare JSON scalar, then 400 invalid_json (only objects and arrays are accepted)', async () => {
    const c = new Client(t.app);
    for (const body of ['"text"', 'null', '42']) {
      const token = await c.csrf();
      const res = await c.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', token)
        .set('content-type', 'application/json')
        .send(body);
      expect(res.status, body).toBe(400);
      expect(res.body.error.code, body).toBe('invalid_json');
    }
  });

  it('when the body is JSON of the wrong shape, then 400 invalid_input', async () => {
    const c = new Client(t.app);
    for (const body of ['[1,2]', '{}', '{"email": ["a"], "password": {"x": 1}}']) {
      const token = await c.csrf();
      const res = await c.agent
        .post('/api/auth/sign-in')
        .set('x-csrf-token', token)
        .set('content-type', 'application/json')
        .send(body);
      expect(res.status, body).toBe(400);
      expect(res.body.error.code, body).toBe('invalid_input');
    }
  });

  it('when the body is not JSON at all, then 400 with field messages', async () => {
    const c = new Client(t.app);
    const token = await c.csrf();
    const res = await c.agent.post('/api/auth/sign-up').set('x-csrf-token', token).type('form').send('email=x');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('password');
  });

  it('when the body is over 1 MB, then 413 payload_too_large', async () => {
    const c = new Client(t.app);
    const token = await c.csrf();
    const res = await c.agent
      .post('/api/auth/sign-up')
      .set('x-csrf-token', token)
      .set('content-type', 'application/json')
      .send(JSON.stringify({ displayName: 'x'.repeat(1_100_000) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('when an API route does not exist, then a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('security headers', () => {
  it('when any response goes out, then helmet headers are on it and x-powered-by is not', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('meta', () => {
  it('when the environment is test, then no demo passwords are shown', async () => {
    const res = await request(t.app).get('/api/meta').expect(200);
    expect(res.body).toEqual({ environment: 'test', demoAccounts: null });
  });

  it('when the environment is development, then the demo accounts and passwords are listed', async () => {
    const dev = await createTestApp({ env: 'development' });
    try {
      const res = await request(dev.app).get('/api/meta').expect(200);
      expect(res.body.environment).toBe('development');
      expect(res.body.demoAccounts.map((a: { role: string }) => a.role).sort()).toEqual(['admin', 'coach', 'sewist', 'sewist']);
      expect(res.body.demoAccounts[0].password).toBe(DEMO_PASSWORD);
    } finally {
      await dev.close();
    }
  });
});

describe('account', () => {
  it('when the display name changes, then /me shows it; an empty one is 400', async () => {
    const c = new Client(t.app);
    await c.signIn('ada@loomhollow.example', DEMO_PASSWORD);
    const ok = await c.send('patch', '/api/account', { displayName: 'Ada B.' });
    expect(ok.status).toBe(200);
    expect((await c.get('/api/auth/me')).body.user.displayName).toBe('Ada B.');
    const bad = await c.send('patch', '/api/account', { displayName: '   ' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.displayName).toBeTruthy();
    await c.send('patch', '/api/account', { displayName: 'Ada Brightwater' });
  });

  it('when the current password is wrong, then 400 wrong_password and the password stays', async () => {
    const c = new Client(t.app);
    await c.signIn('rui@loomhollow.example', DEMO_PASSWORD);
    const res = await c.send('post', '/api/account/password', { currentPassword: 'nope', newPassword: 'another long password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('wrong_password');
    expect(res.body.error.fields.currentPassword).toBeTruthy();
  });

  it('when the password changes, then other sessions of the account end and this one stays', async () => {
    const u = await t.users.create({ email: 'changer@example.org', displayName: 'Changer', password: 'first long password' });
    const here = new Client(t.app);
    const there = new Client(t.app);
    await here.signIn(u.email, 'first long password');
    await there.signIn(u.email, 'first long password');
    const res = await here.send('post', '/api/account/password', {
      currentPassword: 'first long password',
      newPassword: 'second long password',
    });
    expect(res.status).toBe(204);
    await here.get('/api/auth/me').expect(200);
    await there.get('/api/auth/me').expect(401);
    const again = new Client(t.app);
    expect((await again.signIn(u.email, 'second long password')).status).toBe(200);
  });

  it('when nobody is signed in, then account routes are 401', async () => {
    const c = new Client(t.app);
    const res = await c.send('patch', '/api/account', { displayName: 'X' });
    expect(res.status).toBe(401);
  });
});
