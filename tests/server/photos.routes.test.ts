import sharp from 'sharp';
import { describe, expect } from 'vitest';
import { photoSchema } from '@shared/schemas/photos';
import { loanSchema } from '@shared/schemas/tools';
import { crewTest } from '../helpers/crew-test';
import type { SignedInAgent } from '../helpers/test-app';
import { addToolAs, post } from '../helpers/crib';

/** A real picture made by sharp: a gradient, so the encoders have something to compress. */
function picture(width: number, height: number) {
  const pixels = Buffer.alloc(width * height * 3);
  for (let i = 0; i < pixels.length; i += 3) {
    const x = (i / 3) % width;
    pixels[i] = (x * 255) / width;
    pixels[i + 1] = 120;
    pixels[i + 2] = 200;
  }
  return sharp(pixels, { raw: { width, height, channels: 3 } });
}

const upload = (who: SignedInAgent, code: string, bytes: Buffer, filename = 'photo.jpg', contentType = 'image/jpeg') =>
  who.agent.post(`/api/tools/${code}/photos`).set('X-CSRF-Token', who.csrf).attach('photo', bytes, { filename, contentType });

const test = crewTest
  .extend('addTool', ({ qm }) => (name: string) => addToolAs(qm, { name, category: 'other' }))
  /** The stored bytes, fetched through the API. */
  .extend('stored', ({ member }) => async (url: string) => {
    const res = await member.agent.get(url).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
    return { res, bytes: res.body as Buffer, meta: await sharp(res.body as Buffer).metadata() };
  });

test.beforeEach(async ({ addTool }) => {
  await addTool('Pneumatic rivet puller');
  await addTool('Air drill');
});

