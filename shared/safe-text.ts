// Text that can be stored: no NUL (PostgreSQL text and jsonb refuse U+0000) and no lone UTF-16 surrogate (not
// Unicode; jsonb refuses it and UTF-8 encoders silently replace it). One check for the API and the imports.
import { z } from 'zod';

export const BAD_TEXT_MESSAGE = 'must not contain a NUL character (U+0000) or an unpaired UTF-16 surrogate';

/** What is wrong with `text`, or null: "a NUL character" / "an unpaired UTF-16 surrogate". Linear in the length. */
export function badTextReason(text: string): string | null {
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    if (unit === 0) return 'a NUL character (U+0000)';
    if (unit >= 0xd800 && unit <= 0xdbff) {
      const next = i + 1 < text.length ? text.charCodeAt(i + 1) : 0;
      if (next >= 0xdc00 && next <= 0xdfff) { i++; continue; }
      return 'an unpaired UTF-16 surrogate';
    }
    if (unit >= 0xdc00 && unit <= 0xdfff) return 'an unpaired UTF-16 surrogate';
  }
  return null;
}

/** A zod string that refuses NUL and lone surrogates; chain `.min(1)` etc. as on `z.string()`. */
export function safeText(message: string = BAD_TEXT_MESSAGE) {
  return z.string().refine((text) => badTextReason(text) === null, message);
}

/** `text` with each NUL and lone surrogate written as a visible `\uXXXX` escape, for messages that quote input. */
export function printableText(text: string): string {
  if (badTextReason(text) === null) return text;
  // The `u` flag matches whole code points, so a proper surrogate pair is never split.
  return text.replace(/[\0\p{Cs}]/gu, (ch) => `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
