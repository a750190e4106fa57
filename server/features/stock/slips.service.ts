import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';
import sharp from 'sharp';
import type { Slip } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import { findSlip, insertSlip } from './slips.repo';

export const SLIP_FIELD = 'slip';
export const SLIP_MAX_BYTES = 10 * 1024 * 1024;
const IMAGE_TYPES: Record<string, string> = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp', heif: 'image/heif' };

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: SLIP_MAX_BYTES, files: 1, fields: 5, parts: 6 } }).single(SLIP_FIELD);

/** Reads one packing slip from a multipart form; multer's own errors become our envelope. */
export function receiveSlipUpload(req: Request, res: Response, next: NextFunction): void {
  upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      return next(new HttpError(413, 'SLIP_TOO_LARGE', 'That packing slip is larger than 10 MB. Scan or photograph it at a lower resolution.'));
    }
    const missing = (message: string) => new HttpError(400, 'VALIDATION_FAILED', message, [{ path: SLIP_FIELD, message: 'Choose the packing slip (PDF or photo).' }]);
    if (err) return next(missing(`Send one file in the form field named "${SLIP_FIELD}".`));
    if (!req.file || req.file.size === 0) return next(missing(`Send the packing slip as multipart/form-data in the field named "${SLIP_FIELD}".`));
    next();
  });
}

/** The file's real type, read from its bytes: a PDF, or a picture sharp can decode. */
async function sniff(bytes: Buffer): Promise<string> {
  if (bytes.subarray(0, 5).toString('latin1') === '%PDF-') return 'application/pdf';
  try {
    const meta = await sharp(bytes).metadata();
    const type = meta.format ? IMAGE_TYPES[meta.format] : undefined;
    if (type) return type;
  } catch {
    // not a picture either
  }
  throw new HttpError(415, 'UNSUPPORTED_SLIP', 'A packing slip must be a PDF or a photo (JPEG, PNG or WebP). That file is neither.');
}

export async function storeSlip(ctx: ServiceContext, actor: UserRow, file: { buffer: Buffer; originalname: string }): Promise<Slip> {
  const contentType = await sniff(file.buffer);
  const filename = (file.originalname || 'packing-slip').replace(/[^\w.\- ]+/g, '_').slice(0, 100);
  const { id } = insertSlip(ctx.db, { contentType, filename, bytes: file.buffer, uploadedById: actor.id, createdAt: ctx.now() });
  return { id, contentType, filename, size: file.buffer.length };
}

export function readSlip(ctx: ServiceContext, id: number) {
  const slip = findSlip(ctx.db, id);
  if (!slip) throw new HttpError(404, 'SLIP_NOT_FOUND', `There is no packing slip ${id}.`);
  return slip;
}
