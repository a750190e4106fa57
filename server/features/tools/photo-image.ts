import sharp from 'sharp';
import { PHOTO_MAX_SIDE, PHOTO_THUMBNAIL_SIDE } from '@shared/schemas/photos';
import { HttpError } from '../../lib/http-error';

/** Formats read by their bytes, never by file name or declared type. 'heif' covers what libheif can decode. */
const ACCEPTED_FORMATS = new Set(['jpeg', 'png', 'webp', 'heif']);
/** A phone's full-resolution photo is under 50 megapixels; anything far above it is more likely a decompression bomb. */
const MAX_INPUT_PIXELS = 100_000_000;
const JPEG_QUALITY = 82;

export interface ProcessedPhoto {
  image: Buffer;
  thumbnail: Buffer;
  width: number;
  height: number;
}

const notAnImage = (why: string) =>
  new HttpError(415, 'NOT_AN_IMAGE', `${why} Send a photo taken with the camera, as JPEG, PNG or WebP.`);

async function readFormat(bytes: Buffer) {
  try {
    return await sharp(bytes).metadata();
  } catch {
    throw notAnImage('That file is not a picture Gripline can read.');
  }
}

/**
 * Turns uploaded bytes into what we store: upright (EXIF orientation applied), no metadata
 * (sharp writes none unless asked, so GPS and camera details are dropped), JPEG, longest side
 * at most 1600 px, plus a 320 px thumbnail. A truncated or corrupt image fails to decode here.
 */
export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const meta = await readFormat(bytes);
  if (!ACCEPTED_FORMATS.has(meta.format)) throw notAnImage(`That file is a ${meta.format.toUpperCase()} file, not a photo.`);
  if ((meta.width ?? 0) * (meta.height ?? 0) > MAX_INPUT_PIXELS) {
    throw new HttpError(413, 'PHOTO_TOO_LARGE', 'That picture has more than 100 megapixels. Take the photo at the camera’s normal size.');
  }
  try {
    const full = await sharp(bytes, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS })
      .autoOrient()
      .resize({ width: PHOTO_MAX_SIDE, height: PHOTO_MAX_SIDE, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: JPEG_QUALITY, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(full.data)
      .resize({ width: PHOTO_THUMBNAIL_SIDE, height: PHOTO_THUMBNAIL_SIDE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: JPEG_QUALITY, mozjpeg: true })
      .toBuffer();
    return { image: full.data, thumbnail, width: full.info.width, height: full.info.height };
  } catch {
    throw notAnImage(meta.format === 'heif' ? 'Gripline cannot decode this HEIF photo.' : 'That picture is damaged or cut short, so it cannot be read.');
  }
}
