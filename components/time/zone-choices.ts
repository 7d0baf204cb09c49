// Zone names to offer while a person types their zone: this device's, the network's, UTC, then matches.
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { deviceTimeZone } from './zoned-format';

/** A few zones for runtimes without Intl.supportedValuesOf; typing any other valid name still works. */
const FALLBACK_ZONES = ['UTC', 'Europe/London', 'Europe/Oslo', 'Europe/Berlin', 'Europe/Helsinki', 'America/New_York',
  'America/Chicago', 'America/Los_Angeles', 'Asia/Kolkata', 'Asia/Singapore', 'Asia/Tokyo', 'Australia/Sydney'];

function knownZones(): string[] {
  const intl = Intl as { supportedValuesOf?: (key: 'timeZone') => string[] };
  try {
    return intl.supportedValuesOf ? intl.supportedValuesOf('timeZone') : FALLBACK_ZONES;
  } catch {
    return FALLBACK_ZONES;
  }
}

/** Up to `limit` zones for `typed`: with nothing typed the usual three, else names containing every typed word. */
export function zoneSuggestions(typed: string, limit = 6): string[] {
  const usual = [...new Set([deviceTimeZone(), NETWORK_TIME_ZONE, 'UTC'])];
  const words = typed.trim().toLowerCase().split(/[\s/_]+/).filter(Boolean);
  if (words.length === 0) return usual;
  const matches = [...new Set([...usual, ...knownZones()])]
    .filter((zone) => words.every((word) => zone.toLowerCase().replace(/_/g, ' ').includes(word)));
  return matches.slice(0, limit);
}
