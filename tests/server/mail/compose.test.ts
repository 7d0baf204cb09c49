// A MailJob with an invitation, sent through the sink and read back with mailparser: RFC 6047 (iMIP) shape.
import ical, { ICalCalendarMethod, ICalEventStatus } from 'ical-generator';
import { simpleParser } from 'mailparser';
import type { MailJob } from '../../../server/jobs/queue';
import { composeMail } from '../../../server/mail/compose';
import { parseSinkMessage } from '../../../server/mail/parse-message';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { createMailTransport } from '../../../server/mail/transport';
import { uniqueRecipient, useMailSink } from './mail-test-db';

const fx = useMailSink();

function invitation(method: ICalCalendarMethod, sequence: number): string {
  const calendar = ical({ prodId: '//Slackwater//Test//EN', method });
  calendar.createEvent({
    id: 'w-test-1.tenant-a@slackwater.invalid',
    start: new Date('2031-03-04T22:00:00Z'),
    end: new Date('2031-03-05T02:00:00Z'),
    stamp: new Date('2031-02-01T09:00:00Z'),
    summary: 'Planned work: aggregation ring, make-before-break',
    sequence,
    status: method === ICalCalendarMethod.CANCEL ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
  });
  return calendar.toString();
}

async function sendAndRead(job: MailJob) {
  await createMailTransport(fx.config, { sinkPort: fx.sink.port }).sendMail(composeMail(job, fx.config.mailFrom));
  const rows = await readSinkMessages(fx.db, { to: job.to[0] });
  expect(rows).toHaveLength(1);
  return rows[0];
}

test('without a calendar: one text/plain body from MAIL_FROM, no attachments', async () => {
  const to = uniqueRecipient('plain');
  const row = await sendAndRead({ to: [to], subject: 'Sign-off requested', text: 'Please review window w-1.' });
  const mail = await simpleParser(row.raw);
  expect(mail.text?.trim()).toBe('Please review window w-1.');
  expect(mail.from?.text).toBe(fx.config.mailFrom.replace(/^(.*) </, '"$1" <'));
  expect(mail.attachments).toHaveLength(0);
});

test('REQUEST: a text/calendar; method=REQUEST part beside the text, and the same calendar as an .ics attachment', async () => {
  const to = uniqueRecipient('invite');
  const content = invitation(ICalCalendarMethod.REQUEST, 0);
  const row = await sendAndRead({
    to: [to], subject: 'Notice of planned work', text: 'Your slices move before the work.',
    calendar: { method: 'REQUEST', content, filename: 'slackwater-w-test-1.ics' },
  });
  // Source: RFC 6047 §2.4 (confirmed) — the iMIP part is text/calendar carrying the iTIP method as a parameter.
  expect(row.raw).toMatch(/Content-Type: text\/calendar; charset=utf-8; method=REQUEST/);
  const mail = await simpleParser(row.raw);
  expect(mail.text?.trim()).toBe('Your slices move before the work.');
  const calendarPart = mail.attachments.find((a) => a.contentType === 'text/calendar');
  const icsFile = mail.attachments.find((a) => a.filename === 'slackwater-w-test-1.ics');
  expect(calendarPart?.content.toString('utf8')).toBe(content);
  expect(icsFile?.contentType).toBe('application/ics');
  expect(icsFile?.contentDisposition).toBe('attachment');
  expect(icsFile?.content.toString('utf8')).toBe(content);
});

test('the Outbox parser reads the invitation back: method, UID, times, sequence, status', async () => {
  const to = uniqueRecipient('outbox-parse');
  const row = await sendAndRead({
    to: [to], subject: 'Cancelled: planned work', text: 'The work is withdrawn.',
    calendar: { method: 'CANCEL', content: invitation(ICalCalendarMethod.CANCEL, 3), filename: 'cancel.ics' },
  });
  const parsed = await parseSinkMessage(row.raw);
  expect(parsed.subject).toBe('Cancelled: planned work');
  expect(parsed.to).toBe(to);
  expect(parsed.attachments).toEqual([{ filename: 'cancel.ics', contentType: 'application/ics', sizeBytes: expect.any(Number) }]);
  expect(parsed.calendar?.method).toBe('CANCEL');
  expect(parsed.calendar?.text).toContain('METHOD:CANCEL');
  expect(parsed.calendar?.event).toEqual({
    uid: 'w-test-1.tenant-a@slackwater.invalid',
    summary: 'Planned work: aggregation ring, make-before-break',
    start: { value: '20310304T220000Z', timeZone: null, iso: '2031-03-04T22:00:00.000Z' },
    end: { value: '20310305T020000Z', timeZone: null, iso: '2031-03-05T02:00:00.000Z' },
    sequence: 3,
    status: 'CANCELLED',
    location: null,
    organizer: null,
  });
});
