import sharp from 'sharp';
import { describe, expect } from 'vitest';
import { addBinAs, addToolAs, blindRivetBin, post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

crewTest.beforeEach(async ({ qm }) => {
  await addToolAs(qm, { name: 'Pneumatic rivet puller', category: 'other' });
  await addBinAs(qm, blindRivetBin());
});

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
  crewTest.for(['/api/auth/me', '/api/auth/csrf', '/api/tools', '/api/tools/T-0001', '/api/bins', '/api/loans/mine', '/api/nope', '/api/tools/T-9999'])(
    'GET %s signed in answers Cache-Control: no-store',
    async (path, { member }) => {
      const res = await member.agent.get(path);
      expect(res.status).not.toBe(500);
      expect(res.headers['cache-control']).toBe('no-store');
    },
  );

  crewTest('sends no-store on a refusal, an anonymous answer and a change too', async ({ t, qm, member }) => {
    expect((await (await t.anonymous()).agent.get('/api/tools')).headers['cache-control']).toBe('no-store');
    const refused = await post(member, '/api/bins', blindRivetBin());
    expect(refused.status).toBe(403);
    expect(refused.headers['cache-control']).toBe('no-store');
    const made = await post(qm, '/api/tools', { name: 'Air drill', category: 'other' });
    expect(made.status).toBe(201);
    expect(made.headers['cache-control']).toBe('no-store');
  });

  crewTest('keeps a CSV export and a label sheet PDF out of every cache', async ({ qm }) => {
    const csv = await qm.agent.get('/api/bins/export.csv');
    expect(csv.status).toBe(200);
    expect(csv.headers['cache-control']).toBe('no-store');
    const pdf = await post(qm, '/api/labels/sheet', { layoutId: (await qm.agent.get('/api/labels/layouts')).body.data[0].id, codes: ['T-0001'] });
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.headers['cache-control']).toBe('no-store');
  });

  crewTest('lets the browser keep a photo and its thumbnail privately for five minutes, not for a year', async ({ qm, member }) => {
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

  crewTest('treats a stored packing slip like a photo: private, five minutes', async ({ qm }) => {
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
