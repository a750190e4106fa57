import sharp from 'sharp';
import { describe, expect } from 'vitest';
import { slipSchema } from '@shared/schemas/bins';
import { post } from '../helpers/crib';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\n%%EOF\n');

const sendSlip = (who: SignedInAgent, bytes: Buffer, filename = 'slip.pdf', contentType = 'application/pdf', field = 'slip') =>
  who.agent.post('/api/bins/slips').set('X-CSRF-Token', who.csrf).attach(field, bytes, { filename, contentType });

describe('POST /api/bins/slips', () => {
  crewTest('stores a PDF by the type its bytes show, under a file name made safe', async ({ qm }) => {
    const res = await sendSlip(qm, PDF, 'order <42>.pdf', 'application/octet-stream');
    expect(res.status).toBe(201);
    expect(slipSchema.parse(res.body)).toMatchObject({ contentType: 'application/pdf', filename: 'order _42_.pdf', size: PDF.length });
  });

  crewTest('stores a photographed slip as the picture type it is, whatever name it came with', async ({ qm }) => {
    const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#c8d2dc' } }).png().toBuffer();
    const res = await sendSlip(qm, png, 'scan.pdf', 'application/pdf');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ contentType: 'image/png', filename: 'scan.pdf' });
  });

  crewTest('answers 413 SLIP_TOO_LARGE naming the field for a file over 10 MB', async ({ qm }) => {
    const res = await sendSlip(qm, Buffer.alloc(10 * 1024 * 1024 + 1, 0x25));
    expect(res.status).toBe(413);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error).toMatchObject({ code: 'SLIP_TOO_LARGE', issues: [{ path: 'slip' }] });
    expect(res.body.error.message).toMatch(/10 MB/);
  });

  crewTest('answers 415 UNSUPPORTED_SLIP naming the field for a text file or a GIF', async ({ qm }) => {
    const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#000' } }).gif().toBuffer();
    for (const bytes of [Buffer.from('Rivets, 500, paid in cash'), gif]) {
      const res = await sendSlip(qm, bytes, 'slip.pdf');
      expect(res.status).toBe(415);
      expect(res.body.error).toMatchObject({ code: 'UNSUPPORTED_SLIP', issues: [{ path: 'slip' }] });
      expect(res.body.error.message).toMatch(/PDF or a photo/);
    }
  });

  crewTest('answers 400 VALIDATION_FAILED naming the field when no file, an empty file or another field is sent', async ({ qm }) => {
    const json = await post(qm, '/api/bins/slips', { slip: 'abc' });
    expect(json.status).toBe(400);
    expect(json.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'slip' }] });
    expect(json.body.error.message).toMatch(/multipart\/form-data in the field named "slip"/);

    const empty = await sendSlip(qm, Buffer.alloc(0));
    expect(empty.status).toBe(400);
    expect(empty.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'slip' }] });

    const wrongField = await sendSlip(qm, PDF, 'slip.pdf', 'application/pdf', 'file');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'slip' }] });
    expect(wrongField.body.error.message).toMatch(/one file in the form field named "slip"/);
  });

  crewTest('refuses a member before reading the upload', async ({ member }) => {
    const res = await sendSlip(member, PDF);
    expect(res.status).toBe(403);
  });
});
