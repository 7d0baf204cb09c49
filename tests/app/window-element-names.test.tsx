// The booking form and the window page name sites and spans the way people know them — a site by its name, kind,
// compute and place, a span by its two ends, capacity and length — and never show an element's id, even though
// typing an id in the search still finds the element. Conflict reasons on the window page name them too.
import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { BookWindow } from '@/components/windows/book-window';
import { EditWindow } from '@/components/windows/edit-window';
import { WindowElementsList } from '@/components/windows/window-elements-list';
import { ConflictsList } from '@/components/windows/conflicts-list';
import { siteWords, spanWords } from '@/components/windows/element-words';
import { clearQueries, engineer, renderWithQueries, routedFetch, siteList, windowFixture } from './window-test-kit';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn(async () => ({ canceled: true, assets: null })) }));

const OSLO = 'Europe/Oslo';
const policies = { policies: { maxWindowHours: 12, bookingSkewMinutes: 5, noticeLeadDays: 7 } };
const SITE_ID = 'cell-pellow-sands';
const SPAN_ID = 'sp-017';

const span = {
  id: SPAN_ID, a: 'agg-gullhaven', b: 'core-orrindale', aName: 'Gullhaven', bName: 'Orrindale', capacityGbps: 100,
  lengthKm: 42.35, latencyMs: 0.21, latencyDerived: true, mtbfHours: null, mttrHours: null, srlg: [], usedGbps: 12,
  utilisation: 0.12, sliceCount: 4,
};
const spanList = { items: [span], total: 1, page: 1, pageSize: 12 };
const site = { ...siteList.items[0], kind: 'cell-site' as const };
const siteDetail = { site, spans: [], hosted: [], transit: [] };

const sliceDetail = {
  slice: {
    id: 'sl-grid', name: 'Grid telemetry', tenantId: 't-1', tenantName: 'Ambry Power', sst: 3, sd: null, priority: 2,
    critical: true, status: 'active', functionCount: 2, tieCount: 1, cpu: 8, bandwidthGbps: 0.5, revision: 1,
  },
  functions: [], ties: [], history: [],
};

afterEach(clearQueries);

/** No text anywhere inside `node` contains one of the ids. */
function expectNoIds(node: Parameters<typeof within>[0], ids: readonly string[]) {
  for (const id of ids) expect(within(node).queryAllByText(new RegExp(id))).toEqual([]);
}

test('site words: name, then kind, compute with its unit and place in degrees', () => {
  expect(siteWords(site)).toEqual({ name: 'Pellow Sands', detail: 'Cell site · 32 vCPU · 55.10° N, 26.20° W' });
  expect(siteWords({ name: 'Vellaport', kind: 'core', cpu: 640, lat: -33.9, lon: 18.4 }).detail).toBe('Core site · 640 vCPU · 33.90° S, 18.40° E');
});

test('span words: the two ends with an en dash, then capacity and length with units', () => {
  expect(spanWords(span)).toEqual({ name: 'Gullhaven – Orrindale', detail: 'Span · 100 Gbit/s · 42.4 km' });
});

test('search results and the picked list show names and what tells elements apart, never ids', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/policies$/, reply: () => ({ status: 200, body: policies }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'GET', path: /^\/api\/spans\?/, reply: () => ({ status: 200, body: spanList }) },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={jest.fn()} onCancel={jest.fn()} />);

  const siteOption = await screen.findByTestId(`window-element-option-${SITE_ID}`);
  expect(siteOption).toHaveTextContent(/Pellow Sands/);
  expect(screen.getByTestId(`window-element-option-${SITE_ID}-detail`)).toHaveTextContent('Cell site · 32 vCPU · 55.10° N, 26.20° W');
  expectNoIds(siteOption, [SITE_ID]);
  fireEvent.press(siteOption);

  const pickedSite = screen.getByTestId(`window-picked-${SITE_ID}`);
  expect(screen.getByTestId(`window-picked-${SITE_ID}-name`)).toHaveTextContent('Pellow Sands');
  expect(screen.getByTestId(`window-picked-${SITE_ID}-detail`)).toHaveTextContent('Cell site · 32 vCPU · 55.10° N, 26.20° W');
  expectNoIds(pickedSite, [SITE_ID]);

  fireEvent(screen.getByTestId('window-element-kind-span'), 'press');
  const spanOption = await screen.findByTestId(`window-element-option-${SPAN_ID}`);
  expect(spanOption).toHaveTextContent(/Gullhaven – Orrindale/);
  expect(screen.getByTestId(`window-element-option-${SPAN_ID}-detail`)).toHaveTextContent('Span · 100 Gbit/s · 42.4 km');
  expectNoIds(spanOption, [SPAN_ID]);
  fireEvent.press(spanOption);

  const pickedSpan = screen.getByTestId(`window-picked-${SPAN_ID}`);
  expect(screen.getByTestId(`window-picked-${SPAN_ID}-name`)).toHaveTextContent('Gullhaven – Orrindale');
  expect(screen.getByTestId(`window-picked-${SPAN_ID}-detail`)).toHaveTextContent('Span · 100 Gbit/s · 42.4 km');
  expectNoIds(pickedSpan, [SPAN_ID, 'agg-gullhaven', 'core-orrindale']);
  // The controls inside a row are named for people too.
  expect(within(pickedSpan).getByLabelText('Remove Gullhaven – Orrindale')).toBeTruthy();
});

