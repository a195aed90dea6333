/**
 * Patterns over HTTP: upload (multipart), the importers' refusals, privacy, publishing to the
 * shared library, labelling (PATCH of the geometry), deleting.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPattern, parsePattern } from '../../geometry/index.ts';
import { DEMO_PASSWORD, DEMO_PATTERN_NAME } from '../../server/seed/demo.ts';
import { createTestApp, type TestApp } from '../support/app-server.ts';
import { Client } from '../support/http.ts';
import { multiSizeSvg } from '../support/pattern-svg.ts';
import { writeD6673 } from '../geometry/d6673-writer.ts';

let t: TestApp;
let ada: Client;
let rui: Client;
let mina: Client;
let admin: Client;
let anon: Client;
beforeAll(async () => {
  t = await createTestApp();
  [ada, rui, mina, admin, anon] = [new Client(t.app), new Client(t.app), new Client(t.app), new Client(t.app), new Client(t.app)];
  await ada.signIn('ada@loomhollow.example', DEMO_PASSWORD);
  await rui.signIn('rui@loomhollow.example', DEMO_PASSWORD);
  await mina.signIn('mina@loomhollow.example', DEMO_PASSWORD);
  await admin.signIn('admin@loomhollow.example', DEMO_PASSWORD);
});
afterAll(async () => {
  await t.close();
});

async function uploadSvg(c: Client, name?: string) {
  const res = await c.upload('/api/patterns', { name: 'studio-trousers.svg', content: multiSizeSvg() }, name ? { name } : {});
  expect(res.status).toBe(201);
  return res.body.pattern as { id: string; name: string; pieceCount: number; sizes: string[]; canEdit: boolean; pattern: unknown; importNotes: string[] };
}

describe('upload', () => {
  it('when a sewist uploads a multi-size SVG, then the pieces and size lines found come back, parsed, and the file is not kept', async () => {
    const p = await uploadSvg(ada);
    expect(p).toMatchObject({ name: 'studio-trousers', pieceCount: 2, sizes: ['8', '10', '12'], canEdit: true, published: false, sourceFormat: 'svg' });
    const pattern = parsePattern(p.pattern);
    expect(pattern.pieces.map((x) => x.outlines.length)).toEqual([3, 3]);
    expect(p.importNotes.join(' ')).toMatch(/grouped as one piece/);
    const again = await ada.get(`/api/patterns/${p.id}`).expect(200);
    expect(JSON.stringify(again.body)).not.toContain('<svg');
  });

  it('when the upload names the pattern, then that name is used', async () => {
    expect((await uploadSvg(ada, 'Wide-leg test')).name).toBe('Wide-leg test');
  });

  it('when an ASTM D6673 DXF is uploaded, then its blocks become pieces and sizes', async () => {
    const square = [
      { x: 0, y: 0 },
      { x: 300, y: 0 },
      { x: 300, y: 900 },
      { x: 0, y: 900 },
    ];
    const dxf = writeD6673([
      { piece: 'leg', size: 'S', boundary: square },
      { piece: 'leg', size: 'M', boundary: square.map((q) => ({ x: q.x * 1.05, y: q.y * 1.02 })) },
    ]);
    const res = await ada.upload('/api/patterns', { name: 'leg.dxf', content: dxf });
    expect(res.status).toBe(201);
    expect(res.body.pattern).toMatchObject({ sourceFormat: 'dxf', pieceCount: 1, sizes: ['S', 'M'] });
  });

  it('when the file is not a pattern, then 422 says why and nothing is stored', async () => {
    const before = (await ada.get('/api/patterns').expect(200)).body.patterns.length;
    const cases = [
      { name: 'notes.txt', content: 'hello' },
      { name: 'bad.svg', content: '<svg xmlns="http://www.w3.org/2000/svg"><path d="M 0 0 L 10 0 L 10 10"/></svg>' },
      { name: 'entity.svg', content: '<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY x "y">]><svg xmlns="http://www.w3.org/2000/svg">&x;</svg>' },
      { name: 'broken.json', content: '{"units": "mm", ' },
      { name: 'x.dxf', content: '0\nSECTION\n2\nENTITIES\n0\nENDSEC\n0\nEOF\n' },
      // two damaged files that made the DXF parser loop without end (geometry/dxf-import.ts checkDxfGroups)
      { name: 'count.dxf', content: '0\nSECTION\n2\nENTITIES\n0\nLWPOLYLINE\n8\n1\n90\n200000000\n10\n0\n20\n0\n0\nENDSEC\n0\nEOF\n' },
      { name: 'seqend.dxf', content: '0\nSECTION\n2\nENTITIES\n0\nPOLYLINE\n8\n1\n0\nVERTEX\n10\n0\n20\n0\n0\nLINE\n0\nENDSEC\n0\nEOF\n' },
    ];
    for (const file of cases) {
      const res = await ada.upload('/api/patterns', file);
      expect(res.status, file.name).toBe(422);
      expect(res.body.error.code).toBe('unprocessable');
      expect(res.body.error.fields.file.length).toBeGreaterThan(3);
    }
    expect((await ada.get('/api/patterns').expect(200)).body.patterns.length).toBe(before);
  });

  it('when no file is sent, then 400 names the field; when the file is over 5 MB, then 413', async () => {
    const token = await ada.csrf();
    const none = await ada.agent.post('/api/patterns').set('x-csrf-token', token).field('name', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toBeDefined();
    const big = await ada.upload('/api/patterns', { name: 'big.svg', content: Buffer.alloc(5 * 1024 * 1024 + 10, 32) });
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('payload_too_large');
    // a file under another field name, or two files: a clear 400, not a crash
    const wrongField = await ada.agent.post('/api/patterns').set('x-csrf-token', token).attach('upload', Buffer.from(multiSizeSvg()), 'a.svg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.code).toBe('invalid_input');
    const two = await ada.agent.post('/api/patterns').set('x-csrf-token', token).attach('file', Buffer.from(multiSizeSvg()), 'a.svg').attach('file', Buffer.from(multiSizeSvg()), 'b.svg');
    expect(two.status).toBe(400);
  });

  it('when the upload has no CSRF token or no session, then 403 / 401', async () => {
    const noToken = await ada.agent.post('/api/patterns').attach('file', Buffer.from(multiSizeSvg()), 'a.svg');
    expect(noToken.status).toBe(403);
    const res = await anon.upload('/api/patterns', { name: 'a.svg', content: multiSizeSvg() });
    expect(res.status).toBe(401);
  });
});

describe('limits on reading a file (a worker thread, server/modules/patterns/import-runner.ts)', () => {
  it('when a file takes longer than the time limit, then 422, nothing is stored, and the server goes on serving', async () => {
    const slow = await createTestApp({ importLimits: { timeoutMs: 1, maxHeapMb: 512 } });
    try {
      const c = new Client(slow.app);
      await c.signIn('ada@loomhollow.example', DEMO_PASSWORD);
      const before = (await c.get('/api/patterns').expect(200)).body.patterns.length;
      // nothing is read in 1 ms (the worker is not even started): each upload is refused, the next one too
      for (const name of ['a.svg', 'b.svg']) {
        const res = await c.upload('/api/patterns', { name, content: multiSizeSvg() });
        expect(res.status).toBe(422);
        expect(res.body.error.fields).toEqual({ file: 'took too long to read' });
      }
      expect((await c.get('/api/patterns').expect(200)).body.patterns.length).toBe(before);
    } finally {
      await slow.close();
    }
  });

  it('when reading a file needs more memory than the limit, then 422 and the server goes on serving', async () => {
    const small = await createTestApp({ importLimits: { timeoutMs: 20_000, maxHeapMb: 4 } });
    try {
      const c = new Client(small.app);
      await c.signIn('ada@loomhollow.example', DEMO_PASSWORD);
      const res = await c.upload('/api/patterns', { name: 'a.svg', content: multiSizeSvg() });
      expect(res.status).toBe(422);
      expect(res.body.error.fields).toEqual({ file: 'needs too much memory to read' });
      await c.get('/api/patterns').expect(200);
    } finally {
      await small.close();
    }
  });

  it('when several files arrive at once, then each is read in turn and each gets its own answer', async () => {
    const files = [multiSizeSvg({ sizes: ['8'] }), 'not a pattern', multiSizeSvg({ sizes: ['8', '10'] })];
    const answers = await Promise.all(files.map((content, i) => ada.upload('/api/patterns', { name: `p${i}.${i === 1 ? 'txt' : 'svg'}`, content })));
    expect(answers.map((r) => r.status)).toEqual([201, 422, 201]);
    expect(answers[0]!.body.pattern.sizes).toEqual(['8']);
    expect(answers[2]!.body.pattern.sizes).toEqual(['8', '10']);
  });
});

describe('privacy and the shared library', () => {
  it('when someone else asks for a private pattern, then 403; a missing one 404; a bad id 400', async () => {
    const p = await uploadSvg(ada);
    expect((await rui.get(`/api/patterns/${p.id}`)).status).toBe(403);
    expect((await rui.send('patch', `/api/patterns/${p.id}`, { name: 'mine now' })).status).toBe(403);
    expect((await rui.send('delete', `/api/patterns/${p.id}`)).status).toBe(403);
    expect((await ada.get('/api/patterns/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    const bad = await ada.get('/api/patterns/not-an-id');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.id).toBeDefined();
    expect((await anon.get(`/api/patterns/${p.id}`)).status).toBe(401);
  });

  it('when listing, then "mine" has only my own patterns and the library has the coach\'s published demo pattern', async () => {
    const mine = (await rui.get('/api/patterns?scope=mine').expect(200)).body.patterns as { owner: { displayName: string } }[];
    expect(mine.every((p) => p.owner.displayName === 'Rui Tallis')).toBe(true);
    const library = (await rui.get('/api/patterns?scope=library').expect(200)).body.patterns as { name: string; owner: { displayName: string }; published: boolean }[];
    expect(library.find((p) => p.name === DEMO_PATTERN_NAME)).toMatchObject({ owner: { displayName: 'Mina Okafor-Lund' }, published: true });
    expect((await rui.get('/api/patterns?scope=everything')).status).toBe(400);
  });

  it('when a sewist tries to publish, then 403; when a coach publishes, then every signed-in user sees it and only the coach may change it', async () => {
    const sewists = await uploadSvg(ada);
    const refused = await ada.send('patch', `/api/patterns/${sewists.id}`, { published: true });
    expect(refused.status).toBe(403);

    const coach = await uploadSvg(mina, 'Class trouser');
    const published = await mina.send('patch', `/api/patterns/${coach.id}`, { published: true });
    expect(published.status).toBe(200);
    expect(published.body.pattern.published).toBe(true);
    const seen = await rui.get(`/api/patterns/${coach.id}`).expect(200);
    expect(seen.body.pattern.canEdit).toBe(false);
    expect((await rui.send('patch', `/api/patterns/${coach.id}`, { name: 'edited' })).status).toBe(403);
    // An admin moderates: may take it out of the library, may not edit it.
    expect((await admin.send('patch', `/api/patterns/${coach.id}`, { name: 'edited' })).status).toBe(403);
    const withdrawn = await admin.send('patch', `/api/patterns/${coach.id}`, { published: false });
    expect(withdrawn.status).toBe(200);
    expect((await rui.get(`/api/patterns/${coach.id}`)).status).toBe(403);
  });
});

describe('labelling', () => {
  it('when the owner sends labelled geometry, then it is validated and kept', async () => {
    const p = await uploadSvg(ada);
    const pattern = parsePattern(p.pattern);
    pattern.pieces[0]!.name = 'front';
    pattern.pieces[1]!.name = 'back';
    pattern.pieces[0]!.lines.push({ role: 'lengthen', name: 'lower leg', d: 'M -200 800 L 300 800' });
    const res = await ada.send('patch', `/api/patterns/${p.id}`, { pattern, name: 'Labelled' });
    expect(res.status).toBe(200);
    const kept = parsePattern((await ada.get(`/api/patterns/${p.id}`).expect(200)).body.pattern.pattern);
    expect(kept.pieces.map((x) => x.name)).toEqual(['front', 'back']);
    expect(kept.pieces[0]!.lines.some((l) => l.name === 'lower leg' && l.role === 'lengthen')).toBe(true);
  });

  it('when the geometry is not valid, then 400 with the field and nothing changes', async () => {
    const p = await uploadSvg(ada);
    const pattern = parsePattern(p.pattern);
    pattern.pieces[1]!.name = pattern.pieces[0]!.name;
    const res = await ada.send('patch', `/api/patterns/${p.id}`, { pattern });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('pattern.pieces.1.name');
    const open = await ada.send('patch', `/api/patterns/${p.id}`, { pattern: { ...pattern, pieces: [{ ...pattern.pieces[0], outlines: [{ size: '8', d: 'M 0 0 L 10 0 L 10 10' }] }] } });
    expect(open.status).toBe(400);
    expect((await ada.send('patch', `/api/patterns/${p.id}`, {})).status).toBe(400);
    expect((await ada.send('patch', `/api/patterns/${p.id}`, { colour: 'red' })).status).toBe(400);
    const kept = parsePattern((await ada.get(`/api/patterns/${p.id}`).expect(200)).body.pattern.pattern);
    expect(new Set(kept.pieces.map((x) => x.name)).size).toBe(2);
  });

  it('when a labelled pattern of several MB is sent, then the larger body limit lets it through', async () => {
    const p = await uploadSvg(mina);
    const res = await mina.send('patch', `/api/patterns/${p.id}`, { pattern: demoPattern() });
    expect(res.status).toBe(200);
    expect(res.body.pattern.pieceCount).toBe(6);
  });
});

describe('deleting', () => {
  it('when a pattern has no makes, then its owner may delete it; when a make uses it, then 409', async () => {
    const p = await uploadSvg(ada);
    expect((await ada.send('delete', `/api/patterns/${p.id}`)).status).toBe(204);
    expect((await ada.get(`/api/patterns/${p.id}`)).status).toBe(404);
    const used = await uploadSvg(ada);
    expect((await ada.send('post', '/api/makes', { name: 'Test', patternId: used.id })).status).toBe(201);
    const res = await ada.send('delete', `/api/patterns/${used.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('in_use');
  });
});
