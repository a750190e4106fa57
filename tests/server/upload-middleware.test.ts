import express from 'express';
import sharp from 'sharp';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { UploadRules } from '../../server/lib/upload-rules';
import { errorHandler } from '../../server/middleware/error-handler';
import { singleUpload } from '../../server/middleware/upload';

const RULES: UploadRules = {
  field: 'sheet',
  maxBytes: 1024,
  maxFields: 2,
  tooLarge: { code: 'SHEET_TOO_LARGE', message: 'That sheet is larger than 1 KB.' },
  words: {
    choose: 'Choose the sheet.',
    notOneFile: 'Send one sheet in the field named "sheet".',
    unreadable: 'The sheet did not arrive whole.',
    missing: 'Send the sheet as multipart/form-data in the field named "sheet".',
  },
};

const PICTURES_ONLY: UploadRules = {
  ...RULES,
  maxBytes: 64 * 1024,
  allowed: { types: ['image/png', 'application/pdf'], refusal: { code: 'NOT_A_SHEET', message: 'A sheet is a PNG or a PDF.' } },
};

/** An app with only the upload in front of a handler that answers what the service would be given. */
function appWith(rules: UploadRules) {
  const upload = singleUpload(rules);
  const app = express();
  app.post('/up', upload.receive, (req, res) => {
    const file = upload.fileOf(req);
    res.json({ size: file.buffer.length, mimeType: file.mimeType, originalName: file.originalName, first: file.buffer.subarray(0, 4).toString('latin1') });
  });
  app.post('/forgot', (req, res) => res.json(upload.fileOf(req)));
  app.use(errorHandler);
  return app;
}

const send = (rules: UploadRules, field: string, bytes: Buffer, filename = 'sheet.bin', contentType = 'application/octet-stream') =>
  request(appWith(rules)).post('/up').attach(field, bytes, { filename, contentType });

describe('singleUpload', () => {
  it('hands the handler the bytes, the declared type and the original name', async () => {
    const res = await send(RULES, 'sheet', Buffer.from('ABCD rivet lines'), 'lines.txt', 'text/plain');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ size: 16, mimeType: 'text/plain', originalName: 'lines.txt', first: 'ABCD' });
  });

  it('refuses a file over the limit with 413, its own code and the field named', async () => {
    const res = await send(RULES, 'sheet', Buffer.alloc(1025, 0x41));
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: 'SHEET_TOO_LARGE', message: 'That sheet is larger than 1 KB.', issues: [{ path: 'sheet', message: 'Choose the sheet.' }] });
  });

  it('takes a file of exactly the limit', async () => {
    expect((await send(RULES, 'sheet', Buffer.alloc(1024, 0x41))).status).toBe(200);
  });

  it('refuses a file in another field, or two files, with 400 naming the field', async () => {
    const other = await send(RULES, 'picture', Buffer.from('ABCD'));
    expect(other.status).toBe(400);
    expect(other.body.error).toEqual({ code: 'VALIDATION_FAILED', message: RULES.words.notOneFile, issues: [{ path: 'sheet', message: 'Choose the sheet.' }] });

    const two = await request(appWith(RULES)).post('/up').attach('sheet', Buffer.from('ABCD'), 'a.bin').attach('sheet', Buffer.from('EFGH'), 'b.bin');
    expect(two.status).toBe(400);
    expect(two.body.error.message).toBe(RULES.words.notOneFile);
  });

  it('refuses a form with more text fields than allowed', async () => {
    const res = await request(appWith(RULES)).post('/up').field('a', '1').field('b', '2').field('c', '3').attach('sheet', Buffer.from('ABCD'), 'a.bin');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'sheet' }] });
  });

  it('refuses no file, an empty file and a JSON body with 400 and the missing words', async () => {
    const empty = await send(RULES, 'sheet', Buffer.alloc(0));
    expect(empty.status).toBe(400);
    expect(empty.body.error).toEqual({ code: 'VALIDATION_FAILED', message: RULES.words.missing, issues: [{ path: 'sheet', message: 'Choose the sheet.' }] });

    const json = await request(appWith(RULES)).post('/up').send({ sheet: 'abc' });
    expect(json.status).toBe(400);
    expect(json.body.error.message).toBe(RULES.words.missing);
  });

  it('refuses a form cut off before its end with 400 and the unreadable words', async () => {
    const res = await request(appWith(RULES))
      .post('/up')
      .set('Content-Type', 'multipart/form-data; boundary=xyz')
      .send('--xyz\r\nContent-Disposition: form-data; name="sheet"; filename="a.bin"\r\n\r\nABCD');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'VALIDATION_FAILED', message: RULES.words.unreadable, issues: [{ path: 'sheet' }] });
  });

  it('with allowed types, goes by the bytes: the type they show is handed on, whatever was declared', async () => {
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#808080' } }).png().toBuffer();
    const res = await send(PICTURES_ONLY, 'sheet', png, 'sheet.pdf', 'application/pdf');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ mimeType: 'image/png', originalName: 'sheet.pdf' });

    const pdf = await send(PICTURES_ONLY, 'sheet', Buffer.from('%PDF-1.4\n%%EOF\n'), 'sheet.png', 'image/png');
    expect(pdf.body.mimeType).toBe('application/pdf');
  });

  it('with allowed types, refuses other bytes with 415, its own words and the field named', async () => {
    const jpeg = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#808080' } }).jpeg().toBuffer();
    for (const bytes of [jpeg, Buffer.from('not a picture at all')]) {
      const res = await send(PICTURES_ONLY, 'sheet', bytes, 'sheet.png', 'image/png');
      expect(res.status).toBe(415);
      expect(res.body.error).toEqual({ code: 'NOT_A_SHEET', message: 'A sheet is a PNG or a PDF.', issues: [{ path: 'sheet', message: 'Choose the sheet.' }] });
    }
  });

  it('fails loudly when a handler asks for a file the upload never read', async () => {
    const res = await request(appWith(RULES)).post('/forgot');
    expect(res.status).toBe(500);
  });
});
