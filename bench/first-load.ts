// First load of the sign-in and calendar screens in Chromium over a throttled mobile link: bytes transferred
// and the time until the screen is usable, once as served and once with compression refused; with the number of
// script files fetched (the entry, the common chunk, layouts and the screen's own chunks) and the targets.
// Usage: E2E_BASE_URL=http://127.0.0.1:8099 [BENCH_RUNS=5] npm run bench:first-load   (a running server with the demo data)
// The link is a mid 4G profile as commonly used for web performance budgets: 9 Mbit/s down, 1.5 Mbit/s up,
// 85 ms round-trip latency, applied with the DevTools protocol's Network.emulateNetworkConditions.
import { performance } from 'node:perf_hooks';
import { chromium, type Browser, type BrowserContext, type CDPSession, type Locator, type Page } from 'playwright-core';

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;

const BASE_URL = process.env.E2E_BASE_URL ?? process.env.BASE_URL ?? 'http://127.0.0.1:8099';
const EMAIL = process.env.BENCH_EMAIL ?? 'planner@demo.test';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'demo-password-1';
const MID_4G = { offline: false, latency: 85, downloadThroughput: (9_000_000 / 8), uploadThroughput: (1_500_000 / 8) };
const SCREEN_TIMEOUT_MS = 120_000;
/** BENCH_RUNS=5 repeats every load and reports the median run: on a busy machine one run's time says little. */
const RUNS = Math.max(1, Number(process.env.BENCH_RUNS ?? 1) || 1);
/** Targets for a compressed first load over the link above: at most 800 KB before sign-in is usable; each screen usable within 3 s. */
const TARGET = { signInBytes: 800 * 1024, usableMs: 3_000 };

type Traffic = { requests: number; scripts: number; transferredBytes: number; decodedBytes: number };
type Row = { mode: string; screen: string; traffic: Traffic; usableMs: number };

/** Counts what crosses the (emulated) network from now on: bytes on the wire, headers included, and bytes after decoding. */
function countTraffic(cdp: CDPSession): { read: () => Traffic; stop: () => void } {
  const traffic: Traffic = { requests: 0, scripts: 0, transferredBytes: 0, decodedBytes: 0 };
  const scriptIds = new Set<string>();
  const onSent = (e: { requestId: string; type?: string }) => { if (e.type === 'Script') scriptIds.add(e.requestId); };
  const onData = (e: { dataLength: number }) => { traffic.decodedBytes += e.dataLength; };
  const onFinished = (e: { requestId: string; encodedDataLength: number }) => {
    traffic.requests += 1;
    if (scriptIds.has(e.requestId)) traffic.scripts += 1;
    traffic.transferredBytes += e.encodedDataLength;
  };
  cdp.on('Network.requestWillBeSent', onSent);
  cdp.on('Network.dataReceived', onData);
  cdp.on('Network.loadingFinished', onFinished);
  return {
    read: () => ({ ...traffic }),
    stop: () => {
      cdp.off('Network.requestWillBeSent', onSent);
      cdp.off('Network.dataReceived', onData);
      cdp.off('Network.loadingFinished', onFinished);
    },
  };
}

/** Visible and enabled: a person can press it. */
async function untilUsable(target: Locator): Promise<void> {
  await target.waitFor({ state: 'visible', timeout: SCREEN_TIMEOUT_MS });
  const deadline = performance.now() + SCREEN_TIMEOUT_MS;
  while (!(await target.isEnabled())) {
    if (performance.now() > deadline) throw new Error('the control never became enabled');
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

async function measure(page: Page, cdp: CDPSession, mode: string, screen: string, url: string, target: Locator): Promise<Row> {
  // Let the network go quiet so nothing from an earlier step is counted here.
  await page.waitForLoadState('networkidle').catch(() => undefined);
  const traffic = countTraffic(cdp);
  const started = performance.now();
  await page.goto(url, { waitUntil: 'commit' });
  await untilUsable(target);
  const usableMs = performance.now() - started;
  await page.waitForLoadState('networkidle').catch(() => undefined);
  traffic.stop();
  return { mode, screen, traffic: traffic.read(), usableMs };
}

type Visit = { context: BrowserContext; page: Page; cdp: CDPSession };

/**
 * A first visit: a new browser context starts with an empty cache, as a browser that never saw the app does. (The
 * DevTools "disable cache" switch goes further than any real visit: a file asked for twice in one page, such as a
 * preloaded font, is then fetched twice.)
 */
async function firstVisit(browser: Browser, extraHeaders: Record<string, string>, storageState?: StorageState): Promise<Visit> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, storageState });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', MID_4G);
  if (Object.keys(extraHeaders).length > 0) await cdp.send('Network.setExtraHTTPHeaders', { headers: extraHeaders });
  return { context, page, cdp };
}

