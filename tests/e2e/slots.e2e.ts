// On a phone-sized Chromium: an engineer asks when four hours of work on a demo site hurt least over three weeks of
// nights, reads the ranked list, and books the best slot from it. The booking form arrives filled from the slot, and
// the booked window has exactly the slot's times and the site; the search's own answer (read through the API) ranks
// its usable slots 1, 2, … and gives every excluded one a reason.
import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { SlotSearch } from '../../shared/slots';
import { ok } from './helpers/api';
import { BASE_URL, SHOTS, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';
import { suiteUnderPolicies } from './helpers/suite';

const PHONE = { width: 390, height: 844 };
/** Starts beyond the longest notice a demo tenant is owed (21 days), so the nights reach the quick re-map. */
const FIRST_NIGHT_DAYS_AHEAD = 25;
const NIGHTS = 21;
/** A demo site whose outage strands no critical slice, so it has usable nights (the busiest sites have none). */
const SITE_NAME = 'Vellaport';

type Demo = { sites: { id: string; name: string }[] };
const demo = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'), 'utf8')) as Demo;
const site = demo.sites.find((s) => s.name === SITE_NAME);
if (!site) throw new Error(`scenarios/demo.json has no site named ${SITE_NAME}`);

const suite = suiteUnderPolicies({ signoffQuorumLow: 1, signoffQuorumHigh: 2, signoffRequireCode: false });

/** 'YYYY-MM-DD' of the day `days` ahead, in the network's zone (UTC−1), which the finder's nights are read in. */
function networkDayAhead(days: number): string {
  return new Date(Date.now() + days * 86_400_000 - 3_600_000).toISOString().slice(0, 10);
}

async function engineerPage(): Promise<Page> {
  const context = await suite.browser.newContext({ viewport: PHONE });
  suite.contexts.push(context);
  const page = await context.newPage();
  await submitSignIn(page, 'engineer@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30000 });
  return page;
}

test('an engineer finds the least harmful night for a site and books it from the list', async () => {
  const page = await engineerPage();
  await page.goto(`${BASE_URL}/slots`);
  await page.getByTestId('slot-form').waitFor({ timeout: 30000 });
  await page.getByTestId('window-element-search').fill(SITE_NAME);
  await page.getByTestId(`window-element-option-${site.id}`).click();
  await page.getByTestId(`slot-elements-picked-${site.id}`).waitFor();
  await page.getByTestId('slot-duration').fill('4');
  await page.getByTestId('slot-from').fill(networkDayAhead(FIRST_NIGHT_DAYS_AHEAD));
  await page.getByTestId('slot-to').fill(networkDayAhead(FIRST_NIGHT_DAYS_AHEAD + NIGHTS - 1));
  await page.getByTestId('slot-hours-start').fill('00:00');
  await page.getByTestId('slot-hours-end').fill('05:00');
  await page.screenshot({ path: path.join(SHOTS, 'slots-form-phone.png'), fullPage: true });
  await page.getByTestId('slot-submit').click();

  await page.getByTestId('slot-results').waitFor({ timeout: 90000 });
  await page.screenshot({ path: path.join(SHOTS, 'slots-results-phone.png'), fullPage: true });
  const searchId = new URL(page.url()).searchParams.get('search');
  expect(searchId).toMatch(/^ss-/);

  // The answer behind the list: usable slots ranked 1, 2, … by cost; every excluded one with a code and a reason.
  const engineer = await suite.apiAs('engineer@demo.test');
  const search = (await ok(engineer.get(`${BASE_URL}/api/slot-searches/${searchId}`), 'read the search')) as SlotSearch;
  expect(search.status).toBe('done');
  const usable = search.candidates.filter((c) => c.excluded === null);
  expect(usable.length).toBeGreaterThan(0);
  expect(usable.map((c) => c.rank)).toEqual(usable.map((_, i) => i + 1));
  for (let i = 1; i < usable.length; i++) expect(usable[i].cost).toBeGreaterThanOrEqual(usable[i - 1].cost);
  for (const c of search.candidates.filter((x) => x.excluded !== null)) {
    expect(c.rank).toBeNull();
    expect(c.excluded!.reason.length).toBeGreaterThan(10);
  }
  const best = usable[0];
  await eventually(async () => expect(await page.getByTestId('slot-candidate-1-explanation').innerText()).toBe(best.explanation));

  await page.getByTestId('slot-book-1').click();
  await page.getByTestId('window-prefill-note').waitFor({ timeout: 30000 });
  await page.getByTestId(`window-picked-${site.id}`).waitFor();
  await page.getByTestId('window-title').fill(`E2E slot-finder booking ${Date.now().toString(36)}`);
  await page.screenshot({ path: path.join(SHOTS, 'slots-booking-prefilled-phone.png'), fullPage: true });
  await page.getByTestId('window-submit').click();
  await page.getByTestId('window-flash-booked').waitFor({ timeout: 30000 });
  const match = /\/windows\/([^/?#]+)/.exec(page.url());
  if (!match) throw new Error(`not on a window page after booking: ${page.url()}`);
  const windowId = decodeURIComponent(match[1]);
  suite.windowIds.push(windowId);

  const booked = await ok(engineer.get(`${BASE_URL}/api/windows/${windowId}`), 'read the booked window');
  expect(Date.parse(booked.startsAt)).toBe(Date.parse(best.start));
  expect(Date.parse(booked.endsAt)).toBe(Date.parse(best.end));
  expect(booked.elements).toEqual([expect.objectContaining({ kind: 'site', id: site.id, effect: 'down' })]);
  await page.screenshot({ path: path.join(SHOTS, 'slots-booked-phone.png'), fullPage: true });
});
