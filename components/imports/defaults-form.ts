// The "Fill what the file lacks" form as text the user types, and its check into the `defaults` an upload sends.
import { DEFAULT_ROUTE_FACTOR, ROUTE_FACTOR_MAX, ROUTE_FACTOR_MIN, type ImportDefaultsInput } from '@/shared/imports';

export const SITE_KIND_CHOICES = [
  { value: 'none', label: 'Leave missing' },
  { value: 'by-degree', label: 'By number of spans' },
  { value: 'core', label: 'Core' },
  { value: 'aggregation', label: 'Aggregation' },
  { value: 'edge', label: 'Edge' },
] as const;
export type SiteKindChoice = (typeof SITE_KIND_CHOICES)[number]['value'];

/** Site kinds that can carry a compute default, in the order the form shows them. */
export const CPU_KINDS = [
  { kind: 'core', label: 'Core site compute (vCPU)' },
  { kind: 'aggregation', label: 'Aggregation site compute (vCPU)' },
  { kind: 'edge', label: 'Edge site compute (vCPU)' },
  { kind: 'cell-site', label: 'Cell site compute (vCPU)' },
] as const;
type CpuKind = (typeof CPU_KINDS)[number]['kind'];

export type DefaultsForm = {
  siteKind: SiteKindChoice;
  cpu: Record<CpuKind, string>;
  spanCapacityGbps: string;
  routeFactor: string;
};

export const EMPTY_DEFAULTS_FORM: DefaultsForm = {
  siteKind: 'none',
  cpu: { core: '', aggregation: '', edge: '', 'cell-site': '' },
  spanCapacityGbps: '',
  routeFactor: String(DEFAULT_ROUTE_FACTOR),
};

export type DefaultsField = `cpu-${CpuKind}` | 'spanCapacityGbps' | 'routeFactor';
export type DefaultsErrors = Partial<Record<DefaultsField, string>>;
export type DefaultsCheck = { ok: true; defaults: ImportDefaultsInput } | { ok: false; errors: DefaultsErrors };

/** A typed number, accepting a decimal comma; undefined when left empty, NaN when it is not a number. */
function typedNumber(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

function positive(text: string, unit: string, errors: DefaultsErrors, field: DefaultsField): number | undefined {
  const value = typedNumber(text);
  if (value === undefined) return undefined;
  if (!Number.isFinite(value) || value <= 0) errors[field] = `Enter a number above 0 ${unit}, or leave it empty.`;
  return value;
}

/** Checks the form; on success, the defaults to send (only what was filled in, and the route factor). */
export function checkDefaults(form: DefaultsForm): DefaultsCheck {
  const errors: DefaultsErrors = {};
  const cpuByKind: NonNullable<ImportDefaultsInput['cpuByKind']> = {};
  for (const { kind } of CPU_KINDS) {
    const value = positive(form.cpu[kind], 'vCPU', errors, `cpu-${kind}`);
    if (value !== undefined && Number.isFinite(value)) cpuByKind[kind] = value;
  }
  const spanCapacityGbps = positive(form.spanCapacityGbps, 'Gbit/s', errors, 'spanCapacityGbps');
  const routeFactor = typedNumber(form.routeFactor);
  if (routeFactor === undefined || !Number.isFinite(routeFactor) || routeFactor < ROUTE_FACTOR_MIN || routeFactor > ROUTE_FACTOR_MAX) {
    errors.routeFactor = `Enter a factor from ${ROUTE_FACTOR_MIN} to ${ROUTE_FACTOR_MAX} (${DEFAULT_ROUTE_FACTOR} is common practice).`;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const defaults: ImportDefaultsInput = { routeFactor };
  if (form.siteKind !== 'none') defaults.siteKind = form.siteKind;
  if (Object.keys(cpuByKind).length > 0) defaults.cpuByKind = cpuByKind;
  if (spanCapacityGbps !== undefined) defaults.spanCapacityGbps = spanCapacityGbps;
  return { ok: true, defaults };
}

/** Error messages that say a value is missing from the file ("missing cpu (key …)"): the form opens itself on one. */
const MISSING_VALUE = /\bmissing\b/i;

export function hasMissingValueErrors(messages: readonly string[]): boolean {
  return messages.some((m) => MISSING_VALUE.test(m));
}
