import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ publicUrl: 'http://127.0.0.1:5317' });
});
afterAll(async () => {
  await t.close();
});

/** Wait for the local SMTP fake to have a message to `to` (delivery is asynchronous). */
async function mailTo(to: string): Promise<{ subject: string; text: string }> {
  for (let i = 0; i < 50; i++) {
    const found = t.mailer.outbox!.list().find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail to ${to}`);
}

describe('password reset by e-mailed link', () => {
  it('when a known e-mail asks, then a link arrives over SMTP and sets a new password once', async () => {
    const c = new Client(t.app);
    const res = await c.send('post', '/api/auth/password-reset', { email: 'mina@loomhollow.example' });
    expect(res.status).toBe(202);
    const mail = await mailTo('mina@loomhollow.example');
    expect(mail.subject).toMatch(/reset/i);
    const link = /http:\/\/127\.0\.0\.1:5317\/reset-password\?token=([\w-]+)/.exec(mail.text);
    expect(link).not.toBeNull();
    const token = link![1]!;

    const ok = await c.send('post', '/api/auth/password-reset/confirm', { token, password: 'a brand new password' });
    expect(ok.status).toBe(204);
    expect((await new Client(t.app).signIn('mina@loomhollow.example', DEMO_PASSWORD)).status).toBe(401);
    expect((await new Client(t.app).signIn('mina@loomhollow.example', 'a brand new password')).status).toBe(200);

    const reused = await c.send('post', '/api/auth/password-reset/confirm', { token, password: 'yet another password' });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('invalid_token');
  });

  it('when an unknown e-mail asks, then the answer is the same 202 and no mail goes out', async () => {
    const before = t.mailer.outbox!.list().length;
    const res = await new Client(t.app).send('post', '/api/auth/password-reset', { email: 'stranger@example.org' });
    expect(res.status).toBe(202);
    await new Promise((r) => setTimeout(r, 200));
    expect(t.mailer.outbox!.list().length).toBe(before);
  });

  it('when the token is made up, then 400 invalid_token', async () => {
    const res = await new Client(t.app).send('post', '/api/auth/password-reset/confirm', {
      token: 'x'.repeat(43),
      password: 'a brand new password',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });

  it('when an admin opens the outbox, then the reset mail is listed; a sewist gets 403', async () => {
    const admin = new Client(t.app);
    await admin.signIn('admin@loomhollow.example', DEMO_PASSWORD);
    const res = await admin.get('/api/admin/outbox').expect(200);
    expect(res.body.messages.some((m: { to: string[] }) => m.to.includes('mina@loomhollow.example'))).toBe(true);
    const sewist = new Client(t.app);
    await sewist.signIn('ada@loomhollow.example', DEMO_PASSWORD);
    await sewist.get('/api/admin/outbox').expect(403);
  });
});
