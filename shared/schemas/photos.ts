import { z } from 'zod';

/** Upload limits, shared so the client can refuse a too-large file before sending it. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTO_MAX_SIDE = 1600;
export const PHOTO_THUMBNAIL_SIDE = 320;
/** The multipart form field that carries the photo. */
export const PHOTO_FIELD = 'photo';

export const photoIdParams = z.object({
  id: z.coerce.number({ error: 'A photo id is a whole number.' }).int({ error: 'A photo id is a whole number.' }).positive({ error: 'A photo id is a whole number.' }),
});

export const photoSchema = z.strictObject({
  id: z.number(),
  width: z.number(),
  height: z.number(),
  url: z.string(),
  thumbnailUrl: z.string(),
});
export type Photo = z.infer<typeof photoSchema>;

export const photoUrl = (id: number) => `/api/photos/${id}`;
export const photoThumbnailUrl = (id: number) => `/api/photos/${id}/thumbnail`;
