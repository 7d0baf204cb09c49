// The method-of-procedure upload's multipart parsing: multer in memory, one file in field "file", a size cap.
import type { RequestHandler } from 'express';
import multer from 'multer';
import { MopMissingError, MopTooLargeError } from '../services/windows/errors';
import { MOP_MAX_BYTES } from '../services/windows/mop';

/** multer's errors become our domain errors (413 for a file over the cap, 400 for a missing or extra file). */
export function mopUpload(maxBytes = MOP_MAX_BYTES): RequestHandler {
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 } }).single('file');
  return (req, res, next) => single(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(new MopTooLargeError(maxBytes));
    if (err instanceof multer.MulterError) return next(new MopMissingError());
    next(err);
  });
}
