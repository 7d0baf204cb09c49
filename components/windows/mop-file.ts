// The method-of-procedure document chosen for upload: what may be attached and how big it may be.

/** PDF or plain text, as the issue asks; anything else is refused before upload. */
export const MOP_MIME_TYPES = ['application/pdf', 'text/plain'] as const;
/** Same cap the server enforces; a scanned MOP over this is usually a photo album, not a procedure. */
export const MOP_MAX_BYTES = 10 * 1024 * 1024;

export type MopFile = { name: string; sizeBytes: number; mime: string; uri: string; blob?: Blob };

function mimeFromName(name: string): string | null {
  if (/\.pdf$/i.test(name)) return 'application/pdf';
  if (/\.(txt|text|md)$/i.test(name)) return 'text/plain';
  return null;
}

/** The file's type, trusting its name where the picker gave none; null when it is neither PDF nor text. */
export function mopMime(name: string, mime?: string | null): string | null {
  const clean = (mime ?? '').split(';')[0].trim().toLowerCase();
  if ((MOP_MIME_TYPES as readonly string[]).includes(clean)) return clean;
  if (!clean || clean === 'application/octet-stream') return mimeFromName(name);
  return null;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Why the file cannot be attached, in words for the person choosing it; null when it can. */
export function mopProblem(file: { name: string; sizeBytes: number; mime: string | null }): string | null {
  if (!file.mime) return `“${file.name}” is not a PDF or text file. Attach the MOP as PDF or plain text.`;
  if (file.sizeBytes > MOP_MAX_BYTES) {
    return `“${file.name}” is ${formatBytes(file.sizeBytes)}; the limit is ${formatBytes(MOP_MAX_BYTES)}. Shrink it or attach a text version.`;
  }
  if (file.sizeBytes === 0) return `“${file.name}” is empty.`;
  return null;
}
