import { Router, type Response } from 'express';
import { photoIdParams } from '@shared/schemas/photos';
import { toolCodeParams } from '@shared/schemas/tools';
import { parseInput } from '../../lib/validate';
import { requireRole, requireUser } from '../../middleware/auth';
import { PRIVATE_FILE_CACHE } from '../../middleware/cache-control';
import { singleUpload } from '../../middleware/upload';
import { addPhoto, PHOTO_UPLOAD, photoUploadTarget, readPhoto, removePhoto } from './photos.service';

const photoUpload = singleUpload(PHOTO_UPLOAD);

/** POST /api/tools/:code/photos; mounted before the tools router, whose /:code/:command route is for quartermasters. */
export function toolPhotosRouter() {
  const router = Router();
  router.post(
    '/:code/photos',
    requireRole('member'),
    (req, _res, next) => {
      photoUploadTarget(req.ctx, requireUser(req), parseInput(toolCodeParams, req.params, 'path').code);
      next();
    },
    photoUpload.receive,
    async (req, res) => {
      const { code } = parseInput(toolCodeParams, req.params, 'path');
      res.status(201).json(await addPhoto(req.ctx, requireUser(req), code, photoUpload.fileOf(req)));
    },
  );
  return router;
}

function sendJpeg(res: Response, bytes: Buffer) {
  res.set('Cache-Control', PRIVATE_FILE_CACHE).type('image/jpeg').send(bytes);
}

/** GET and DELETE /api/photos/:id. */
export function photosRouter() {
  const router = Router();
  router.use(requireRole('member'));
  const photoId = (params: unknown) => parseInput(photoIdParams, params, 'path').id;

  router.get('/:id', (req, res) => sendJpeg(res, readPhoto(req.ctx, photoId(req.params), 'image')));
  router.get('/:id/thumbnail', (req, res) => sendJpeg(res, readPhoto(req.ctx, photoId(req.params), 'thumbnail')));

  router.delete('/:id', requireRole('quartermaster'), (req, res) => {
    removePhoto(req.ctx, requireUser(req), photoId(req.params));
    res.status(204).end();
  });
  return router;
}
