// Component test of the import form's "Fill what the file lacks" section and the mapping step: bad values are
// caught before anything is sent, the `defaults` sent are what was typed, a preview with missing values opens the
// section, and "Preview again" sends the same file with the picked `mapping` without opening the picker again.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import * as DocumentPicker from 'expo-document-picker';
import type { ImportCreated, ImportPreview, ImportSources } from '@/shared/imports';
import { ImportsView } from '@/components/imports/imports-view';
import { checkDefaults, EMPTY_DEFAULTS_FORM } from '@/components/imports/defaults-form';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));
// Only the links shown after an apply use the router; a plain text stands in for them.
jest.mock('expo-router', () => ({ Link: ({ children }: { children: string }) => children }));
const getDocument = DocumentPicker.getDocumentAsync as jest.Mock;

afterEach(() => {
  clearQueries();
  getDocument.mockReset();
});

const none = { sites: [], spans: [], tenants: [], slices: [], placements: [], network: [] };

function created(id: string, extra: Partial<ImportPreview> = {}): ImportCreated {
  const preview: ImportPreview = {
    adds: { ...none, sites: ['n1', 'n2'] }, changes: { ...none }, removes: { ...none }, errors: [], warnings: [],
    counts: { adds: 2, changes: 0, removes: 0, errors: 0, warnings: 0 }, ...extra,
  };
  return { id, kind: 'graphml', fileName: 'coast.graphml', preview };
}

const SOURCES: ImportSources = {
  counts: { file: 4, default: 2, derived: 1 },
  fields: [{ entity: 'sites', field: 'name', file: 2, default: 0, derived: 0 }],
  values: { sites: { n1: { name: 'file' }, n2: { name: 'file' } }, spans: {} },
  attributes: { site: ['label', 'y', 'x'], span: ['bw_bps'] },
  recognised: { site: { name: 'label' }, span: {} },
};

/** The text fields of a multipart body: React Native's FormData lists its parts, the web's answers get(). */
function formFields(body: unknown): Record<string, string> {
  const form = body as { getParts?: () => { fieldName: string; string?: string }[]; get?: (k: string) => unknown };
  if (form.getParts) {
    return Object.fromEntries(form.getParts().filter((p) => typeof p.string === 'string').map((p) => [p.fieldName, p.string as string]));
  }
  const fields: Record<string, string> = {};
  for (const key of ['kind', 'defaults', 'mapping']) {
    const value = form.get?.(key);
    if (typeof value === 'string') fields[key] = value;
  }
  return fields;
}

function pickerGives(name: string) {
  getDocument.mockResolvedValue({ canceled: false, assets: [{ name, uri: `file:///picked/${name}`, mimeType: 'application/xml' }] });
}

/** Answers uploads with `replies` in turn; `uploads()` lists the uploads sent so far (other reads, e.g. of the
 * signed-in user, are left out). */
function postImports(replies: ImportCreated[]) {
  let next = 0;
  const { calls } = routedFetch([
    { method: 'POST', path: /\/api\/imports$/, reply: () => ({ status: 201, body: replies[Math.min(next++, replies.length - 1)] }) },
  ]);
  return { uploads: () => calls.filter((c) => c.method === 'POST' && /\/api\/imports$/.test(c.url)) };
}

const type = (testID: string, text: string) => fireEvent.changeText(screen.getByTestId(testID), text);

test('bad defaults show an error beside each field, and neither the picker nor the upload runs', async () => {
  pickerGives('coast.graphml');
  const { uploads } = postImports([created('imp-1')]);
  renderWithQueries(<ImportsView history={[]} />);
  expect(screen.queryByTestId('import-defaults-body')).toBeNull();
  expect(screen.getByTestId('import-defaults-toggle')).not.toBeExpanded();
  fireEvent.press(screen.getByTestId('import-defaults-toggle'));
  type('import-default-cpu-core', '-4');
  type('import-default-span-capacity', 'lots');
  type('import-default-route-factor', '5');
  fireEvent.press(screen.getByTestId('import-pick'));

  expect(await screen.findByTestId('import-default-cpu-core-error')).toHaveTextContent(/above 0 vCPU/);
  expect(screen.getByTestId('import-default-span-capacity-error')).toHaveTextContent(/above 0 Gbit\/s/);
  expect(screen.getByTestId('import-default-route-factor-error')).toHaveTextContent(/from 1 to 3/);
  expect(screen.getByTestId('import-upload-error')).toHaveTextContent(/Fill what the file lacks/);
  expect(getDocument).not.toHaveBeenCalled();
  expect(uploads()).toEqual([]);
});

