// Words for the Outbox: recipients, sizes, and an invitation's method and times.
import type { OutboxEventTime } from '@/shared/outbox';
import { formatInstant } from '@/components/time';

export function formatSizeBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** "a@x, b@y" or "a@x and 3 more" when the list would not fit a row. */
export function recipientsLine(to: readonly string[], shown = 2): string {
  if (to.length === 0) return 'no recipients';
  if (to.length <= shown) return to.join(', ');
  return `${to.slice(0, shown).join(', ')} and ${to.length - shown} more`;
}

/** iTIP methods in plain words (RFC 5546 §1.4). */
const METHOD_WORDS: Record<string, string> = {
  REQUEST: 'Invitation (REQUEST)',
  CANCEL: 'Cancellation (CANCEL)',
  PUBLISH: 'Published event (PUBLISH)',
  REPLY: 'Reply (REPLY)',
};

export function methodWords(method: string | null): string {
  if (!method) return 'No method given';
  return METHOD_WORDS[method.toUpperCase()] ?? method;
}

/** An event time for people: in the viewer's zone when it is a UTC instant, else as written with its zone. */
export function eventTimeWords(time: OutboxEventTime | null, viewerZone: string): string {
  if (!time) return '—';
  if (time.iso) return formatInstant(time.iso, viewerZone);
  const m = /^(\d{4})(\d{2})(\d{2})(?:T(\d{2})(\d{2}))?/.exec(time.value);
  const written = m ? `${m[1]}-${m[2]}-${m[3]}${m[4] ? ` ${m[4]}:${m[5]}` : ''}` : time.value;
  return time.timeZone ? `${written} (${time.timeZone})` : `${written} (floating time)`;
}