test('typing an id still finds the element, which is shown by its name', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/policies$/, reply: () => ({ status: 200, body: policies }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={jest.fn()} onCancel={jest.fn()} />);
  await screen.findByTestId(`window-element-option-${SITE_ID}`);
  fireEvent.changeText(screen.getByTestId('window-element-search'), SITE_ID);
  await waitFor(() => expect(calls.some((c) => c.url.includes(`q=${SITE_ID}`))).toBe(true));
  const option = await screen.findByTestId(`window-element-option-${SITE_ID}`);
  expect(option).toHaveTextContent(/Pellow Sands/);
  expectNoIds(option, [SITE_ID]);
});

test('a saved window opened for editing looks its elements up and names them, never by id', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'GET', path: new RegExp(`^/api/sites/${SITE_ID}$`), reply: () => ({ status: 200, body: siteDetail }) },
  ]);
  renderWithQueries(
    <EditWindow window={windowFixture()} me={engineer} timeZone={OSLO} onReload={jest.fn()} reloading={false} onSaved={jest.fn()} onCancel={jest.fn()} />,
  );
  const name = screen.getByTestId(`window-picked-${SITE_ID}-name`);
  expect(name).not.toHaveTextContent(SITE_ID);
  await waitFor(() => expect(screen.getByTestId(`window-picked-${SITE_ID}-name`)).toHaveTextContent('Pellow Sands'));
  expect(screen.getByTestId(`window-picked-${SITE_ID}-detail`)).toHaveTextContent('Cell site · 32 vCPU · 55.10° N, 26.20° W');
  expectNoIds(screen.getByTestId('window-picked-elements'), [SITE_ID]);
  expect(calls.some((c) => c.url.endsWith(`/api/sites/${SITE_ID}`))).toBe(true);
});

test('the window page lists its elements by name, and one gone from the inventory is said so', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/spans\/sp-017$/, reply: () => ({ status: 200, body: { span, slices: [] } }) },
    { method: 'GET', path: /^\/api\/sites\/cell-gone$/, reply: () => ({ status: 404, body: { error: { code: 'SITE_NOT_FOUND', message: 'No such site.' } } }) },
  ]);
  renderWithQueries(<WindowElementsList elements={[
    { kind: 'span', id: SPAN_ID, effect: 'reduced', fraction: 0.4 },
    { kind: 'site', id: 'cell-gone', effect: 'down', fraction: null },
  ]} />);
  await waitFor(() => expect(screen.getByTestId(`window-element-${SPAN_ID}`)).toHaveTextContent(/Gullhaven – Orrindale/));
  expect(screen.getByTestId(`window-element-${SPAN_ID}-detail`)).toHaveTextContent('Span · 100 Gbit/s · 42.4 km');
  await waitFor(() => expect(screen.getByTestId('window-element-cell-gone')).toHaveTextContent(/A site no longer in the inventory/));
  expectNoIds(screen.getByTestId('window-elements'), [SPAN_ID, 'cell-gone']);
});

test('conflict reasons name the shared elements and the cut-off slices, never by id', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/spans\/sp-017$/, reply: () => ({ status: 200, body: { span, slices: [] } }) },
    { method: 'GET', path: new RegExp(`^/api/sites/${SITE_ID}$`), reply: () => ({ status: 200, body: siteDetail }) },
    { method: 'GET', path: /^\/api\/slices\/sl-grid$/, reply: () => ({ status: 200, body: sliceDetail }) },
  ]);
  const reasons = [
    { reason: 'shared-element' as const, message: `Both windows take out site:${SITE_ID}, span:${SPAN_ID}.`, ids: [`site:${SITE_ID}`, `span:${SPAN_ID}`] },
    { reason: 'strands-slice' as const, message: 'Together the windows cut off parts of 1 slice(s): sl-grid.', ids: ['sl-grid'] },
  ];
  const other = { id: 'w-2', title: 'Duct repair', startsAt: '2030-01-10T23:00:00.000Z', endsAt: '2030-01-11T03:00:00.000Z', status: 'draft' as const };
  renderWithQueries(<ConflictsList conflicts={[{ window: other, reasons }]} timeZone={OSLO} onOpenWindow={jest.fn()} />);
  const conflict = screen.getByTestId('window-conflict-w-2');
  await waitFor(() => expect(conflict).toHaveTextContent(/Both windows take out site Pellow Sands and span Gullhaven – Orrindale\./));
  await waitFor(() => expect(conflict).toHaveTextContent(/Together the windows cut off parts of the slice "Grid telemetry"\./));
  for (const id of [SITE_ID, SPAN_ID, 'sl-grid']) expect(conflict).not.toHaveTextContent(new RegExp(id));
});
