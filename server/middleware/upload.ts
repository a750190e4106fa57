import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { fileTypeOf } from '../lib/file-type';
import { HttpError } from '../lib/http-error';
import type { UploadedFile, UploadRules } from '../lib/upload-rules';

export interface Upload {
  /** Reads the one file of a multipart form into memory, or passes a 4xx naming the field. */
  receive: RequestHandler;
  /** The file `receive` read for this request, as plain data for a service. */
  fileOf(req: Request): UploadedFile;
}

/**
 * One file in one named form field, held in memory: multer's own errors, a missing or empty file and
 * (when the rules name them) a type outside the allowed ones become our error envelope, each naming
 * the field.
 */
export function singleUpload(rules: UploadRules): Upload {
  const read = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: rules.maxBytes, files: 1, fields: rules.maxFields, parts: rules.maxFields + 1 },
  }).single(rules.field);
  const issues = [{ path: rules.field, message: rules.words.choose }];
  const refuse = (status: number, code: string, message: string) => new HttpError(status, code, message, issues);
  const received = new WeakMap<Request, UploadedFile>();

  async function check(file: Express.Multer.File | undefined): Promise<UploadedFile> {
    if (!file || file.size === 0) throw refuse(400, 'VALIDATION_FAILED', rules.words.missing);
    let mimeType = file.mimetype;
    if (rules.allowed) {
      const found = await fileTypeOf(file.buffer);
      if (!found || !rules.allowed.types.includes(found)) throw refuse(415, rules.allowed.refusal.code, rules.allowed.refusal.message);
      mimeType = found;
    }
    return { buffer: file.buffer, mimeType, originalName: file.originalname };
  }

  const receive: RequestHandler = (req, res, next) => {
    read(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(refuse(413, rules.tooLarge.code, rules.tooLarge.message));
      if (err instanceof multer.MulterError) return next(refuse(400, 'VALIDATION_FAILED', rules.words.notOneFile));
      if (err) return next(refuse(400, 'VALIDATION_FAILED', rules.words.unreadable));
      check(req.file).then((file) => {
        received.set(req, file);
        next();
      }, next);
    });
  };

  function fileOf(req: Request): UploadedFile {
    const file = received.get(req);
    if (!file) throw new Error(`No upload was read for this request: put receive for "${rules.field}" before the handler.`);
    return file;
  }

  return { receive, fileOf };
}