test('valid defaults go up as the JSON field "defaults" with only what was filled in', async () => {
  pickerGives('coast.graphml');
  const { uploads } = postImports([created('imp-1')]);
  renderWithQueries(<ImportsView history={[]} />);
  fireEvent.press(screen.getByTestId('import-defaults-toggle'));
  fireEvent.press(screen.getByTestId('import-default-site-kind-by-degree'));
  expect(screen.getByTestId('import-default-site-kind-hint')).toHaveTextContent(/top 10 % become core, the next 30 % aggregation/);
  type('import-default-cpu-core', '256');
  type('import-default-cpu-aggregation', '64');
  type('import-default-cpu-edge', '16,5');
  type('import-default-span-capacity', '100');
  fireEvent.press(screen.getByTestId('import-pick'));

  await waitFor(() => expect(uploads()).toHaveLength(1));
  const fields = formFields(uploads()[0]?.body);
  expect(JSON.parse(fields.defaults ?? 'null')).toEqual({
    siteKind: 'by-degree', cpuByKind: { core: 256, aggregation: 64, edge: 16.5 }, spanCapacityGbps: 100, routeFactor: 1.3,
  });
  expect(fields.mapping).toBeUndefined();
});

test('with the section closed no defaults are sent; a preview with missing values opens it', async () => {
  pickerGives('coast.graphml');
  const missing = created('imp-1', {
    errors: [{ file: 'coast.graphml', path: 'node[n2]', message: 'missing cpu (key cpu or vcpu) for a new site' }],
    counts: { adds: 2, changes: 0, removes: 0, errors: 1, warnings: 0 },
  });
  const { uploads } = postImports([missing]);
  renderWithQueries(<ImportsView history={[]} />);
  fireEvent.press(screen.getByTestId('import-pick'));

  expect(await screen.findByTestId('import-defaults-body')).toBeTruthy();
  expect(screen.getByTestId('import-defaults-toggle')).toBeExpanded();
  expect(formFields(uploads()[0]?.body).defaults).toBeUndefined();
});

test('the mapping step starts from what was recognised, and "Preview again" sends the same file with the picks', async () => {
  pickerGives('coast.graphml');
  const { uploads } = postImports([created('imp-1', { sources: SOURCES }), created('imp-2', { sources: SOURCES })]);
  renderWithQueries(<ImportsView history={[]} />);
  fireEvent.press(screen.getByTestId('import-pick'));

  // A clean preview keeps the step closed behind its title.
  expect(await screen.findByTestId('import-mapping-toggle')).not.toBeExpanded();
  expect(screen.queryByTestId('import-preview-again')).toBeNull();
  fireEvent.press(screen.getByTestId('import-mapping-toggle'));
  expect(screen.getByTestId('import-mapping-site-attributes')).toHaveTextContent(/label, y, x/);
  expect(screen.getByTestId('import-map-site-name-a:label')).toBeChecked();
  expect(screen.getByTestId('import-map-site-lat-none')).toBeChecked();
  fireEvent.press(screen.getByTestId('import-map-site-lat-a:y'));
  fireEvent.press(screen.getByTestId('import-map-site-lon-a:x'));
  fireEvent.press(screen.getByTestId('import-map-span-capacityGbps-a:bw_bps'));
  fireEvent.press(screen.getByTestId('import-preview-again'));

  await waitFor(() => expect(uploads()).toHaveLength(2));
  const fields = formFields(uploads()[1]?.body);
  expect(JSON.parse(fields.mapping ?? 'null')).toEqual({ site: { name: 'label', lat: 'y', lon: 'x' }, span: { capacityGbps: 'bw_bps' } });
  expect(fields.kind).toBe('graphml');
  expect(getDocument).toHaveBeenCalledTimes(1);
});

test('checkDefaults: an empty form sends only the route factor; out-of-range factors are refused', () => {
  expect(checkDefaults(EMPTY_DEFAULTS_FORM)).toEqual({ ok: true, defaults: { routeFactor: 1.3 } });
  for (const routeFactor of ['0.9', '3.01', '', 'x']) {
    const check = checkDefaults({ ...EMPTY_DEFAULTS_FORM, routeFactor });
    expect(check.ok).toBe(false);
  }
  expect(checkDefaults({ ...EMPTY_DEFAULTS_FORM, routeFactor: '3' })).toEqual({ ok: true, defaults: { routeFactor: 3 } });
  expect(checkDefaults({ ...EMPTY_DEFAULTS_FORM, cpu: { ...EMPTY_DEFAULTS_FORM.cpu, 'cell-site': '0' } }).ok).toBe(false);
});
