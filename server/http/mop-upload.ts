// The method-of-procedure upload's multipart parsing: multer in memory, one file in field "file", a size cap.
import type { RequestHandler } from 'express';
import multer from 'multer';
import { MopMissingError, MopTooLargeError, MopUploadUnreadableError } from '../services/windows/errors';
import { MOP_MAX_BYTES } from '../services/windows/mop';

/** multer's errors become our domain errors (413 for a file over the cap, 400 for a missing, extra or unreadable file). */
export function mopUpload(maxBytes = MOP_MAX_BYTES): RequestHandler {
  const single = multer({
    storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 },
    // Browsers send UTF-8 file names; multer's default (latin1) would store "Närvik 东京.txt" garbled.
    defParamCharset: 'utf8',
  }).single('file');
  return (req, res, next) => single(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(new MopTooLargeError(maxBytes));
    if (err instanceof multer.MulterError) return next(new MopMissingError());
    // The multipart parser's own errors (a malformed part header, a body cut short) are the sender's fault.
    if (err instanceof Error) return next(new MopUploadUnreadableError(err.message));
    next(err);
  });
}
