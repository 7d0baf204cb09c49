// How inventory figures read on screen: units in every label, service types by their 3GPP names.
import type { SITE_KINDS } from '@/shared/scenario';

export { sstName } from '@/shared/slice-service-type';

/** S-NSSAI as SST-SD in hex, or the SST alone when the slice has no SD (FFFFFF on the wire). */
export function formatSnssai(sst: number, sd: string | null): string {
  const sstHex = sst.toString(16).toUpperCase().padStart(2, '0');
  if (!sd || sd.toUpperCase() === 'FFFFFF') return sstHex;
  return `${sstHex}-${sd.toUpperCase()}`;
}

function trimmed(value: number, digits: number): string {
  return Number(value.toFixed(digits)).toLocaleString('en-GB', { maximumFractionDigits: digits });
}

export const formatGbps = (gbps: number) => `${trimmed(gbps, 2)} Gbit/s`;
export const formatKm = (km: number) => `${trimmed(km, 1)} km`;
export const formatMs = (ms: number) => `${trimmed(ms, 3)} ms`;
export const formatCpu = (cpu: number) => `${trimmed(cpu, 1)} vCPU`;
export const formatHours = (hours: number | null) => (hours === null ? '—' : `${trimmed(hours, 0)} h`);
export const formatAvailability = (a: number | null) => (a === null ? '—' : `${trimmed(a * 100, 4)} %`);

const KIND_LABELS: Record<(typeof SITE_KINDS)[number], string> = {
  core: 'Core',
  aggregation: 'Aggregation',
  edge: 'Edge',
  'cell-site': 'Cell site',
};

export function siteKindLabel(kind: (typeof SITE_KINDS)[number]): string {
  return KIND_LABELS[kind];
}

/** Revision times in the viewer's zone, to the minute. */
export function formatWhen(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
}
