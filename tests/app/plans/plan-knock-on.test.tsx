// Knock-on moves on the plan screens: the run form's switch and limit, the review's own group with the plain-words
// reason by name, the totals and steps that mark them, the runs list, and the note when greedy's plan is shown.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { PlanDetailView } from '@/components/plans/plan-detail-view';
import { PlanRunForm } from '@/components/plans/plan-run-form';
import { PlanRunList } from '@/components/plans/plan-run-list';
import { formFromSettings, settingsFromForm } from '@/components/plans/plan-form-state';
import { searchFallbackText } from '@/components/plans/plan-search-note';
import type { PlanListItem } from '@/shared/plans';
import { clearQueries, renderWithQueries, routedFetch } from '../window-test-kit';
import { knockOnReview, networkMap, objective, plan, planner } from './plan-fixtures';

const links = { onOpenRuns: jest.fn(), onAdjust: jest.fn(), onReschedule: jest.fn(), onAddCapacity: jest.fn() };

afterEach(() => {
  clearQueries();
  jest.useRealTimers();
});

describe('run form', () => {
  const queued = plan({ status: 'queued', review: null });
  const render = () => {
    const fetched = routedFetch([{ method: 'POST', path: /\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 201, body: { plan: queued } }) }]);
    renderWithQueries(<PlanRunForm windowId="w-1" functionOptions={[]} siteOptions={[]} onQueued={() => {}} />);
    return fetched;
  };

  test('"Allow moves of untouched slices" starts on with at most 5; switching it off is sent as such', async () => {
    const { calls } = render();
    const toggle = screen.getByTestId('plan-form-knock-on-switch');
    expect(toggle.props.value).toBe(true);
    expect(screen.getByTestId('plan-form-max-knock-on').props.value).toBe('5');
    expect(screen.getByTestId('plan-form-knock-on')).toHaveTextContent(/its tenant is told/);
    fireEvent(toggle, 'valueChange', false);
    expect(screen.getByTestId('plan-form-knock-on')).toHaveTextContent(/Only slices the work touches are moved/);
    expect(screen.getByTestId('plan-form-max-knock-on').props.editable).toBe(false);
    await act(async () => fireEvent.press(screen.getByTestId('plan-form-submit')));
    await waitFor(() => expect(calls[0]?.body).toMatchObject({ knockOn: false, maxKnockOnMoves: 5 }));
  });

  test('"Most knock-on moves" takes a whole number from 0 to 50, with a clear error otherwise', async () => {
    const { calls } = render();
    for (const bad of ['51', '-1', '2.5', '']) {
      fireEvent.changeText(screen.getByTestId('plan-form-max-knock-on'), bad);
      fireEvent.press(screen.getByTestId('plan-form-submit'));
      expect(screen.getByTestId('plan-form-max-knock-on-error')).toHaveTextContent('A whole number from 0 to 50.');
    }
    expect(calls).toHaveLength(0);
    fireEvent.changeText(screen.getByTestId('plan-form-max-knock-on'), '12');
    expect(screen.queryByTestId('plan-form-max-knock-on-error')).toBeNull();
    await act(async () => fireEvent.press(screen.getByTestId('plan-form-submit')));
    await waitFor(() => expect(calls[0]?.body).toMatchObject({ knockOn: true, maxKnockOnMoves: 12 }));
    expect(settingsFromForm({ ...formFromSettings(), maxKnockOnMoves: '0' })).toMatchObject({ settings: { maxKnockOnMoves: 0 } });
  });
});

