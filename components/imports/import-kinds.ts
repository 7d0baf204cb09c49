// Names of the import kinds as the screen shows them, and which kinds have a CSV template.
import type { ImportEntity, ImportKind } from '@/shared/imports';

export const KIND_LABELS: Record<ImportKind, string> = {
  scenario: 'Scenario (JSON)',
  graphml: 'Topology (GraphML)',
  'csv-sites': 'Sites CSV',
  'csv-spans': 'Spans CSV',
  'csv-slices': 'Slices CSV',
};

export const TEMPLATES = [
  { kind: 'csv-sites', label: 'Sites template' },
  { kind: 'csv-spans', label: 'Spans template' },
  { kind: 'csv-slices', label: 'Slices template' },
] as const;

export const ENTITY_LABELS: Record<ImportEntity, string> = {
  sites: 'Sites',
  spans: 'Spans',
  tenants: 'Tenants',
  slices: 'Slices',
  placements: 'Placements',
  network: 'Network name and outline',
};

/** File types the picker offers; the server still checks the content. */
export const PICKER_TYPES = ['.json', '.graphml', '.xml', '.csv', '.txt', 'application/json', 'text/csv', 'text/xml', 'application/xml'];
