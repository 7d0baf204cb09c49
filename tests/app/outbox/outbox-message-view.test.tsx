// Outbox message and list row: headers, text, attachments, the invitation read out (zone, sequence, status,
// cancellation) with its .ics, and the raw download; the row flags invitations and opens the message.
import type { ReactElement } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render as renderBare, screen } from '@testing-library/react-native';
import { Linking } from 'react-native';
import type { OutboxMessage, OutboxSummary } from '@/shared/outbox';
import { OutboxMessageView } from '@/components/outbox/outbox-message-view';
import { OutboxRow } from '@/components/outbox/outbox-row';
import { eventTimeWords } from '@/components/outbox/outbox-format';

// The view reads the viewer's zone from the signed-in user; with no user loaded it falls back to the network's zone.
jest.mock('@/hooks/queries/me', () => ({ useMeQuery: () => ({ data: { timeZone: 'UTC' } }) }));

function render(ui: ReactElement) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return renderBare(<QueryClientProvider client={client}>{ui}</QueryClientProvider>);
}

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

const ICS = 'BEGIN:VCALENDAR\r\nMETHOD:CANCEL\r\nBEGIN:VEVENT\r\nUID:w-1.t-1@slackwater.invalid\r\nSEQUENCE:2\r\nSTATUS:CANCELLED\r\nEND:VEVENT\r\nEND:VCALENDAR\r\n';

function message(extra: Partial<OutboxMessage> = {}): OutboxMessage {
  return {
    id: 7, receivedAt: '2030-01-02T08:00:00.000Z', sizeBytes: 2048,
    envelope: { from: 'maintenance@slackwater.invalid', to: ['noc@tenant-a.example'] },
    from: 'Slackwater <maintenance@slackwater.invalid>', to: 'noc@tenant-a.example', cc: null,
    subject: 'Cancelled: planned work', date: '2030-01-02T08:00:00.000Z', messageId: '<m@x>',
    text: 'The work is withdrawn.\n', hasHtml: false,
    attachments: [{ filename: 'notice-w-1.ics', contentType: 'application/ics', sizeBytes: 300 }],
    calendar: {
      method: 'CANCEL', text: ICS,
      event: {
        uid: 'w-1.t-1@slackwater.invalid', summary: 'Planned work on ring East',
        start: { value: '20300110T210000Z', timeZone: null, iso: '2030-01-10T21:00:00.000Z' },
        end: { value: '20300111T010000', timeZone: 'Europe/Berlin', iso: null },
        sequence: 2, status: 'CANCELLED', location: null, organizer: null,
      },
    },
    ...extra,
  };
}

test('a cancellation: method in words, summary, a zoned end as written, sequence and status in the .ics', () => {
  render(<OutboxMessageView message={message()} />);
  expect(screen.getByTestId('outbox-message-title')).toHaveTextContent('Cancelled: planned work');
  expect(screen.getByTestId('outbox-headers')).toHaveTextContent(/noc@tenant-a\.example/);
  expect(screen.getByTestId('outbox-invitation-method')).toHaveTextContent('Cancellation (CANCEL)');
  expect(screen.getByText('Cancelled')).toBeTruthy();
  expect(screen.getByText('Planned work on ring East')).toBeTruthy();
  expect(screen.getByText('2030-01-11 01:00 (Europe/Berlin)')).toBeTruthy();
  expect(screen.getByTestId('outbox-text')).toHaveTextContent('The work is withdrawn.');
  fireEvent.press(screen.getByTestId('outbox-raw-toggle'));
  expect(screen.getByTestId('outbox-ics')).toHaveTextContent(/SEQUENCE:2\s+STATUS:CANCELLED/);
  expect(screen.getByText('notice-w-1.ics · application/ics · 300 B')).toBeTruthy();
});

test('the raw download opens the message/rfc822 address', () => {
  const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
  render(<OutboxMessageView message={message()} />);
  fireEvent.press(screen.getByTestId('outbox-raw-toggle'));
  fireEvent.press(screen.getByTestId('outbox-raw'));
  expect(open).toHaveBeenCalledWith('/api/outbox/7/raw');
});

test('the readable message comes first and the raw source is folded until asked for', () => {
  render(<OutboxMessageView message={message()} />);
  expect(screen.queryByTestId('outbox-ics')).toBeNull();
  expect(screen.queryByTestId('outbox-raw')).toBeNull();
  const toggle = screen.getByTestId('outbox-raw-toggle');
  expect(toggle).toHaveTextContent(/Show the raw message/);
  // In reading order the text and the event summary come before the fold.
  const json = JSON.stringify(screen.toJSON());
  expect(json.indexOf('The work is withdrawn.')).toBeLessThan(json.indexOf('Show the raw message'));
  expect(json.indexOf('Planned work on ring East')).toBeLessThan(json.indexOf('Show the raw message'));
  fireEvent.press(toggle);
  expect(screen.getByTestId('outbox-ics')).toBeTruthy();
  expect(screen.getByTestId('outbox-raw-toggle')).toHaveTextContent(/Hide the raw message/);
  fireEvent.press(screen.getByTestId('outbox-raw-toggle'));
  expect(screen.queryByTestId('outbox-ics')).toBeNull();
});

test('a plain message: no invitation section, and "None." under attachments', () => {
  render(<OutboxMessageView message={message({ calendar: null, attachments: [] })} />);
  expect(screen.queryByTestId('outbox-invitation')).toBeNull();
  expect(screen.getByText('None.')).toBeTruthy();
});

test('a UTC event time reads in the given zone', () => {
  expect(eventTimeWords({ value: '20300110T210000Z', timeZone: null, iso: '2030-01-10T21:00:00.000Z' }, 'Europe/Berlin'))
    .toBe('Thu 10 Jan, 22:00 CET');
  expect(eventTimeWords(null, 'UTC')).toBe('—');
});

test('a row flags an invitation, names recipients, and opens its message', () => {
  const summary: OutboxSummary = {
    id: 9, receivedAt: '2030-01-02T08:00:00.000Z', from: 'a@x', to: ['one@t.example', 'two@t.example', 'three@t.example'],
    subject: 'Notice', sizeBytes: 1500, hasCalendar: true,
  };
  const onOpen = jest.fn();
  render(<OutboxRow message={summary} selected={false} viewerZone="UTC" onOpen={onOpen} />);
  expect(screen.getByText('Invitation')).toBeTruthy();
  expect(screen.getByText('To one@t.example, two@t.example and 1 more')).toBeTruthy();
  expect(screen.getByText('Wed 2 Jan, 08:00 UTC · 1.5 KB')).toBeTruthy();
  fireEvent.press(screen.getByTestId('outbox-row-9'));
  expect(onOpen).toHaveBeenCalledWith(9);
});