async function run(mode: string, extraHeaders: Record<string, string>): Promise<Row[]> {
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update',
      '--disable-sync', '--no-first-run', '--disable-quic'],
  });
  try {
    const rows: Row[] = [];
    const signIn = await firstVisit(browser, extraHeaders);
    const { page } = signIn;
    rows.push(await measure(page, signIn.cdp, mode, 'Sign-in', `${BASE_URL}/sign-in`, page.getByTestId('sign-in-submit')));
    await page.getByTestId('sign-in-email').fill(EMAIL);
    await page.getByTestId('sign-in-password').fill(PASSWORD);
    await page.getByTestId('sign-in-submit').click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: SCREEN_TIMEOUT_MS });
    // The calendar opened cold as well: the session cookie is carried over, nothing that sign-in fetched is.
    const session = await signIn.context.storageState();
    await signIn.context.close();
    const calendar = await firstVisit(browser, extraHeaders, session);
    // The calendar is usable when its month is shown and windows can be booked (the planner's main action).
    rows.push(await measure(calendar.page, calendar.cdp, mode, 'Calendar', `${BASE_URL}/calendar`, calendar.page.getByTestId('calendar-book')));
    return rows;
  } finally {
    await browser.close();
  }
}

/** Per mode and screen, the run with the median time (the lower middle one for an even count). */
function medianRows(all: Row[]): Row[] {
  const groups = new Map<string, Row[]>();
  for (const row of all) groups.set(`${row.mode}|${row.screen}`, [...(groups.get(`${row.mode}|${row.screen}`) ?? []), row]);
  return [...groups.values()].map((group) => [...group].sort((a, b) => a.usableMs - b.usableMs)[Math.floor((group.length - 1) / 2)]);
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} KB`;
const seconds = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
/** The target beside a figure, and whether it is met; the uncompressed rows are for comparison and have none. */
function versus(row: Row, figure: number, target: number | null, shown: (n: number) => string): string {
  if (target === null || !row.mode.startsWith('compressed')) return '';
  return ` [target ≤ ${shown(target)}: ${figure <= target ? 'met' : 'missed'}]`;
}

async function main() {
  const health = await fetch(`${BASE_URL}/api/health`).catch(() => null);
  if (!health?.ok) throw new Error(`no server answers at ${BASE_URL} (set E2E_BASE_URL)`);
  console.log(`first-load: ${BASE_URL}, mid 4G (9 Mbit/s down, 1.5 Mbit/s up, 85 ms latency), empty cache, 390×844 px, as ${EMAIL}; median of ${RUNS} run(s)`);
  const all: Row[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    all.push(...(await run('compressed (br, gzip accepted)', {})));
    all.push(...(await run('uncompressed (Accept-Encoding: identity)', { 'Accept-Encoding': 'identity' })));
  }
  const rows = medianRows(all);
  for (const row of rows) {
    console.log(
      `${row.screen.padEnd(9)} ${row.mode.padEnd(41)} ${String(row.traffic.requests).padStart(3)} requests ` +
        `(${String(row.traffic.scripts).padStart(2)} script files), ` +
        `${kb(row.traffic.transferredBytes).padStart(8)} transferred (${kb(row.traffic.decodedBytes)} decoded)` +
        `${versus(row, row.traffic.transferredBytes, row.screen === 'Sign-in' ? TARGET.signInBytes : null, kb)}, ` +
        `usable after ${seconds(row.usableMs)}${versus(row, row.usableMs, TARGET.usableMs, seconds)}`,
    );
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
