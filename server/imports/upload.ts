// multer in memory for one `file` field, with its errors turned into our codes (413 over the size cap).
import type { RequestHandler } from 'express';
import multer from 'multer';
import { FileTooLargeError, ImportFileError } from './errors';

export function singleFileUpload(maxBytes: number): RequestHandler {
  const handle = multer({
    storage: multer.memoryStorage(),
    // WARNING: fileSize is what makes an oversize upload stop early instead of filling memory.
    limits: { fileSize: maxBytes, files: 1, fields: 10 },
    // Browsers send UTF-8 file names; multer's default (latin1) would garble "Närvik.csv".
    defParamCharset: 'utf8',
  }).single('file');
  return (req, res, next) => {
    handle(req, res, (err: unknown) => {
      if (!err) {
        // PostgreSQL text cannot hold NUL, and no file system names a file with one.
        if (req.file?.originalname.includes('\0')) {
          return next(new ImportFileError('BAD_FILE_NAME', 'The file name contains a NUL character; rename the file and upload it again.'));
        }
        return next();
      }
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new FileTooLargeError(maxBytes));
        return next(new ImportFileError('BAD_UPLOAD', `Upload refused (${err.message}); send one file in the multipart field "file".`));
      }
      next(new ImportFileError('BAD_UPLOAD', `The upload could not be read: ${(err as Error).message}`));
    });
  };
}
