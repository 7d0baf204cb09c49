// MailJob → nodemailer message: a plain-text body and, for notices, the iCalendar invitation per RFC 6047 (iMIP).
import type { SendMailOptions } from 'nodemailer';
import type { MailJob } from '../jobs/queue';

/**
 * nodemailer's `icalEvent` puts the calendar in twice, as RFC 6047 §2.4 expects of a calendar-aware message:
 * a `text/calendar; method=…` alternative beside the text body (what mail clients turn into an invitation),
 * and an `application/ics` attachment named `filename` (what people save or import by hand).
 * Reference: RFC 6047 §2.2–2.4 (iMIP); RFC 5546 §1.4 (METHOD).
 */
export function composeMail(job: MailJob, from: string): SendMailOptions {
  const message: SendMailOptions = {
    from,
    to: job.to,
    subject: job.subject,
    text: job.text,
  };
  if (job.calendar) {
    message.icalEvent = {
      method: job.calendar.method,
      content: job.calendar.content,
      filename: job.calendar.filename,
    };
  }
  return message;
}
