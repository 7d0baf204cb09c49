// Shared pieces of the end-to-end suites: where the server is, where screenshots go, Chromium, and signing in.
import { chromium, type Browser, type Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';

export const BASE_URL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:8099';
export const SHOTS = path.resolve(__dirname, '../../../test-results/e2e');
export const DEMO_PASSWORD = 'demo-password-1';

/** Debian's Chromium, headless, with the flags this closed network needs (VERSIONS.md). */
export async function launchBrowser(): Promise<Browser> {
  fs.mkdirSync(SHOTS, { recursive: true });
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
  });
}

/** Fills the sign-in form with a demo account and submits it (does not wait for what follows). */
export async function submitSignIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(BASE_URL);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

export function screenshotPath(name: string): string {
  return path.join(SHOTS, name);
}
