import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';
import { PHOTO_FIELD, PHOTO_MAX_BYTES } from '@shared/schemas/photos';
import { HttpError } from '../../lib/http-error';

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 10, parts: 11 },
}).single(PHOTO_FIELD);

const missingPhoto = (message: string) => new HttpError(400, 'VALIDATION_FAILED', message, [{ path: PHOTO_FIELD, message: 'Choose or take a photo.' }]);

/** Reads one photo from a multipart form into memory; multer's own errors become our envelope. */
export function receivePhoto(req: Request, res: Response, next: NextFunction): void {
  upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      return next(new HttpError(413, 'PHOTO_TOO_LARGE', 'That photo is larger than 10 MB. Take it again at the camera’s normal size.'));
    }
    if (err instanceof multer.MulterError) {
      return next(missingPhoto(`Send one photo in the form field named "${PHOTO_FIELD}".`));
    }
    if (err) return next(missingPhoto('The photo did not arrive whole. Try again.'));
    if (!req.file || req.file.size === 0) return next(missingPhoto(`Send the photo as multipart/form-data in the field named "${PHOTO_FIELD}".`));
    next();
  });
}
