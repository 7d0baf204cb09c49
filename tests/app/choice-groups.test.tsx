// Component tests of single- and multi-choice chips, card lists and picker buttons: single choices are radio groups
// with one Tab stop and arrow keys inside, multi choices toggle buttons, card lists lists, and controls named by
// their visible text first.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { rovingTarget, tabStopIndex } from '@/components/roving-focus';
import { Segmented } from '@/components/inventory/segmented';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { FilterChip } from '@/components/calendar/filter-chip';
import { PickChips } from '@/components/plans/pick-chips';
import { pickerButtonName } from '@/components/windows/time-fields';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';
import { OutboxList } from '@/components/outbox/outbox-list';
import type { SignoffQueueItem } from '@/shared/signoff';
import type { OutboxSummary } from '@/shared/outbox';

type Node = ReturnType<typeof screen.getByTestId>;
function withRole(container: Node, role: string): Node[] {
  return container.findAll((n) => typeof n.type === 'string' && n.props.role === role);
}
const key = (name: string) => ({ key: name, preventDefault: jest.fn() });
const tabIndexOf = (testID: string) => screen.getByTestId(testID).props.tabIndex as number;

describe('the roving-focus helper', () => {
  test('arrows step and wrap both ways, Home and End jump, other keys do nothing', () => {
    expect(rovingTarget('ArrowRight', 0, 3)).toBe(1);
    expect(rovingTarget('ArrowDown', 2, 3)).toBe(0);
    expect(rovingTarget('ArrowLeft', 0, 3)).toBe(2);
    expect(rovingTarget('ArrowUp', 1, 3)).toBe(0);
    expect(rovingTarget('Home', 2, 3)).toBe(0);
    expect(rovingTarget('End', 0, 3)).toBe(2);
    expect(rovingTarget('Tab', 0, 3)).toBeNull();
    expect(rovingTarget('ArrowRight', 0, 0)).toBeNull();
  });

  test('the Tab stop is the checked item, else the first', () => {
    expect(tabStopIndex(2, 4)).toBe(2);
    expect(tabStopIndex(-1, 4)).toBe(0);
    expect(tabStopIndex(7, 4)).toBe(0);
  });
});

const KINDS = [{ value: 'all', label: 'All kinds' }, { value: 'core', label: 'Core' }, { value: 'edge', label: 'Edge' }] as const;

describe('Segmented (single choice)', () => {
  test('is a named radio group whose chosen radio alone is a Tab stop; arrows and End choose', () => {
    const onChange = jest.fn();
    render(<Segmented choices={KINDS} value="core" onChange={onChange} testID="kind" label="Site kind" />);
    const [group] = withRole(screen.getByTestId('kind-strip'), 'radiogroup');
    expect(group.props['aria-label']).toBe('Site kind');
    expect(withRole(group, 'radio')).toHaveLength(3);
    expect(withRole(group, 'tab')).toHaveLength(0);
    expect(screen.getByTestId('kind-core')).toBeChecked();
    expect(screen.getByTestId('kind-all')).not.toBeChecked();
    expect([tabIndexOf('kind-all'), tabIndexOf('kind-core'), tabIndexOf('kind-edge')]).toEqual([-1, 0, -1]);
    fireEvent(screen.getByTestId('kind-core'), 'keyDown', key('ArrowRight'));
    expect(onChange).toHaveBeenLastCalledWith('edge');
    fireEvent(screen.getByTestId('kind-core'), 'keyDown', key('ArrowLeft'));
    expect(onChange).toHaveBeenLastCalledWith('all');
    fireEvent(screen.getByTestId('kind-core'), 'keyDown', key('End'));
    expect(onChange).toHaveBeenLastCalledWith('edge');
    onChange.mockClear();
    fireEvent(screen.getByTestId('kind-core'), 'keyDown', key('a'));
    expect(onChange).not.toHaveBeenCalled();
  });
});