describe('POST /api/tools/:code/photos', () => {
  test('stores a 3000×2000 JPEG re-encoded with its longest side at 1600 px and a 320 px thumbnail', async ({ qm, member, stored }) => {
    const res = await upload(qm, 'T-0001', await picture(3000, 2000).jpeg().toBuffer());
    expect(res.status).toBe(201);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    const photo = photoSchema.parse(res.body);
    expect(photo).toMatchObject({ width: 1600, height: 1067, url: `/api/photos/${photo.id}`, thumbnailUrl: `/api/photos/${photo.id}/thumbnail` });

    const full = await stored(photo.url);
    expect(full.res.status).toBe(200);
    expect(full.res.headers['content-type']).toBe('image/jpeg');
    expect(full.res.headers['cache-control']).toBe('private, max-age=300');
    expect(full.meta).toMatchObject({ format: 'jpeg', width: 1600, height: 1067 });

    const thumb = await stored(photo.thumbnailUrl);
    expect(thumb.res.headers['content-type']).toBe('image/jpeg');
    expect(thumb.meta).toMatchObject({ format: 'jpeg', width: 320, height: 213 });
    expect(thumb.bytes.length).toBeLessThan(full.bytes.length);

    expect((await member.agent.get('/api/tools/T-0001')).body.photoIds).toEqual([photo.id]);
    const events = (await member.agent.get('/api/tools/T-0001/events')).body.data;
    expect(events[0]).toMatchObject({ action: 'photo_added', actor: { name: 'Quinn Quartermaster' }, detail: `Photo ${photo.id} added` });
  });

  test('reads PNG and WebP by their content, whatever the name and declared type, and stores JPEG', async ({ lead, qm, stored }) => {
    const png = await upload(lead, 'T-0001', await picture(2400, 3200).ensureAlpha(0.5).png().toBuffer(), 'upload.bin', 'application/octet-stream');
    expect(png.status).toBe(201);
    expect(png.body).toMatchObject({ width: 1200, height: 1600 });
    expect((await stored(png.body.url)).meta).toMatchObject({ format: 'jpeg', hasAlpha: false });

    const webp = await upload(qm, 'T-0001', await picture(800, 600).webp().toBuffer(), 'puller.jpg');
    expect(webp.status).toBe(201);
    // A small picture is not enlarged.
    expect(webp.body).toMatchObject({ width: 800, height: 600 });
    expect((await stored(webp.body.thumbnailUrl)).meta).toMatchObject({ format: 'jpeg', width: 320, height: 240 });
  });

  test('turns the picture upright by its EXIF orientation and strips the metadata', async ({ qm, stored }) => {
    const sideways = await picture(1200, 800)
      .jpeg()
      .withExif({ IFD0: { Artist: 'Hangar camera 7', Copyright: 'Chapter 1234' } })
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const before = await sharp(sideways).metadata();
    expect(before.orientation).toBe(6);
    expect(sideways.includes('Hangar camera 7')).toBe(true);

    const res = await upload(qm, 'T-0001', sideways);
    expect(res.status).toBe(201);
    // Orientation 6 means "rotate 90° clockwise to view": the stored picture is portrait.
    expect(res.body).toMatchObject({ width: 800, height: 1200 });
    const { bytes, meta } = await stored(res.body.url);
    expect(meta).toMatchObject({ width: 800, height: 1200 });
    expect(meta.orientation).toBeUndefined();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(bytes.includes('Hangar camera 7')).toBe(false);
  });

  test('answers 415 NOT_AN_IMAGE for a text file named photo.jpg', async ({ qm }) => {
    const res = await upload(qm, 'T-0001', Buffer.from('Torque wrench calibrated 2026-11-02, see the log book.'), 'photo.jpg', 'image/jpeg');
    expect(res.status).toBe(415);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('NOT_AN_IMAGE');
    expect(res.body.error.message).toMatch(/not a picture/);
  });

  test('answers 415 NOT_AN_IMAGE for a JPEG cut short', async ({ qm }) => {
    const whole = await picture(1200, 800).jpeg().toBuffer();
    const res = await upload(qm, 'T-0001', whole.subarray(0, Math.floor(whole.length / 2)));
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('NOT_AN_IMAGE');
    expect(res.body.error.message).toMatch(/damaged or cut short/);
  });

  test('answers 415 NOT_AN_IMAGE for a picture in a format it does not take (GIF)', async ({ qm }) => {
    const res = await upload(qm, 'T-0001', await picture(40, 30).gif().toBuffer(), 'photo.jpg');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('NOT_AN_IMAGE');
    expect(res.body.error.message).toMatch(/GIF/);
  });

  test('answers 413 PHOTO_TOO_LARGE in the error envelope for a file over 10 MB', async ({ qm }) => {
    const res = await upload(qm, 'T-0001', Buffer.alloc(10 * 1024 * 1024 + 1, 0xff));
    expect(res.status).toBe(413);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('PHOTO_TOO_LARGE');
    expect(res.body.error.message).toMatch(/10 MB/);
  });

  test('answers 400 VALIDATION_FAILED when no photo is sent, or it is in another field', async ({ qm }) => {
    const json = await post(qm, '/api/tools/T-0001/photos', { photo: 'abc' });
    expect(json.status).toBe(400);
    expect(json.body.error).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'photo' }] });
    const wrongField = await qm.agent
      .post('/api/tools/T-0001/photos')
      .set('X-CSRF-Token', qm.csrf)
      .attach('picture', await picture(100, 100).jpeg().toBuffer(), 'photo.jpg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.code).toBe('VALIDATION_FAILED');
    expect(wrongField.body.error.message).toMatch(/field named "photo"/);
  });

  test('answers 404 for an unknown tool and 400 for a malformed code', async ({ qm }) => {
    const jpeg = await picture(100, 100).jpeg().toBuffer();
    const unknown = await upload(qm, 'T-9999', jpeg);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('TOOL_NOT_FOUND');
    const malformed = await upload(qm, 'drill', jpeg);
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe('VALIDATION_FAILED');
  });

  test('refuses a member who does not hold the tool, signed-out people and a missing CSRF token', async ({ t, qm, member }) => {
    const jpeg = await picture(100, 100).jpeg().toBuffer();
    const notOnLoan = await upload(member, 'T-0001', jpeg);
    expect(notOnLoan.status).toBe(403);
    expect(notOnLoan.body.error.code).toBe('FORBIDDEN');
    expect(notOnLoan.body.error.message).toMatch(/has T-0001 on loan/);

    await t.addUser({ email: 'other@example.org' });
    const other = await t.signIn('other@example.org');
    await post(other, '/api/tools/T-0001/checkout').expect(201);
    expect((await upload(member, 'T-0001', jpeg)).status).toBe(403);

    const anonymous = await t.anonymous();
    const signedOut = await upload(anonymous, 'T-0001', jpeg);
    expect(signedOut.status).toBe(401);
    expect(signedOut.body.error.code).toBe('NOT_SIGNED_IN');

    const noToken = await qm.agent.post('/api/tools/T-0001/photos').attach('photo', jpeg, 'photo.jpg');
    expect(noToken.status).toBe(403);
    expect(noToken.body.error.code).toBe('CSRF_TOKEN_INVALID');
  });

  test('lets the member who holds the tool on loan add a photo', async ({ member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const res = await upload(member, 'T-0001', await picture(640, 480).jpeg().toBuffer());
    expect(res.status).toBe(201);
    const events = (await member.agent.get('/api/tools/T-0001/events')).body.data;
    expect(events[0]).toMatchObject({ action: 'photo_added', detail: `Photo ${res.body.id} added by Mia Member while on loan` });
  });
});

