// The changed fields of an audit row in words ("Status: Draft → Assessed"), never the before/after records as
// stored, and never a password, token, code, hash or key, whatever the row holds.
import { formatAtIn } from '../pack/moves-csv';

/** Fields never shown, not even by name of their value: secrets and their look-alikes. */
const SECRET_FIELD = /pass|token|secret|hash|code|otp|cookie|key|checksum|salt/i;
/** Book-keeping that says nothing to a person (ids, versions, raw placements and engine settings). */
const QUIET_FIELDS = new Set([
  'id', 'version', 'windowVersion', 'revision', 'previousPlanId', 'createdBy', 'createdAt', 'updatedBy', 'updatedAt',
  'sites', 'paths', 'settings', 'reservedFor', 'ownerId', 'tenantId', 'mime', 'sequence', 'comment', 'reason',
  // the window's own copy of the sign-off round, written beside `round`
  'reviewRound',
]);

type Field = { label: string; value?: (v: unknown) => string | null };

const words = (v: unknown) => (typeof v === 'string' ? v.replace(/-/g, ' ').replace(/^./, (c) => c.toUpperCase()) : null);
const yesNo = (v: unknown) => (typeof v === 'boolean' ? (v ? 'yes' : 'no') : null);
const plain = (v: unknown) => (typeof v === 'string' && v.length <= 80 ? v : null);
const bytes = (v: unknown) => (typeof v === 'number' ? `${Math.max(1, Math.round(v / 1024))} KiB` : null);
const count = (unit: string) => (v: unknown) => (typeof v === 'number' ? `${v} ${unit}${v === 1 ? '' : 's'}` : null);

/** Known fields: their words and, where a person can read it, how to show the value. */
const FIELDS: Record<string, Field> = {
  status: { label: 'Status', value: words },
  title: { label: 'Title', value: plain },
  name: { label: 'Name', value: plain },
  email: { label: 'E-mail address', value: plain },
  role: { label: 'Role', value: words },
  roles: { label: 'Roles', value: (v) => (Array.isArray(v) ? (v.length ? v.join(', ') : 'none') : null) },
  groups: { label: 'Single sign-on groups' },
  otherSessionsEnded: { label: 'Other sessions ended', value: count('session') },
  sessionsEnded: { label: 'Sessions ended', value: count('session') },
  mailed: { label: 'Link sent by e-mail', value: yesNo },
  expiresAt: { label: 'Link good until' },
  deactivated: { label: 'Deactivated', value: yesNo },
  startsAt: { label: 'Start' },
  endsAt: { label: 'End' },
  workType: { label: 'Work type', value: plain },
  notes: { label: 'Notes' },
  elements: { label: 'Sites and spans taken out' },
  fileName: { label: 'File', value: plain },
  sizeBytes: { label: 'File size', value: bytes },
  timeZone: { label: 'Time zone', value: plain },
  accepted: { label: 'Plan accepted', value: yesNo },
  outageAccepted: { label: 'Outage accepted for unresolved slices', value: yesNo },
  decision: { label: 'Decision', value: words },
  round: { label: 'Sign-off round', value: (v) => (typeof v === 'number' ? String(v) : null) },
  riskClass: {
    label: 'Sign-off risk class (lower or higher, from the sign-off policy)',
    value: (v) => (v === 'high' ? 'higher' : v === 'low' ? 'lower' : null),
  },
  approvals: { label: 'Approvals', value: count('approval') },
  quorum: { label: 'Approvals needed', value: count('approval') },
  method: { label: 'Notice kind', value: (v) => (v === 'CANCEL' ? 'Cancellation' : v === 'REQUEST' ? 'Invitation' : null) },
  lastError: { label: 'Last sending error' },
  error: { label: 'Error' },
  counts: { label: 'Records imported' },
  kind: { label: 'Kind', value: words },
  ended: { label: 'Sessions ended', value: count('session') },
  noticeLeadDays: { label: 'Notice lead time', value: count('day') },
  maxWindowHours: { label: 'Longest window', value: count('hour') },
  bookingSkewMinutes: { label: 'Booking leeway for a start in the past', value: count('minute') },
  signoffRequireCode: { label: 'Two-step code needed to sign off', value: yesNo },
  signoffQuorumLow: { label: 'Approvals needed for lower-risk plans', value: count('approval') },
  signoffQuorumHigh: { label: 'Approvals needed for higher-risk plans (critical slice, high or critical risk, or unresolved)', value: count('approval') },
};

/** Known fields are shown (a yes/no setting may mention a code); otherwise no secrets, ids or book-keeping. */
const shownField = (k: string) => k in FIELDS || (!SECRET_FIELD.test(k) && !QUIET_FIELDS.has(k) && !/Ids?$/.test(k));

const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

/** "freezeOverrideReason" → "Freeze override reason". */
const labelOf = (key: string) => FIELDS[key]?.label ?? key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase().replace(/^./, (c) => c.toUpperCase());

function valueText(key: string, v: unknown, timeZone: string): string | null {
  if (v === null || v === undefined || v === '') return 'none';
  if (typeof v === 'string' && ISO_INSTANT.test(v) && !Number.isNaN(Date.parse(v))) return formatAtIn(new Date(v), timeZone);
  return FIELDS[key]?.value?.(v) ?? null;
}

const record = (v: unknown): Record<string, unknown> => (v && typeof v === 'object' && !Array.isArray(v) ? v as Record<string, unknown> : {});

/** At most this many lines per row; the rest is counted ("and 3 more fields"). */
export const MAX_CHANGE_LINES = 8;

/** One line per changed field: "Status: Draft → Assessed", "Title: set to Fibre splice", "Notes changed". */
export function summariseChanges(before: unknown, after: unknown, timeZone: string): string[] {
  const b = record(before);
  const a = record(after);
  const keys = [...new Set([...Object.keys(b), ...Object.keys(a)])]
    .filter((k) => shownField(k) && JSON.stringify(b[k]) !== JSON.stringify(a[k]));
  const lines = keys.map((k) => {
    const from = k in b ? valueText(k, b[k], timeZone) : null;
    const to = valueText(k, a[k], timeZone);
    if (to === null) return `${labelOf(k)} changed`;
    return from === null || !(k in b) ? `${labelOf(k)}: ${to}` : `${labelOf(k)}: ${from} → ${to}`;
  });
  if (lines.length <= MAX_CHANGE_LINES) return lines;
  const rest = lines.length - (MAX_CHANGE_LINES - 1);
  return [...lines.slice(0, MAX_CHANGE_LINES - 1), `and ${rest} more fields`];
}

const text = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v.trim() : null);

/** The comment or reason given with the action, as the window history reads it. */
export function commentOf(after: unknown): string | null {
  const a = record(after);
  return text(a.comment) ?? text(a.reason);
}
