// Import errors with fixed codes: unreadable uploads (400/413/422, nothing written) and refused applies (404/409/422).
import { AppError } from '../errors';

/** The upload cannot be read as the kind of file it claims to be; nothing is written. */
export class ImportFileError extends AppError {
  readonly status = 400;
  constructor(readonly code: string, message: string) {
    super(message);
  }
}

/** The file would cost the server too much to read (nesting, time or memory over the budget); nothing is written. */
export class ImportTooComplexError extends AppError {
  readonly status = 422;
  constructor(readonly code: 'IMPORT_FILE_TOO_COMPLEX' | 'IMPORT_PARSE_TIMEOUT', message: string) {
    super(message);
  }
}

export class FileTooLargeError extends AppError {
  readonly code = 'FILE_TOO_LARGE';
  readonly status = 413;
  constructor(maxBytes: number) {
    super(`The file is larger than the import limit of ${formatBytes(maxBytes)}.`);
  }
}

export class ImportNotFoundError extends AppError {
  readonly code = 'IMPORT_NOT_FOUND';
  readonly status = 404;
  constructor(id: string) {
    super(`No import with id "${id}".`);
  }
}

/** Apply refused: the preview had errors, the import is no longer pending, or the data changed since the preview. */
export class ImportRefusedError extends AppError {
  constructor(readonly code: string, readonly status: number, message: string) {
    super(message);
  }
}

export class ImportApplyFailedError extends AppError {
  readonly code = 'IMPORT_APPLY_FAILED';
  readonly status = 422;
  constructor(reason: string) {
    super(`The import could not be applied and nothing was changed: ${reason}`);
  }
}

export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1).replace(/\.0$/, '')} MB`;
  if (bytes >= 1024) return `${(bytes / 1024).toFixed(1).replace(/\.0$/, '')} kB`;
  return `${bytes} bytes`;
}