describe('GET /api/photos/:id', () => {
  test('answers 404 PHOTO_NOT_FOUND as JSON for an unknown photo, 400 for a malformed id, 401 when signed out', async ({ t, qm, member }) => {
    for (const path of ['/api/photos/999', '/api/photos/999/thumbnail']) {
      const res = await member.agent.get(path);
      expect(res.status).toBe(404);
      expect(res.headers['content-type']).toMatch(/application\/json/);
      expect(res.body.error.code).toBe('PHOTO_NOT_FOUND');
    }
    const malformed = await member.agent.get('/api/photos/abc');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe('VALIDATION_FAILED');
    const photo = await upload(qm, 'T-0001', await picture(100, 100).jpeg().toBuffer());
    const signedOut = await (await t.anonymous()).agent.get(photo.body.url);
    expect(signedOut.status).toBe(401);
  });
});

describe('DELETE /api/photos/:id', () => {
  test('lets the quartermaster remove a photo, which then answers 404 and leaves the tool', async ({ qm, member }) => {
    const photo = await upload(qm, 'T-0001', await picture(100, 100).jpeg().toBuffer());
    const res = await qm.agent.delete(photo.body.url).set('X-CSRF-Token', qm.csrf);
    expect(res.status).toBe(204);
    expect((await member.agent.get(photo.body.url)).status).toBe(404);
    expect((await member.agent.get('/api/tools/T-0001')).body.photoIds).toEqual([]);
    const events = (await member.agent.get('/api/tools/T-0001/events')).body.data;
    expect(events[0]).toMatchObject({ action: 'photo_removed', detail: `Photo ${photo.body.id} removed` });
  });

  test('refuses a member with 403, and answers 404 for an unknown photo', async ({ lead, qm, member }) => {
    const photo = await upload(qm, 'T-0001', await picture(100, 100).jpeg().toBuffer());
    const refused = await member.agent.delete(photo.body.url).set('X-CSRF-Token', member.csrf);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('FORBIDDEN');
    expect((await member.agent.get(photo.body.url)).status).toBe(200);
    const unknown = await lead.agent.delete('/api/photos/999').set('X-CSRF-Token', lead.csrf);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('PHOTO_NOT_FOUND');
  });
});

describe('POST /api/tools/:code/return with a photo', () => {
  test('stores the photo on the loan and shows it in GET /api/loans/mine', async ({ member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const photo = await upload(member, 'T-0001', await picture(1200, 900).jpeg().toBuffer());
    const back = await post(member, '/api/tools/T-0001/return', { condition: 'needs_attention', note: 'Nosepiece jaws slip', photoId: photo.body.id });
    expect(back.status).toBe(200);
    expect(back.body.status).toBe('out_of_service');
    const mine = await member.agent.get('/api/loans/mine');
    expect(loanSchema.parse(mine.body.data[0])).toMatchObject({ returnCondition: 'needs_attention', returnPhotoId: photo.body.id });
    // Once it is back, the member no longer holds it and cannot add photos.
    expect((await upload(member, 'T-0001', await picture(100, 100).jpeg().toBuffer())).status).toBe(403);
  });

  test('returns without a photo as before, with returnPhotoId null', async ({ member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    await post(member, '/api/tools/T-0001/return', { condition: 'ok' }).expect(200);
    expect((await member.agent.get('/api/loans/mine')).body.data[0].returnPhotoId).toBeNull();
  });

  test('answers 400 PHOTO_NOT_FOR_TOOL for a photo of another tool or no photo at all, and keeps the loan open', async ({ qm, member }) => {
    const otherTool = await upload(qm, 'T-0002', await picture(100, 100).jpeg().toBuffer());
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    for (const photoId of [otherTool.body.id, 999]) {
      const res = await post(member, '/api/tools/T-0001/return', { condition: 'ok', photoId });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('PHOTO_NOT_FOR_TOOL');
      expect(res.body.error.issues).toEqual([{ path: 'photoId', message: 'Choose a photo of T-0001.' }]);
    }
    expect((await member.agent.get('/api/tools/T-0001')).body.status).toBe('on_loan');
  });

  test('answers 400 VALIDATION_FAILED for a photo id that is not a positive whole number', async ({ member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    for (const photoId of [0, 1.5, '3']) {
      const res = await post(member, '/api/tools/T-0001/return', { condition: 'ok', photoId });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.issues[0].path).toBe('photoId');
    }
  });

  test('clears the loan’s photo when the quartermaster removes that photo', async ({ qm, member }) => {
    await post(member, '/api/tools/T-0001/checkout').expect(201);
    const photo = await upload(member, 'T-0001', await picture(100, 100).jpeg().toBuffer());
    await post(member, '/api/tools/T-0001/return', { condition: 'ok', photoId: photo.body.id }).expect(200);
    await qm.agent.delete(photo.body.url).set('X-CSRF-Token', qm.csrf).expect(204);
    expect((await member.agent.get('/api/loans/mine')).body.data[0].returnPhotoId).toBeNull();
  });
});