describe('ChoiceChips (single choice, may be left empty)', () => {
  const WORK = [{ value: 'software', label: 'Software upgrade' }, { value: 'fibre', label: 'Fibre splicing' }];

  test('with nothing chosen the first radio is the Tab stop; Space chooses the focused radio', () => {
    const onChange = jest.fn();
    render(<ChoiceChips label="Work type" choices={WORK} value="" onChange={onChange} testID="work" />);
    const [group] = withRole(screen.getByTestId('work'), 'radiogroup');
    expect(group.props['aria-label']).toBe('Work type');
    expect([tabIndexOf('work-software'), tabIndexOf('work-fibre')]).toEqual([0, -1]);
    fireEvent(screen.getByTestId('work-fibre'), 'keyDown', key(' '));
    expect(onChange).toHaveBeenLastCalledWith('fibre');
    fireEvent(screen.getByTestId('work-software'), 'keyDown', key('ArrowDown'));
    expect(onChange).toHaveBeenLastCalledWith('fibre');
  });

  test('disabled: no radio is a Tab stop and keys choose nothing', () => {
    const onChange = jest.fn();
    render(<ChoiceChips label="Work type" choices={WORK} value="software" onChange={onChange} testID="work" disabled />);
    expect([tabIndexOf('work-software'), tabIndexOf('work-fibre')]).toEqual([-1, -1]);
    fireEvent(screen.getByTestId('work-software'), 'keyDown', key('ArrowRight'));
    expect(onChange).not.toHaveBeenCalled();
  });
});

describe('multi-choice chips are toggle buttons named by their text', () => {
  test('a calendar filter chip', () => {
    const { rerender } = render(<FilterChip label="Draft" selected={false} onPress={jest.fn()} testID="filter-draft" />);
    const chip = () => screen.getByTestId('filter-draft');
    expect(chip().props.role).toBe('button');
    expect(chip().props['aria-pressed']).toBe(false);
    expect(chip().props.accessibilityLabel).toBeUndefined();
    rerender(<FilterChip label="Draft" selected onPress={jest.fn()} testID="filter-draft" />);
    expect(chip().props['aria-pressed']).toBe(true);
    expect(chip()).toHaveTextContent(/Draft$/);
  });

  test('pick chips', () => {
    const onChange = jest.fn();
    render(<PickChips label="Sites left out" hint="Tap to leave a site out." options={[{ id: 'a', label: 'Aberdale' }, { id: 'b', label: 'Brinmouth' }]}
      picked={['b']} onChange={onChange} testID="pick" />);
    expect(screen.getByTestId('pick-b').props['aria-pressed']).toBe(true);
    expect(screen.getByTestId('pick-a').props['aria-pressed']).toBe(false);
    expect(withRole(screen.getByTestId('pick'), 'checkbox')).toHaveLength(0);
    fireEvent.press(screen.getByTestId('pick-a'));
    expect(onChange).toHaveBeenCalledWith(['b', 'a']);
  });
});

test('a picker button is named by its visible word first, then the field it fills', () => {
  expect(pickerButtonName('Date', 'Starts')).toMatch(/^Date\b/);
  expect(pickerButtonName('Time', 'Ends')).toMatch(/^Time\b.*Ends/);
});

describe('card lists', () => {
  const item = (windowId: string, title: string): SignoffQueueItem => ({
    windowId, title, startsAt: '2027-01-08T01:00:00Z', endsAt: '2027-01-08T03:00:00Z', workType: null, round: 1,
    riskClass: 'low', critical: false, quorum: 2, approvals: 1, me: { decided: false, blocked: null },
  } as SignoffQueueItem);

  test('the sign-off queue is a list of links named by what they show, title first', () => {
    render(<SignoffQueueList items={[item('w1', 'Fibre splice at Harrowgate'), item('w2', 'Core upgrade')]} timeZone="UTC" onOpen={jest.fn()} />);
    const list = screen.getByTestId('signoff-queue-list');
    expect(list.props.role).toBe('list');
    expect(withRole(list, 'listitem')).toHaveLength(2);
    const link = screen.getByTestId('signoff-queue-item-w1');
    expect(link.props.role).toBe('link');
    expect(link.props.accessibilityLabel).toBeUndefined();
    expect(link).toHaveTextContent(/^Fibre splice at Harrowgate/);
  });

  test('the outbox is a list of links; the open message carries aria-current', () => {
    const message = (id: number, subject: string): OutboxSummary => ({
      id, subject, receivedAt: '2027-01-08T01:00:00Z', from: 'planner@demo.test', to: ['ops@tenant.test'], sizeBytes: 2048, hasCalendar: false,
    });
    render(<OutboxList messages={[message(1, 'Notice: fibre work'), message(2, 'Sign-off wanted')]} total={2} selectedId={2}
      viewerZone="UTC" onOpen={jest.fn()} hasMore={false} loadingMore={false} onLoadMore={jest.fn()} />);
    const [list, ...more] = withRole(screen.getByTestId('outbox-list'), 'list');
    expect(more).toHaveLength(0);
    expect(withRole(list, 'listitem')).toHaveLength(2);
    expect(screen.getByTestId('outbox-row-2').props['aria-current']).toBe('true');
    expect(screen.getByTestId('outbox-row-1').props['aria-current']).toBeUndefined();
  });
});
