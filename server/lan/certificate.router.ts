import { Router } from 'express';
import { HttpError } from '../lib/http-error';

export interface CertificateDownload {
  pem: string;
  fileName: string;
}

/**
 * `GET /certificate`: the hangar's own certificate authority, for a phone to trust once, when Gripline
 * runs on a certificate it made; 404 otherwise (a real certificate needs no download).
 */
export function certificateRouter(download: CertificateDownload | undefined) {
  const router = Router();
  router.get('/certificate', (_req, res) => {
    if (!download) {
      throw new HttpError(404, 'NOT_FOUND', 'Gripline offers a certificate only when it made its own (npm run start:lan).');
    }
    res.type('application/x-x509-ca-cert').attachment(download.fileName).send(Buffer.from(download.pem));
  });
  return router;
}
