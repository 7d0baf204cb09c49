// Component test of where a preview's values came from: the three counts, the per-field table, and the values of
// the file's sites and spans, each tagged in words (from file / default / derived), spans named by their sites.
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import type { ImportPreview, ImportSources } from '@/shared/imports';
import { ImportPreviewView } from '@/components/imports/import-preview-view';
import { SHOWN_VALUE_ROWS } from '@/components/imports/values-tables';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));

const none = { sites: [], spans: [], tenants: [], slices: [], placements: [], network: [] };

/** n extra sites named "Extra 1" …, read from the file, so the list runs past what is shown at first. */
function extraSites(n: number) {
  const ids = Array.from({ length: n }, (_, i) => `x${i + 1}`);
  return {
    items: ids.map((id, i) => ({ id, name: `Extra ${i + 1}`, kind: 'edge', cpu: 8, lat: 50, lon: -4 })),
    values: Object.fromEntries(ids.map((id) => [id, { name: 'file', kind: 'file', cpu: 'file', lat: 'file', lon: 'file' } as const])),
  };
}

function sources(extra = 0): ImportSources {
  const more = extraSites(extra);
  return {
    counts: { file: 9, default: 3, derived: 3 },
    fields: [
      { entity: 'sites', field: 'cpu', file: 1, default: 1, derived: 0 },
      { entity: 'spans', field: 'lengthKm', file: 0, default: 0, derived: 1 },
    ],
    values: {
      sites: {
        n1: { name: 'file', kind: 'derived', cpu: 'default', lat: 'file', lon: 'file' },
        n2: { name: 'file', kind: 'file', cpu: 'file', lat: 'file', lon: 'file' },
        ...more.values,
      },
      spans: { e1: { capacityGbps: 'default', lengthKm: 'derived', latencyMs: 'derived' } },
    },
    attributes: { site: ['label', 'Latitude', 'Longitude'], span: [] },
    recognised: { site: { name: 'label', lat: 'Latitude', lon: 'Longitude' }, span: {} },
    items: {
      sites: [
        { id: 'n1', name: 'Harbour Gate', kind: 'core', cpu: 256, lat: 50.12346, lon: -5.5 },
        { id: 'n2', name: 'Tolven Quay', kind: 'aggregation', cpu: 64, lat: 50.2, lon: -5.1 },
        ...more.items,
      ],
      spans: [{ id: 'e1', a: 'n1', b: 'n2', aName: 'Harbour Gate', bName: 'Tolven Quay', capacityGbps: 100, lengthKm: 38.4, latencyMs: 0.192 }],
    },
  };
}

function renderSources(s: ImportSources) {
  const preview: ImportPreview = {
    adds: { ...none, sites: Object.keys(s.values.sites), spans: ['e1'] }, changes: { ...none }, removes: { ...none },
    errors: [], warnings: [], counts: { adds: 3, changes: 0, removes: 0, errors: 0, warnings: 0 }, sources: s,
  };
  render(
    <ImportPreviewView record={{ id: 'imp-1', kind: 'graphml', fileName: 'coast.graphml', status: 'previewed', preview }}
      onApply={jest.fn()} applying={false} applyError={null} applied={null} tableLayout="columns" />,
  );
}

test('the counts say how many values came from the file, from defaults and by derivation', () => {
  renderSources(sources());
  expect(screen.getByTestId('import-sources-count-file')).toHaveTextContent('9values from the file');
  expect(screen.getByTestId('import-sources-count-default')).toHaveTextContent('3values from defaults');
  expect(screen.getByTestId('import-sources-count-derived')).toHaveTextContent('3values derived');
  const fields = screen.getByTestId('import-sources-fields');
  expect(fields).toHaveTextContent(/Site · Compute \(vCPU\).*1 value.*1 value.*0 values/);
  expect(fields).toHaveTextContent(/Span · Length \(km\).*0 values.*0 values.*1 value/);
});

test('each value shows its unit and a word for its source; spans are named by their sites', () => {
  renderSources(sources());
  expect(screen.getByTestId('import-value-n1-cpu')).toHaveTextContent('256 vCPUdefault');
  expect(screen.getByTestId('import-value-n1-kind')).toHaveTextContent('Corederived');
  expect(screen.getByTestId('import-value-n1-lat')).toHaveTextContent('50.1235°from file');
  const spans = screen.getByTestId('import-values-spans');
  expect(spans).toHaveTextContent(/Harbour Gate — Tolven Quay/);
  expect(within(spans).getByTestId('import-value-e1-lengthKm')).toHaveTextContent('38.4 kmderived');
  expect(within(spans).getByTestId('import-value-e1-latencyMs')).toHaveTextContent('0.192 msderived');
  expect(within(spans).getByTestId('import-value-e1-capacityGbps')).toHaveTextContent('100 Gbit/sdefault');
});

test('a long list shows its first rows, then all of them on "Show all"', () => {
  renderSources(sources(SHOWN_VALUE_ROWS + 5));
  const total = SHOWN_VALUE_ROWS + 7;
  expect(screen.queryByTestId('import-value-x25-name')).toBeNull();
  fireEvent.press(screen.getByTestId('import-values-sites-show-all'));
  expect(screen.getByTestId('import-value-x25-name')).toHaveTextContent('Extra 25from file');
  expect(screen.getByTestId('import-value-x1-name')).toHaveTextContent('Extra 1from file');
  expect(screen.queryByTestId('import-values-sites-show-all')).toBeNull();
  expect(screen.getByText(`Sites in the file (${total})`)).toBeTruthy();
});
