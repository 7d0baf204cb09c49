// Window times in the viewer's own time zone, with the zone named so nobody guesses (windows are stored in UTC).

/** The viewer's IANA zone, e.g. "Europe/Oslo"; falls back to UTC where the runtime does not know it. */
export function viewerTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

/** "Tue 14 Jan, 22:00 – Wed 15 Jan, 04:00 CET" in `timeZone`; the zone abbreviation ends the string. */
export function formatWindowRange(startsAtIso: string, endsAtIso: string, timeZone = viewerTimeZone()): string {
  const start = new Date(startsAtIso);
  const end = new Date(endsAtIso);
  if (Number.isNaN(start.getTime()) || Number.isNaN(end.getTime())) return `${startsAtIso} – ${endsAtIso}`;
  const dayAndTime = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  });
  const zoneName =
    new Intl.DateTimeFormat('en-GB', { timeZone, timeZoneName: 'short' })
      .formatToParts(end)
      .find((part) => part.type === 'timeZoneName')?.value ?? timeZone;
  return `${dayAndTime.format(start)} – ${dayAndTime.format(end)} ${zoneName}`;
}
