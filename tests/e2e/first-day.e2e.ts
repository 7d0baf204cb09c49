// The first day with real data: a Slackwater started without the demo has no network and one admin (from
// ADMIN_EMAIL / ADMIN_PASSWORD). That admin imports a topology file that has coordinates, names and a few link
// speeds but no site kinds, compute or lengths, fills the gaps with defaults, applies it, and finds the network
// on the map. The suite runs its own server on its own empty database (helpers/fresh-instance.ts).
import type { Browser, Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';
import { SHOTS, launchBrowser } from './helpers/browser';
import { eventually } from './helpers/eventually';
import { startFreshInstance, type FreshInstance } from './helpers/fresh-instance';

const FILE = path.resolve(__dirname, 'fixtures/first-day-backbone.graphml');
const SITES = 12;
const SPANS = 16;

let browser: Browser;
let fresh: FreshInstance;

beforeAll(async () => {
  fresh = await startFreshInstance();
  browser = await launchBrowser();
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await fresh?.stop();
});

async function signInAsFirstAdmin(page: Page): Promise<void> {
  await page.goto(fresh.baseUrl);
  await page.getByTestId('sign-in-email').fill(fresh.adminEmail);
  await page.getByTestId('sign-in-password').fill(fresh.adminPassword);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('nav-imports').first().waitFor({ timeout: 30000 });
}

test('without the demo there is no network, no demo account, and the first admin can sign in', async () => {
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    await signInAsFirstAdmin(page);
    const sites = await context.request.get(`${fresh.baseUrl}/api/sites`);
    expect(sites.status()).toBe(200);
    const body = await sites.json() as { sites?: unknown[]; items?: unknown[]; total?: number };
    expect(body.total ?? (body.sites ?? body.items ?? []).length).toBe(0);
    const demo = await context.request.post(`${fresh.baseUrl}/api/auth/sign-in`, {
      headers: { Origin: fresh.baseUrl }, data: { email: 'admin@demo.test', password: 'demo-password-1' },
    });
    expect(demo.status()).toBeGreaterThanOrEqual(400);
    // Nothing of the demo to remove, so the overview does not offer it.
    expect(await page.getByTestId('demo-data-notice').count()).toBe(0);
  } finally {
    await context.close();
  }
});

test('the first admin imports a topology file with defaults, applies it and opens the map', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  try {
    await signInAsFirstAdmin(page);
    await page.getByTestId('nav-imports').first().click();
    await page.getByTestId('import-upload').waitFor({ timeout: 30000 });

    // Defaults for what the file lacks: kinds by number of spans, compute per kind, a capacity, the route factor as given.
    await page.getByTestId('import-defaults-toggle').click();
    await page.getByTestId('import-default-site-kind-by-degree').click();
    await page.getByTestId('import-default-cpu-core').fill('512');
    await page.getByTestId('import-default-cpu-aggregation').fill('256');
    await page.getByTestId('import-default-cpu-edge').fill('96');
    await page.getByTestId('import-default-span-capacity').fill('100');

    const chooser = page.waitForEvent('filechooser', { timeout: 15000 });
    await page.getByTestId('import-pick').click();
    await (await chooser).setFiles({ name: 'backbone.graphml', mimeType: 'application/xml', buffer: fs.readFileSync(FILE) });
    await page.getByTestId('import-file-name').getByText('backbone.graphml').waitFor({ timeout: 30000 });

    await eventually(async () => expect(await page.getByTestId('import-errors').count()).toBe(0));
    // Every site's kind is derived from its degree, its compute a default; every span's length and latency derived.
    const counts = page.getByTestId('import-sources-counts');
    await counts.waitFor({ timeout: 30000 });
    await eventually(async () => expect(await page.getByTestId('import-sources-count-derived').innerText())
      .toMatch(new RegExp(`\\b${SITES + 2 * SPANS}\\b`)));
    await eventually(async () => expect(await page.getByTestId('import-values-sites').innerText()).toContain('Harrowmere'));
    await page.screenshot({ path: path.join(SHOTS, 'first-day-import-preview-wide.png'), fullPage: true });

    await page.getByTestId('import-apply').click();
    await page.getByTestId('import-confirm-apply').click();
    await page.getByTestId('import-result').waitFor({ timeout: 30000 });
    await eventually(async () => expect(await page.getByTestId('import-result').innerText()).toMatch(new RegExp(`${SITES + SPANS} added`)));

    await page.getByTestId('nav-map').first().click();
    await page.getByTestId('map-heading').first().waitFor({ timeout: 30000 });
    // The list of sites is open on a wide screen and folded on a phone: open it when it is folded.
    const toggle = page.getByTestId('map-list-toggle');
    await toggle.waitFor({ timeout: 30000 });
    if (await toggle.getAttribute('aria-expanded') === 'false') await toggle.click();
    await eventually(async () => expect(await page.getByTestId('map-list-site-n0').innerText()).toContain('Harrowmere'));
    // Two of twelve sites are the most connected tenth (rounded up): the core group exists and holds them.
    await eventually(async () => expect(await page.getByTestId('map-list-group-core').count()).toBe(1));
    await page.screenshot({ path: path.join(SHOTS, 'first-day-map-wide.png'), fullPage: true });
  } finally {
    await context.close();
  }
});
