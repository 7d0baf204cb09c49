// The campaign screens' rules: the draft night by night, a move refused with every broken rule in words, booking
// behind a confirmation that says all or none, the form's checks, and draft windows on the calendar never by colour alone.
import type { ReactElement } from 'react';
import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { CampaignPage } from '@/components/campaigns/campaign-page';
import { CampaignForm } from '@/components/campaigns/campaign-form';
import { newGroup, validateCampaignForm, type CampaignFormValues } from '@/components/campaigns/campaign-form-state';
import { campaignIdOf, draftCalendarWindows } from '@/components/campaigns/campaign-calendar';
import { gainText, refusalLines, windowsByNight } from '@/components/campaigns/campaign-words';
import { buildMarkedDays, draftsShown, statusesShown } from '@/components/calendar/calendar-marks';
import { CalendarDay } from '@/components/calendar/calendar-day';
import { ApiError } from '@/hooks/api-fetch';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';
import { campaign, campaignWindow } from './slot-kit';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
  useRouter: () => ({ push: jest.fn(), replace: jest.fn(), back: jest.fn(), canGoBack: () => false }),
}));

afterEach(clearQueries);

function renderPage(c = campaign(), canEdit = true) {
  return renderWithQueries(<CampaignPage campaign={c} timeZone="UTC" canEdit={canEdit} onShowCalendar={jest.fn()} onOpenWindow={jest.fn()} />);
}

test('windows are listed night by night, each with its group, cost and explanation; the total shows beside the first schedule', () => {
  const nights = windowsByNight([campaignWindow(2, { night: '2030-01-13' }), campaignWindow(0), campaignWindow(1)]);
  expect(nights.map((n) => [n.night, n.windows.map((w) => w.group)])).toEqual([['2030-01-10', [0, 1]], ['2030-01-13', [2]]]);
  renderPage();
  expect(screen.getByTestId('campaign-night-2030-01-10')).toHaveTextContent(/Night of Thursday 10 January 2030/);
  const first = screen.getByTestId('campaign-window-0');
  expect(within(first).getByText('Group 1')).toBeTruthy();
  expect(within(first).getByText('Quietest night for these sites.')).toBeTruthy();
  expect(screen.getByTestId('campaign-window-0-cost')).toHaveTextContent(/Cost 10 points · 3 touched slices · 0 cannot be kept/);
  expect(screen.getByTestId('campaign-totals')).toHaveTextContent(/Total cost 21 points for 2 windows/);
  const two = [campaignWindow(0), campaignWindow(1)];
  expect(gainText({ totalCost: 21, startCost: 30, startScheduled: 2, windows: two }))
    .toBe('9 points less than the first schedule found (30 points).');
  // More windows fitted in outweighs points: the start's lower sum comes from leaving a group out.
  expect(gainText({ totalCost: 21, startCost: 12, startScheduled: 1, windows: two }))
    .toBe('The search fitted in 1 more window than the first schedule found (1 window, 12 points).');
  expect(gainText({ totalCost: 30, startCost: 30, startScheduled: 2, windows: two })).toMatch(/already the best/);
});

test('a move the rules refuse shows every broken rule in words, and the draft stays', async () => {
  const message = 'Night Fri 11 Jan holds 2 windows; at most 1 is allowed. Slice “Harbour ambulance” is touched twice within 7 days.';
  const { calls } = routedFetch([
    { method: 'PATCH', path: /\/api\/campaigns\/c-1$/, reply: () => ({ status: 400, body: { error: { code: 'CAMPAIGN_RULES', message } } }) },
    { method: 'GET', path: /\/api\/campaigns/, reply: () => ({ status: 200, body: campaign() }) },
  ]);
  renderPage();
  fireEvent.press(screen.getByTestId('campaign-move-0'));
  fireEvent.press(screen.getByTestId('campaign-move-0-to-0'));
  const error = await screen.findByTestId('campaign-error');
  expect(within(error).getByText('Not changed; 2 rules would be broken:')).toBeTruthy();
  expect(within(error).getByText('• Night Fri 11 Jan holds 2 windows; at most 1 is allowed.')).toBeTruthy();
  expect(within(error).getByText('• Slice “Harbour ambulance” is touched twice within 7 days.')).toBeTruthy();
  expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ version: 2, windows: [{ group: 0, start: '2030-01-11T01:00:00.000Z' }] });
});

test('a stale draft is explained in words, not in API wording', () => {
  expect(refusalLines(new ApiError(409, 'STALE_VERSION', 'This campaign was changed by someone else; reload it and try again.')))
    .toEqual(['Someone changed this draft since you opened it. It has been reloaded; look again and repeat your change.']);
});

test('booking asks first and says it books all windows or none; confirming sends the version read', async () => {
  const { calls } = routedFetch([
    { method: 'POST', path: /\/api\/campaigns\/c-1\/book$/, reply: () => ({ status: 201, body: { campaign: campaign({ status: 'booked', bookedWindowIds: ['w-1', 'w-2'] }), windowIds: ['w-1', 'w-2'] } }) },
    { method: 'GET', path: /\/api\/campaigns/, reply: () => ({ status: 200, body: { campaigns: [] } }) },
  ]);
  renderPage();
  expect(screen.getByTestId('campaign-book')).toHaveTextContent('Book all 2 windows');
  fireEvent.press(screen.getByTestId('campaign-book'));
  expect(screen.getByTestId('campaign-book-confirmation')).toHaveTextContent(/if any one is refused .* none is booked/);
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  fireEvent.press(screen.getByTestId('campaign-book-confirm'));
  await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ version: 2 }));
});

