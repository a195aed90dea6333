/**
 * Prints made as background jobs (pg-boss on the same PostgreSQL): queue, follow, download again.
 * The file is read back with pdfjs-dist, a general-purpose PDF reader.
 */
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { applyOps, demoPattern, type Pattern } from '../../geometry/index.ts';
import { DEMO_PASSWORD } from '../../server/seed/demo.ts';
import { BLEND } from '../bench/alterations.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';

let t: TestApp;
let ada: Client;
let blended: Pattern;
beforeAll(async () => {
  t = await createTestApp();
  ada = new Client(t.app);
  await ada.signIn('ada@loomhollow.example', DEMO_PASSWORD);
  blended = applyOps(demoPattern(), [BLEND]).pattern;
});
afterAll(async () => {
  await t.close();
});

async function settled(c: Client, id: string): Promise<{ status: string; progress: number; pageCount: number | null; error: string | null; fileUrl: string | null }> {
  for (let i = 0; i < 100; i++) {
    const res = await c.get(`/api/prints/${id}`).expect(200);
    if (res.body.print.status === 'done' || res.body.print.status === 'failed') return res.body.print;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the print did not finish in 10 s');
}

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('prints as background jobs', () => {
  it('when a sewist asks for a Letter PDF, then it is queued (202), finishes, and downloads again with every page', async () => {
    const res = await ada.send('post', '/api/prints', { pattern: blended, options: { format: 'pdf', paper: 'letter', title: 'Test trousers' } });
    expect(res.status).toBe(202);
    expect(res.body.print).toMatchObject({ status: 'queued', progress: 0, format: 'pdf', title: 'Test trousers', fileUrl: null });
    expect(res.headers.location).toBe(`/api/prints/${res.body.print.id}`);

    const done = await settled(ada, res.body.print.id);
    expect(done).toMatchObject({ status: 'done', progress: 100, error: null });
    expect(done.fileUrl).toBe(`/api/prints/${res.body.print.id}/file`);

    for (let n = 0; n < 2; n++) {
      const file = await ada.get(done.fileUrl!).buffer(true).parse(binary).expect(200);
      expect(file.headers['content-type']).toBe('application/pdf');
      expect(file.headers['content-disposition']).toMatch(/^attachment; filename="?Test-trousers\.pdf"?$/);
      const pdf = await getDocument({ data: new Uint8Array(file.body as Buffer) }).promise;
      expect(pdf.numPages).toBe(done.pageCount);
      const page = await pdf.getPage(1);
      // US Letter at 72 pt per inch (ISO 32000-1 user space).
      expect(page.view).toEqual([0, 0, 612, 792]);
      await pdf.destroy();
    }
    const list = await ada.get('/api/prints').expect(200);
    expect(list.body.prints.map((p: { id: string }) => p.id)).toContain(res.body.print.id);
  });

  it('when another user asks for the print or its file, then 403; signed out, 401', async () => {
    const res = await ada.send('post', '/api/prints', { pattern: blended, options: { format: 'svg', paper: 'letter' } });
    await settled(ada, res.body.print.id);
    const rui = new Client(t.app);
    await rui.signIn('rui@loomhollow.example', DEMO_PASSWORD);
    expect((await rui.get(`/api/prints/${res.body.print.id}`)).status).toBe(403);
    expect((await rui.get(`/api/prints/${res.body.print.id}/file`)).status).toBe(403);
    expect((await rui.get('/api/prints').expect(200)).body.prints).toEqual([]);
    expect((await request(t.app).get(`/api/prints/${res.body.print.id}`)).status).toBe(401);
  });

  it('when the options or the pattern are bad, then a 4xx with fields and nothing is queued', async () => {
    const before = (await ada.get('/api/prints')).body.prints.length;
    const badOptions = await ada.send('post', '/api/prints', { pattern: blended, options: { paper: 'napkin', margin: -3 } });
    expect(badOptions.status).toBe(400);
    expect(badOptions.body.error.fields.options).toMatch(/paper/);
    const badPattern = await ada.send('post', '/api/prints', { pattern: { units: 'in', pieces: [] }, options: {} });
    expect(badPattern.status).toBe(422);
    expect(Object.keys(badPattern.body.error.fields).some((k) => k.startsWith('pattern.'))).toBe(true);
    const noPattern = await ada.send('post', '/api/prints', { options: {} });
    expect(noPattern.status).toBe(400);
    expect((await ada.get('/api/prints')).body.prints.length).toBe(before);
  });

  it('when the pattern cannot be printed as asked, then the job fails with the reason and no file', async () => {
    // The demo pattern has 11 size lines: without a size or a blend the printer cannot choose.
    const res = await ada.send('post', '/api/prints', { pattern: demoPattern(), options: { format: 'pdf' } });
    expect(res.status).toBe(202);
    const failed = await settled(ada, res.body.print.id);
    expect(failed.status).toBe('failed');
    expect(failed.error).toMatch(/size/);
    expect((await ada.get(`/api/prints/${res.body.print.id}/file`)).status).toBe(409);
  });

  it('when the id is not a uuid or unknown, then 400 or 404', async () => {
    expect((await ada.get('/api/prints/nope')).status).toBe(400);
    expect((await ada.get('/api/prints/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});
