// A planner imports a sites CSV through the web app in Chromium: a file with one bad row shows that row's error
// and cannot be applied; the fixed file previews the new sites, applies, and the new site shows in the Network
// list and on the map. Site ids carry a per-run suffix so the test can run twice against the same database.
import type { Browser, Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';
const RUN = `${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`;
const SITE_ID = `e2e-site-${RUN}`;
const SECOND_ID = `e2e-site-${RUN}-b`;
const HEADER = 'id,name,kind,lat,lon,cpu,mtbfHours,mttrHours';
const GOOD_ROW = `${SITE_ID},Quillhaven Test ${RUN},edge,55.12,-27.18,64,150000,4`;

// Row 3 (the header is row 1) puts the site at latitude 123°, outside −90…90.
const BAD_FILE = [HEADER, GOOD_ROW, `${SECOND_ID},Quillhaven Annex ${RUN},cell-site,123,-27.2,16,,`].join('\n') + '\n';
const FIXED_FILE = [HEADER, GOOD_ROW, `${SECOND_ID},Quillhaven Annex ${RUN},cell-site,55.13,-27.2,16,,`].join('\n') + '\n';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await restoreDemoNetwork();
  await browser?.close();
});

type PreviewReply = { id: string; preview: { counts: { adds: number; changes: number }; removes: Record<string, string[]> } };

/**
 * Puts the network back as the demo file has it, so other suites that count the demo's sites still agree: a scenario
 * import of scenarios/demo.json removes the sites this test added. Applied only when that is all it would do
 * (no adds, no changes, nothing removed but this test's own e2e sites), so nothing else is ever overwritten.
 */
async function restoreDemoNetwork(): Promise<void> {
  if (!browser) return;
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    await signIn(page, 'planner@demo.test');
    const headers = { Origin: new URL(BASE_URL).origin };
    const demoFile = fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'));
    const upload = await context.request.post(`${BASE_URL}/api/imports`, {
      headers, multipart: { kind: 'scenario', file: { name: 'demo.json', mimeType: 'application/json', buffer: demoFile } },
    });
    const { id, preview } = (await upload.json()) as PreviewReply;
    const removed = Object.values(preview.removes).flat();
    const onlyOurs = removed.length > 0 && removed.every((siteId) => siteId.startsWith('e2e-site-'))
      && preview.removes.sites.length === removed.length;
    if (preview.counts.adds === 0 && preview.counts.changes === 0 && onlyOurs) {
      await context.request.post(`${BASE_URL}/api/imports/${id}/apply`, { headers });
    }
  } finally {
    await context.close();
  }
}

async function signIn(page: Page, email: string): Promise<void> {
  await submitSignIn(page, email);
  await page.getByTestId('overview-slices').waitFor({ timeout: 30000 });
}

/** Presses "Choose a file" and answers the browser's file chooser (the picker's own <input type=file>). */
async function uploadCsv(page: Page, name: string, text: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser', { timeout: 15000 });
  await page.getByTestId('import-pick').click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text, 'utf8') });
}

test('a planner fixes a bad sites CSV, applies it, and finds the new site in the list and on the map', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await signIn(page, 'planner@demo.test');
  await page.getByTestId('nav-imports').click();
  await page.getByTestId('import-upload').waitFor({ timeout: 30000 });

  await uploadCsv(page, `sites-${RUN}-bad.csv`, BAD_FILE);
  await page.getByTestId('import-file-name').getByText(`sites-${RUN}-bad.csv`).waitFor({ timeout: 30000 });
  const errors = page.getByTestId('import-errors');
  await errors.waitFor();
  await eventually(async () => expect(await errors.innerText()).toMatch(/row 3/));
  await eventually(async () => expect(await errors.innerText()).toMatch(/latitude/i));
  await eventually(async () => expect(await page.getByTestId('import-apply').getAttribute('aria-disabled')).toBe('true'));
  await page.screenshot({ path: path.join(SHOTS, 'import-sites-bad-row-wide.png'), fullPage: true });

  await uploadCsv(page, `sites-${RUN}-fixed.csv`, FIXED_FILE);
  await page.getByTestId('import-file-name').getByText(`sites-${RUN}-fixed.csv`).waitFor({ timeout: 30000 });
  await eventually(async () => expect(await page.getByTestId('import-errors').count()).toBe(0));
  await eventually(async () => {
    const adds = await page.getByTestId('import-adds-sites').innerText();
    expect(adds).toContain(SITE_ID);
    expect(adds).toContain(SECOND_ID);
  });
  await page.getByTestId('import-apply').click();
  await page.getByTestId('import-confirm-apply').click();
  await page.getByTestId('import-result').waitFor({ timeout: 30000 });
  await eventually(async () => expect(await page.getByTestId('import-result').innerText()).toMatch(/2 added/));
  await page.screenshot({ path: path.join(SHOTS, 'import-sites-applied-wide.png'), fullPage: true });

  // The Network screen: the site in the searched list, and on the map beside it.
  await page.getByTestId('nav-network').click();
  await page.getByTestId('sites-table-search').fill(SITE_ID);
  // The search goes to the server: only the two new sites are left (the "-b" sibling's id contains this one).
  await page.getByTestId('sites-total').getByText('2 sites').waitFor({ timeout: 30000 });
  await page.getByTestId(`sites-table-row-${SITE_ID}`).waitFor({ timeout: 30000 });
  await eventually(async () => expect(await page.getByTestId(`sites-table-row-${SITE_ID}`).innerText()).toContain(`Quillhaven Test ${RUN}`));
  await page.getByTestId(`map-site-${SITE_ID}`).waitFor({ state: 'attached', timeout: 30000 });
  await page.screenshot({ path: path.join(SHOTS, 'import-sites-network-wide.png'), fullPage: true });

  // Its detail opens from the list.
  await page.getByTestId(`sites-table-row-${SITE_ID}`).click();
  await page.getByTestId('site-detail-title').getByText(`Quillhaven Test ${RUN}`).waitFor({ timeout: 30000 });
  await context.close();
});

test('a tenant user has no Imports area and is turned away from the Imports screen', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await signIn(page, 'tenant@demo.test');
  expect(await page.getByTestId('nav-imports').count()).toBe(0);
  await page.goto(`${BASE_URL}/imports`);
  await page.getByTestId('state-empty').waitFor({ timeout: 30000 });
  expect(await page.getByTestId('import-pick').count()).toBe(0);
  await context.close();
});