test('a reader sees the draft without its actions', () => {
  renderPage(campaign(), false);
  expect(screen.getByTestId('campaign-draft')).toBeTruthy();
  expect(screen.queryByTestId('campaign-book')).toBeNull();
  expect(screen.queryByTestId('campaign-move-0')).toBeNull();
});

test('a running campaign shows its progress in groups checked', () => {
  renderPage(campaign({ status: 'running', windows: [], progress: { phase: 'evaluating', done: 1, total: 4, elapsedMs: 2100 } }));
  expect(screen.getByTestId('campaign-progress-text')).toHaveTextContent('1 of 4 groups checked');
  expect(screen.getByTestId('campaign-progress-bar')).toHaveProp('aria-valuenow', 25);
  expect(screen.queryByTestId('campaign-draft')).toBeNull();
});

describe('the campaign form', () => {
  const values = (extra: Partial<CampaignFormValues> = {}): CampaignFormValues => ({
    title: 'Upgrade', groups: [{ ...newGroup('North'), elements: [{ kind: 'site', id: 'cell-a', label: 'A' }] }],
    durationText: '4', fromDate: '2030-01-08', toDate: '2030-01-28', hoursStart: '00:00', hoursEnd: '05:00', weekdays: [1, 2, 3, 4, 5, 6, 7],
    maxPerNightText: '2', minDaysText: '7', ...extra,
  });

  test('sends groups, timing and both rules', () => {
    expect(validateCampaignForm(values()).output).toMatchObject({
      title: 'Upgrade', groups: [{ label: 'North', sites: ['cell-a'], spans: [] }], maxPerNight: 2, minDaysBetweenTouches: 7, durationHours: 4,
    });
  });

  test('names the group that needs a name or an element, and bad rule numbers', () => {
    const empty = newGroup('South');
    const { errors } = validateCampaignForm(values({ groups: [...values().groups, empty], maxPerNightText: '0', minDaysText: 'a week' }));
    expect(errors.group?.[empty.key]).toBe('Pick at least one site or span for “South”.');
    expect(errors.maxPerNight).toMatch(/from 1 to 50/);
    expect(errors.minDays).toMatch(/0 \(no limit\)/);
  });

  test('on screen, groups are added as rows and a blocked run lists why', () => {
    const onSubmit = jest.fn();
    routedFetch([]);
    renderWithQueries(<CampaignForm initialValues={values({ title: '' })} submitting={false} submitError={null} onSubmit={onSubmit} onCancel={jest.fn()} />);
    fireEvent.press(screen.getByTestId('campaign-group-add'));
    expect(screen.getByTestId('campaign-group-1')).toBeTruthy();
    fireEvent.press(screen.getByTestId('campaign-submit'));
    const summary = screen.getByTestId('campaign-form-errors');
    expect(within(summary).getByText(/Give the campaign a title/)).toBeTruthy();
    expect(within(summary).getByText(/Give group 2 a name/)).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });
});

describe('draft campaigns on the calendar', () => {
  const drafts = draftCalendarWindows([{
    id: 'c-1', title: 'Upgrade', status: 'draft', version: 1, windows: [campaignWindow(0)], unscheduled: [], totalCost: 10, createdAt: '2030-01-01T00:00:00.000Z',
  }, {
    id: 'c-2', title: 'Booked one', status: 'booked', version: 3, windows: [campaignWindow(0)], unscheduled: [], totalCost: 10, createdAt: '2030-01-01T00:00:00.000Z',
  }]);

  test('only drafts are drawn; each opens its campaign', () => {
    expect(drafts).toHaveLength(1);
    expect(campaignIdOf(drafts[0].id)).toBe('c-1');
    expect(campaignIdOf('w-123')).toBeNull();
  });

  test('the bar is outlined with the word "Draft" and the campaign title, and the day’s name says it is not booked', () => {
    const marks = buildMarkedDays({ windows: drafts, freezes: [], timeZone: 'UTC', today: '2030-01-01' });
    const period = marks['2030-01-10'].periods[0];
    expect(period).toMatchObject({ draft: true, title: 'Upgrade: Group 1' });
    expect(marks['2030-01-10'].windowLabels).toEqual(['Group 1 (Draft campaign, not booked: Upgrade)']);
    // The legend explains the outlined bar, not a draft window's status colour.
    expect(draftsShown(marks)).toBe(true);
    expect(statusesShown(marks)).toEqual([]);
    renderWithQueries(<CalendarDay day="2030-01-10" outside={false} mark={marks['2030-01-10']} tabStop onPress={jest.fn()} onKeyDown={jest.fn()} testID="day" />);
    expect(screen.getByTestId(`day-bar-${drafts[0].id}-mark`, { includeHiddenElements: true })).toHaveTextContent('Draft Upgrade: Group 1');
  });
});

test('the caution for critical slices shows when a window touches one', () => {
  renderPage(campaign({ windows: [campaignWindow(0), campaignWindow(1, { criticalTouched: 2 })] }));
  expect(screen.getByTestId('campaign-critical-caution')).toHaveTextContent(/regulator/);
});

test('no caution when no window touches a critical slice', () => {
  renderPage(campaign({ windows: [campaignWindow(0), campaignWindow(1)] }));
  expect(screen.getByTestId('campaign-draft')).toBeTruthy();
  expect(screen.queryByTestId('campaign-critical-caution')).toBeNull();
});
