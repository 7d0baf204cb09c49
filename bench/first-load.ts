// First load of the sign-in and calendar screens in Chromium over a throttled mobile link: bytes transferred
// and the time until the screen is usable, once as served and once with compression refused.
// Usage: E2E_BASE_URL=http://127.0.0.1:8099 npm run bench:first-load   (a running server with the demo data)
// The link is a mid 4G profile as commonly used for web performance budgets: 9 Mbit/s down, 1.5 Mbit/s up,
// 85 ms round-trip latency, applied with the DevTools protocol's Network.emulateNetworkConditions.
import { performance } from 'node:perf_hooks';
import { chromium, type CDPSession, type Locator, type Page } from 'playwright-core';

const BASE_URL = process.env.E2E_BASE_URL ?? process.env.BASE_URL ?? 'http://127.0.0.1:8099';
const EMAIL = process.env.BENCH_EMAIL ?? 'planner@demo.test';
const PASSWORD = process.env.BENCH_PASSWORD ?? 'demo-password-1';
const MID_4G = { offline: false, latency: 85, downloadThroughput: (9_000_000 / 8), uploadThroughput: (1_500_000 / 8) };
const SCREEN_TIMEOUT_MS = 120_000;

type Traffic = { requests: number; transferredBytes: number; decodedBytes: number };
type Row = { mode: string; screen: string; traffic: Traffic; usableMs: number };

/** Counts what crosses the (emulated) network from now on: bytes on the wire, headers included, and bytes after decoding. */
function countTraffic(cdp: CDPSession): { read: () => Traffic; stop: () => void } {
  const traffic: Traffic = { requests: 0, transferredBytes: 0, decodedBytes: 0 };
  const onData = (e: { dataLength: number }) => { traffic.decodedBytes += e.dataLength; };
  const onFinished = (e: { encodedDataLength: number }) => { traffic.requests += 1; traffic.transferredBytes += e.encodedDataLength; };
  cdp.on('Network.dataReceived', onData);
  cdp.on('Network.loadingFinished', onFinished);
  return {
    read: () => ({ ...traffic }),
    stop: () => { cdp.off('Network.dataReceived', onData); cdp.off('Network.loadingFinished', onFinished); },
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

async function run(mode: string, extraHeaders: Record<string, string>): Promise<Row[]> {
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update',
      '--disable-sync', '--no-first-run', '--disable-quic'],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    // A first visit: nothing cached, for either screen.
    await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
    await cdp.send('Network.emulateNetworkConditions', MID_4G);
    if (Object.keys(extraHeaders).length > 0) await cdp.send('Network.setExtraHTTPHeaders', { headers: extraHeaders });
    const rows: Row[] = [];
    rows.push(await measure(page, cdp, mode, 'Sign-in', `${BASE_URL}/sign-in`, page.getByTestId('sign-in-submit')));
    await page.getByTestId('sign-in-email').fill(EMAIL);
    await page.getByTestId('sign-in-password').fill(PASSWORD);
    await page.getByTestId('sign-in-submit').click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: SCREEN_TIMEOUT_MS });
    // The calendar is usable when its month is shown and windows can be booked (the planner's main action).
    rows.push(await measure(page, cdp, mode, 'Calendar', `${BASE_URL}/calendar`, page.getByTestId('calendar-book')));
    return rows;
  } finally {
    await browser.close();
  }
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} KB`;

async function main() {
  const health = await fetch(`${BASE_URL}/api/health`).catch(() => null);
  if (!health?.ok) throw new Error(`no server answers at ${BASE_URL} (set E2E_BASE_URL)`);
  console.log(`first-load: ${BASE_URL}, mid 4G (9 Mbit/s down, 1.5 Mbit/s up, 85 ms latency), cache off, 390×844 px, as ${EMAIL}`);
  const rows = [
    ...(await run('compressed (br, gzip accepted)', {})),
    ...(await run('uncompressed (Accept-Encoding: identity)', { 'Accept-Encoding': 'identity' })),
  ];
  for (const row of rows) {
    console.log(
      `${row.screen.padEnd(9)} ${row.mode.padEnd(41)} ${String(row.traffic.requests).padStart(3)} requests, ` +
        `${kb(row.traffic.transferredBytes).padStart(8)} transferred (${kb(row.traffic.decodedBytes)} decoded), ` +
        `usable after ${(row.usableMs / 1000).toFixed(2)} s`,
    );
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
