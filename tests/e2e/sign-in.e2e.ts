// Signs in through the real web app in Chromium, on a phone-sized and a wide screen, and reads the overview figures.
import type { Browser, Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';
import { BASE_URL, launchBrowser, screenshotPath, submitSignIn } from './helpers/browser';
const demo = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'), 'utf8')) as {
  sites: unknown[];
  slices: { tenant: string }[];
};

const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
];

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const signIn = submitSignIn;

async function figure(page: Page, key: string): Promise<number> {
  const el = page.getByTestId(`overview-${key}`);
  await el.waitFor({ timeout: 30000 });
  return Number((await el.innerText()).replace(/[^0-9]/g, ''));
}

describe.each(VIEWPORTS)('sign-in and overview at $width×$height', (viewport) => {
  test('a planner signs in and sees the whole network on the overview', async () => {
    const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height } });
    const page = await context.newPage();
    await signIn(page, 'planner@demo.test');
    expect(await figure(page, 'slices')).toBe(demo.slices.length);
    expect(await figure(page, 'sites')).toBe(demo.sites.length);
    await page.screenshot({ path: screenshotPath(`overview-planner-${viewport.name}.png`), fullPage: true });
    await context.close();
  });

  test('a tenant user sees only its own slices', async () => {
    const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height } });
    const page = await context.newPage();
    await signIn(page, 'tenant@demo.test');
    const shown = await figure(page, 'slices');
    const me = await page.evaluate(async () => (await fetch('/api/me')).json());
    const own = demo.slices.filter((s) => s.tenant === me.tenantId).length;
    expect(own).toBeGreaterThan(0);
    expect(own).toBeLessThan(demo.slices.length);
    expect(shown).toBe(own);
    await page.screenshot({ path: screenshotPath(`overview-tenant-${viewport.name}.png`), fullPage: true });
    await context.close();
  });

  test('a wrong password shows a clear error and stays on the sign-in screen', async () => {
    const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height } });
    const page = await context.newPage();
    await page.goto(BASE_URL);
    await page.getByTestId('sign-in-email').fill('planner@demo.test');
    await page.getByTestId('sign-in-password').fill('not-the-password');
    await page.getByTestId('sign-in-submit').click();
    await page.getByText(/wrong/i).first().waitFor({ timeout: 15000 });
    expect(await page.getByTestId('sign-in-submit').isVisible()).toBe(true);
    await context.close();
  });
});
