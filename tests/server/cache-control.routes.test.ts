import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addBinAs, addToolAs, blindRivetBin, post } from '../helpers/crib';
import { buildTestApp, type SignedInAgent, type TestApp } from '../helpers/test-app';

let t: TestApp;
let qm: SignedInAgent;
let member: SignedInAgent;
beforeEach(async () => {
  t = await buildTestApp();
  await t.addCrew();
  qm = await t.signIn('qm@example.org');
  member = await t.signIn('member@example.org');
  await addToolAs(qm, { name: 'Pneumatic rivet puller', category: 'other' });
  await addBinAs(qm, blindRivetBin());
});
afterEach(() => t.close());

/** Reads a binary answer without supertest trying to parse it. */
const raw = (who: SignedInAgent, path: string) =>
  who.agent
    .get(path)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });

describe('Cache-Control on API answers', () => {
  it.each(['/api/auth/me', '/api/auth/csrf', '/api/tools', '/api/tools/T-0001', '/api/bins', '/api/loans/mine', '/api/nope', '/api/tools/T-9999'])(
    'GET %s signed in answers Cache-Control: no-store',
    async (path) => {
      const res = await member.agent.get(path);
      expect(res.status).not.toBe(500);
      expect(res.headers['cache-control']).toBe('no-store');
    },
  );

  it('sends no-store on a refusal, an anonymous answer and a change too', async () => {
    expect((await (await t.anonymous()).agent.get('/api/tools')).headers['cache-control']).toBe('no-store');
    const refused = await post(member, '/api/bins', blindRivetBin());
    expect(refused.status).toBe(403);
    expect(refused.headers['cache-control']).toBe('no-store');
    const made = await post(qm, '/api/tools', { name: 'Air drill', category: 'other' });
    expect(made.status).toBe(201);
    expect(made.headers['cache-control']).toBe('no-store');
  });

  it('keeps a CSV export and a label sheet PDF out of every cache', async () => {
    const csv = await qm.agent.get('/api/bins/export.csv');
    expect(csv.status).toBe(200);
    expect(csv.headers['cache-control']).toBe('no-store');
    const pdf = await post(qm, '/api/labels/sheet', { layoutId: (await qm.agent.get('/api/labels/layouts')).body.data[0].id, codes: ['T-0001'] });
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.headers['cache-control']).toBe('no-store');
  });

  it('lets the browser keep a photo and its thumbnail privately for five minutes, not for a year', async () => {
    const bytes = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#4080c0' } }).jpeg().toBuffer();
    const up = await qm.agent.post('/api/tools/T-0001/photos').set('X-CSRF-Token', qm.csrf).attach('photo', bytes, { filename: 'p.jpg', contentType: 'image/jpeg' });
    expect(up.status).toBe(201);
    for (const path of [up.body.url as string, up.body.thumbnailUrl as string]) {
      const res = await raw(member, path);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/jpeg');
      expect(res.headers['cache-control']).toBe('private, max-age=300');
    }
  });

  it('treats a stored packing slip like a photo: private, five minutes', async () => {
    const up = await qm.agent
      .post('/api/bins/slips')
      .set('X-CSRF-Token', qm.csrf)
      .attach('slip', Buffer.from('%PDF-1.4\n%%EOF\n'), { filename: 'slip.pdf', contentType: 'application/pdf' });
    expect(up.status).toBe(201);
    const res = await raw(qm, `/api/bins/slips/${up.body.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, max-age=300');
  });
});
