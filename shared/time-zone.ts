// A person's time zone: an IANA zone name the runtime's Intl knows, and the network's zone everyone starts with.
import { z } from 'zod';

/**
 * The demo network's zone: UTC−1 all year, no daylight saving (the IANA "Etc/GMT+1" zone has its sign inverted
 * on purpose). Staff and tenant users see times here until they choose their own zone.
 */
export const NETWORK_TIME_ZONE = 'Etc/GMT+1';

/** Whether `zone` is an IANA zone this runtime can format in ("Europe/Oslo", "UTC"); offsets like "+01:00" are not. */
export function isValidTimeZone(zone: string): boolean {
  if (!/^[A-Za-z][A-Za-z0-9_+\-/]*$/.test(zone)) return false;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const timeZoneSchema = z.string().trim().min(1, 'Choose a time zone').max(64, 'That is not a time zone name')
  .refine(isValidTimeZone, 'Not a known time zone; use a name such as Europe/Oslo or America/New_York');

/** PATCH /api/me/time-zone: the signed-in user's zone; null goes back to the network's zone. */
export const timeZoneUpdateSchema = z.object({ timeZone: timeZoneSchema.nullable() }).strict();
export type TimeZoneUpdate = z.infer<typeof timeZoneUpdateSchema>;
