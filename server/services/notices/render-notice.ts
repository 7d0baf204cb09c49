// The e-mail subject and plain-text body of a notice, rendered from its content (the portal shows the same).
import type { NoticeContent } from '../../../shared/notices';

export type RenderMeta = { sequence: number; portalUrl: string };

export function noticeSubject(c: NoticeContent, sequence: number): string {
  const prefix = c.cancelled ? 'Cancelled: ' : sequence > 0 ? 'Updated: ' : '';
  return `${prefix}${c.summary} — ${c.whenLocal}`;
}

function sliceBlock(s: NoticeContent['slices'][number]): string[] {
  const head = `* ${s.name} (${s.slice})${s.critical ? ' — critical service' : ''}`;
  return [head, ...s.changes.map((line) => `    ${line}`), `    ${s.effectText}`];
}

export function noticeBody(c: NoticeContent, meta: RenderMeta): string {
  const lines: string[] = [`Dear ${c.tenantName},`, ''];
  if (c.cancelled) {
    lines.push(`The planned work below has been withdrawn; nothing will change on your slices. Please remove it from your calendar.`, '');
  } else if (meta.sequence > 0) {
    lines.push('This notice replaces the one we sent earlier for the same work.', '');
  }
  lines.push(
    `${c.summary}`,
    `When (your zone): ${c.whenLocal}`,
    `When (UTC):       ${c.whenUtc}`, '',
  );
  if (!c.cancelled) {
    lines.push('Your slices affected:', ...c.slices.flatMap(sliceBlock), '', `Expected effect: ${c.effectText}`, c.afterWork, '');
    if (c.slices.some((s) => s.critical)) {
      lines.push('Some of these slices carry critical services: please coordinate with your own operations and follow the rules that apply to them.', '');
    }
  }
  if (c.leadOverrideReason) {
    lines.push(`This notice reaches you with less than the agreed ${c.leadDays} days of notice. Reason: ${c.leadOverrideReason}`, '');
  }
  lines.push(
    `Questions: ${c.contact.name}, ${c.contact.email}`,
    `Read and acknowledge this notice: ${meta.portalUrl}`,
  );
  return lines.join('\n');
}
