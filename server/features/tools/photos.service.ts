import { hasRole } from '@shared/roles';
import { PHOTO_FIELD, PHOTO_MAX_BYTES, photoThumbnailUrl, photoUrl, type Photo } from '@shared/schemas/photos';
import type { ServiceContext } from '../../context';
import type { UserRow } from '../../db/schema/users';
import { HttpError } from '../../lib/http-error';
import type { UploadedFile, UploadRules } from '../../lib/upload-rules';
import { processPhoto } from './photo-image';
import { deletePhotoRow, findPhotoBytes, findPhotoInfo, insertPhoto } from './photos.repo';
import { actedBy, recordToolEvent } from './tool-events.repo';
import { findToolByCode, openLoanHolderId, type ToolRow } from './tools.repo';

/**
 * A photo is one file of at most 10 MB in the form field "photo". Its type is not checked on arrival:
 * `processPhoto` decodes the bytes whole and says why it refuses them.
 */
export const PHOTO_UPLOAD: UploadRules = {
  field: PHOTO_FIELD,
  maxBytes: PHOTO_MAX_BYTES,
  maxFields: 10,
  tooLarge: { code: 'PHOTO_TOO_LARGE', message: 'That photo is larger than 10 MB. Take it again at the camera’s normal size.' },
  words: {
    choose: 'Choose or take a photo.',
    notOneFile: `Send one photo in the form field named "${PHOTO_FIELD}".`,
    unreadable: 'The photo did not arrive whole. Try again.',
    missing: `Send the photo as multipart/form-data in the field named "${PHOTO_FIELD}".`,
  },
};

/** A catalogue photo (quartermaster or lead) or a photo taken by the member who has the tool on loan. */
export type PhotoPurpose = 'catalogue' | 'on_loan';

/**
 * Who may add a photo of a tool. Checked before the upload is read, so a refused person does not
 * send ten megabytes first, and again when the photo is stored.
 */
export function photoUploadTarget(ctx: ServiceContext, user: UserRow, code: string): { tool: ToolRow; purpose: PhotoPurpose } {
  const tool = findToolByCode(ctx.db, code);
  if (!tool) throw new HttpError(404, 'TOOL_NOT_FOUND', `No tool has the code ${code}. Check the label, or type the code.`);
  if (hasRole(user.role, 'quartermaster')) return { tool, purpose: 'catalogue' };
  if (openLoanHolderId(ctx.db, tool.id) === user.id) return { tool, purpose: 'on_loan' };
  throw new HttpError(403, 'FORBIDDEN', `Only the quartermaster, the chapter lead, or the member who has ${tool.code} on loan can add a photo of it.`);
}

const toPhoto = (id: number, width: number, height: number): Photo => ({ id, width, height, url: photoUrl(id), thumbnailUrl: photoThumbnailUrl(id) });

export async function addPhoto(ctx: ServiceContext, user: UserRow, code: string, file: UploadedFile): Promise<Photo> {
  const processed = await processPhoto(file.buffer);
  const now = ctx.now();
  return ctx.db.transaction(() => {
    const { tool, purpose } = photoUploadTarget(ctx, user, code);
    const { id } = insertPhoto(ctx.db, { toolId: tool.id, uploadedById: user.id, createdAt: now, ...processed });
    recordToolEvent(ctx.db, {
      toolId: tool.id,
      ...actedBy(ctx, user),
      at: now,
      action: 'photo_added',
      detail: purpose === 'on_loan' ? `Photo ${id} added by ${user.name} while on loan` : `Photo ${id} added`,
    });
    return toPhoto(id, processed.width, processed.height);
  });
}

export function readPhoto(ctx: ServiceContext, id: number, size: 'image' | 'thumbnail'): Buffer {
  const bytes = findPhotoBytes(ctx.db, id, size);
  if (!bytes) throw new HttpError(404, 'PHOTO_NOT_FOUND', `There is no photo ${id}; it may have been removed.`);
  return bytes;
}

export function removePhoto(ctx: ServiceContext, user: UserRow, id: number): void {
  const now = ctx.now();
  ctx.db.transaction(() => {
    const photo = findPhotoInfo(ctx.db, id);
    if (!photo) throw new HttpError(404, 'PHOTO_NOT_FOUND', `There is no photo ${id}; it may have been removed already.`);
    deletePhotoRow(ctx.db, id);
    recordToolEvent(ctx.db, { toolId: photo.toolId, ...actedBy(ctx, user), at: now, action: 'photo_removed', detail: `Photo ${id} removed` });
  });
}

/** A return may point at a photo only if it shows the same tool. */
export function checkReturnPhoto(ctx: ServiceContext, tool: ToolRow, photoId: number): void {
  if (findPhotoInfo(ctx.db, photoId)?.toolId !== tool.id) {
    throw new HttpError(400, 'PHOTO_NOT_FOR_TOOL', `Photo ${photoId} is not a photo of ${tool.code}. Add the photo from this tool's page, then return it.`, [
      { path: 'photoId', message: `Choose a photo of ${tool.code}.` },
    ]);
  }
}
