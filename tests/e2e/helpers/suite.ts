// The frame of a suite that prepares windows through the API under its own sign-off policy: Chromium, an admin
// API, the policy set for the suite and put back after it, and every window it books withdrawn at the end.
import type { APIRequestContext, Browser, BrowserContext } from 'playwright-core';
import { apiAs, setSignoffPolicies, SIGNOFF_POLICY_KEYS, withdrawWindow } from './api';
import { BASE_URL, launchBrowser } from './browser';

type Policies = Record<(typeof SIGNOFF_POLICY_KEYS)[number], unknown>;

export type Suite = {
  browser: Browser;
  admin: APIRequestContext;
  /** Browser contexts the suite opened (API sessions and pages), closed after it. */
  contexts: BrowserContext[];
  /** Windows the suite booked, withdrawn after it (which also sends any cancellations). */
  windowIds: string[];
  apiAs: (email: string) => Promise<APIRequestContext>;
};

/** Registers beforeAll/afterAll for a suite run under `policies`; the fields are set once beforeAll has run. */
export function suiteUnderPolicies(policies: Policies): Suite {
  let saved: Record<string, unknown> | null = null;
  const suite = {
    contexts: [] as BrowserContext[],
    windowIds: [] as string[],
    apiAs: (email: string) => apiAs(suite.browser, email, suite.contexts),
  } as Suite;
  beforeAll(async () => {
    suite.browser = await launchBrowser();
    suite.admin = await suite.apiAs('admin@demo.test');
    saved = await setSignoffPolicies(suite.admin, policies);
  });
  afterAll(async () => {
    if (saved) await suite.admin.patch(`${BASE_URL}/api/policies`, { data: saved }).catch(() => undefined);
    for (const id of suite.windowIds) await withdrawWindow(suite.admin, id);
    for (const context of suite.contexts) await context.close().catch(() => undefined);
    await suite.browser?.close();
  });
  return suite;
}
