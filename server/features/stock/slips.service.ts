import { SLIP_FIELD, SLIP_MAX_BYTES, type Slip } from '@shared/schemas/bins';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import type { UploadedFile, UploadRules } from '../../lib/upload-rules';
import { findSlip, insertSlip } from './slips.repo';

/** A packing slip is one PDF or photo of at most 10 MB, in the form field "slip". */
export const SLIP_UPLOAD: UploadRules = {
  field: SLIP_FIELD,
  maxBytes: SLIP_MAX_BYTES,
  maxFields: 5,
  allowed: {
    types: ['application/pdf', 'image/jpeg', 'image/png', 'image/webp', 'image/heif'],
    refusal: { code: 'UNSUPPORTED_SLIP', message: 'A packing slip must be a PDF or a photo (JPEG, PNG or WebP). That file is neither.' },
  },
  tooLarge: { code: 'SLIP_TOO_LARGE', message: 'That packing slip is larger than 10 MB. Scan or photograph it at a lower resolution.' },
  words: {
    choose: 'Choose the packing slip (PDF or photo).',
    notOneFile: `Send one file in the form field named "${SLIP_FIELD}".`,
    unreadable: `Send one file in the form field named "${SLIP_FIELD}".`,
    missing: `Send the packing slip as multipart/form-data in the field named "${SLIP_FIELD}".`,
  },
};

/** Stores a slip the upload has checked: its type is the one its bytes show. */
export function storeSlip(ctx: ServiceContext, actor: UserRow, file: UploadedFile): Slip {
  const filename = (file.originalName || 'packing-slip').replace(/[^\w.\- ]+/g, '_').slice(0, 100);
  const { id } = insertSlip(ctx.db, { contentType: file.mimeType, filename, bytes: file.buffer, uploadedById: actor.id, createdAt: ctx.now() });
  return { id, contentType: file.mimeType, filename, size: file.buffer.length };
}

export function readSlip(ctx: ServiceContext, id: number) {
  const slip = findSlip(ctx.db, id);
  if (!slip) throw new HttpError(404, 'SLIP_NOT_FOUND', `There is no packing slip ${id}.`);
  return slip;
}