describe('review', () => {
  beforeEach(() => jest.useFakeTimers());

  const show = (review = knockOnReview()) => {
    routedFetch([{ method: 'GET', path: /\/api\/network\/map$/, reply: () => ({ status: 200, body: networkMap }) }]);
    renderWithQueries(<PlanDetailView plan={plan({ review })} windowTitle="Rectifier swap" me={planner} timeZone="UTC" {...links} />);
  };

  test('a knock-on move has its own group, a tag and the reason by name, with before → after', async () => {
    show();
    const group = within(screen.getByTestId('plan-knock-on-group'));
    expect(screen.getByTestId('plan-knock-on-group')).toHaveTextContent(/Moved to make room \(1\)/);
    expect(group.getByTestId('plan-slice-sl-tele')).toHaveTextContent(/Crane telemetry.*Reroute.*Knock-on move/);
    expect(group.getByTestId('plan-slice-knock-on-sl-tele')).toHaveTextContent('Rerouted to make room for Harbour cranes');
    // Only the knock-on card sits in the group; the affected slices stay above it.
    expect(group.queryByTestId('plan-slice-sl-port')).toBeNull();
    expect(screen.queryByTestId('plan-slice-knock-on-sl-port')).toBeNull();
    await waitFor(() => expect(group.getByTestId('plan-reroute-sl-tele-t1')).toHaveTextContent(/from Dunsey → Corran.*to Aldmouth → Corran/s));
    // The card is named by its own text (name first, then the reason), so what is heard matches what is shown.
    expect(screen.getByTestId('plan-slice-sl-tele').props.accessibilityLabel).toBeUndefined();
    expect(screen.getByTestId('plan-slice-sl-tele')).toHaveTextContent(/^Crane telemetry.*Rerouted to make room for Harbour cranes/);
  });

  test('totals mention it, the steps mark it first with its reason, and the map caption counts it', async () => {
    show();
    expect(screen.getByTestId('plan-total-knock-on')).toHaveTextContent(/Includes 1 knock-on move: a slice the work does not touch, moved to make room/);
    expect(screen.getByTestId('plan-steps-knock-on-note')).toHaveTextContent(/Knock-on moves go first/);
    expect(screen.getByTestId('plan-step-knock-on-0')).toHaveTextContent('Knock-on move · Rerouted to make room for Harbour cranes');
    expect(screen.queryByTestId('plan-step-knock-on-1')).toBeNull();
    await waitFor(() => expect(screen.getByTestId('plan-map-caption')).toHaveTextContent(/the 1 slice moved to make room included/));
  });

  test('without knock-on moves nothing about them is shown', () => {
    show(plan().review!);
    for (const id of ['plan-knock-on-group', 'plan-total-knock-on', 'plan-steps-knock-on-note', 'plan-search-fallback']) {
      expect(screen.queryByTestId(id)).toBeNull();
    }
  });

  test('when the search’s own plan was worse, a note gives its figures and says the greedy plan is shown', () => {
    const own = objective({ unresolved: 2, unresolvedWeight: 7, moveCost: 9.5 });
    show(knockOnReview({ search: { objective: own, feasible: true, usedFallback: 'greedy' } }));
    expect(screen.getByTestId('plan-search-fallback')).toHaveTextContent(
      /Showing the greedy plan.*The search's own plan was worse \(2 slices cannot be kept \(7 priority points\) · move cost 9\.5 points\), so the greedy plan is shown instead\./s);
    expect(screen.getByTestId('plan-ref-run')).toHaveTextContent(/greedy plan kept; the search alone: 2 slices cannot be kept \(7 priority points\) · move cost 9\.5 points/);
    expect(searchFallbackText({ objective: own, feasible: false, usedFallback: 'greedy' })).toMatch(/^The search found no plan within every capacity and latency limit \(its best: 2 slices cannot be kept/);
  });

  test('no note when the search’s own plan was kept', () => {
    show(knockOnReview({ search: { objective: objective(), feasible: true, usedFallback: null } }));
    expect(screen.queryByTestId('plan-search-fallback')).toBeNull();
  });
});

test('the runs list counts knock-on moves in plain words', () => {
  const { review: _review, ...base } = plan();
  const item: PlanListItem = { ...base, id: 'p-k', totals: { stays: 1, moved: 1, rerouted: 2, unresolved: 0, moveCost: 4, knockOn: 1 } };
  renderWithQueries(<PlanRunList plans={[item]} timeZone="UTC" onOpen={() => {}} />);
  expect(screen.getByTestId('plan-row-p-k')).toHaveTextContent(/1 moved · 2 rerouted · 0 cannot be kept · move cost 4 points · 1 untouched slice moved to make room/);
  expect(screen.getByTestId('plan-row-p-k')).toHaveTextContent(/up to 5 moves of untouched slices/);
});
