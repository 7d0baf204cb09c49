// Which areas get a place of their own in the phone tab bar and which wait behind "More".
import type { NavArea } from '@/components/shell/nav-areas';

/** Most tabs a 390 px phone bar holds with readable labels (about 78 px each). */
export const PHONE_MAX_TABS = 5;

/** The areas used most on the move, in the order they take the bar's places (sign-off: approvers and admins; notices: tenants only). */
const PHONE_FIRST_KEYS: readonly string[] = ['overview', 'sign-off', 'notices', 'calendar', 'network', 'map'];

export type PhoneAreas = { tabs: NavArea[]; more: NavArea[] };

/** Every area fits when there are at most PHONE_MAX_TABS; otherwise four tabs plus More holding the rest. */
export function splitPhoneAreas(areas: readonly NavArea[]): PhoneAreas {
  if (areas.length <= PHONE_MAX_TABS) return { tabs: [...areas], more: [] };
  const places = PHONE_MAX_TABS - 1;
  const rank = (area: NavArea) => {
    const at = PHONE_FIRST_KEYS.indexOf(area.key);
    return at === -1 ? PHONE_FIRST_KEYS.length + areas.indexOf(area) : at;
  };
  const tabs = [...areas].sort((a, b) => rank(a) - rank(b)).slice(0, places);
  return { tabs, more: areas.filter((area) => !tabs.includes(area)) };
}
