import request from 'supertest';
import type { Express } from 'express';

export type Agent = ReturnType<typeof request.agent>;

/** A cookie-keeping client that fetches a CSRF token and sends it on every state-changing call. */
export class Client {
  readonly agent: Agent;
  private token: string | undefined;

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  async csrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/csrf').expect(200);
    this.token = (res.body as { csrfToken: string }).csrfToken;
    return this.token;
  }

  get(url: string) {
    return this.agent.get(url);
  }

  /** POST/PATCH/DELETE with JSON and the current CSRF token (fetched first when there is none). */
  async send(method: 'post' | 'patch' | 'put' | 'delete', url: string, body?: unknown) {
    const token = this.token ?? (await this.csrf());
    const req = this.agent[method](url).set('x-csrf-token', token);
    return body === undefined ? req : req.send(body as object);
  }

  /** A multipart upload of one file in field `file`, with optional text fields. */
  async upload(url: string, file: { name: string; content: string | Buffer }, fields: Record<string, string> = {}) {
    const token = this.token ?? (await this.csrf());
    let req = this.agent.post(url).set('x-csrf-token', token);
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return req.attach('file', Buffer.isBuffer(file.content) ? file.content : Buffer.from(file.content), file.name);
  }

  /** Sign in; the session is regenerated, so the CSRF token is fetched afresh. */
  async signIn(email: string, password: string) {
    const res = await this.send('post', '/api/auth/sign-in', { email, password });
    await this.csrf();
    return res;
  }
}
