// Turns uploaded bytes into text, refusing empty, binary and non-UTF-8 files before any parsing.
import { ImportFileError } from './errors';

const BOM = '\uFEFF';

export function decodeUpload(bytes: Buffer): string {
  if (bytes.length === 0) throw new ImportFileError('EMPTY_FILE', 'The file is empty.');
  // Text formats never contain NUL; its presence means a binary file (image, archive, spreadsheet …).
  const nulAt = bytes.indexOf(0);
  if (nulAt >= 0) {
    throw new ImportFileError('BINARY_FILE', `The file looks binary (a NUL byte at offset ${nulAt}); upload a JSON, GraphML or CSV text file.`);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new ImportFileError('NOT_UTF8', `The file is not valid UTF-8 text (first bad byte near offset ${firstBadUtf8(bytes)}); save it as UTF-8 and upload again.`);
  }
  if (text.startsWith(BOM)) text = text.slice(1);
  if (text.trim() === '') throw new ImportFileError('EMPTY_FILE', 'The file holds only white space.');
  return text;
}

/** Smallest prefix length that fails to decode: where the bad byte is, for the message. */
function firstBadUtf8(bytes: Buffer): number {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let lo = 0;
  let hi = bytes.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    try {
      decoder.decode(bytes.subarray(0, mid + 1), { stream: true });
      lo = mid + 1;
    } catch {
      hi = mid;
    }
  }
  return lo;
}
