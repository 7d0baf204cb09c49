// The areas of the signed-in app. List only areas that work; add each new one here when its screens land.
import type { ComponentType } from 'react';
import type { Href } from 'expo-router';
import { CalendarIcon, FreezeIcon, MapIcon, OverviewIcon } from '@/components/icons';

export type NavArea = {
  key: string;
  label: string;
  href: Href;
  /** Path prefixes that count as being inside this area. */
  matches: (pathname: string) => boolean;
  Icon: ComponentType<{ size?: number; color?: string }>;
};

export const NAV_AREAS: readonly NavArea[] = [
  { key: 'overview', label: 'Overview', href: '/', matches: (pathname) => pathname === '/', Icon: OverviewIcon },
  { key: 'map', label: 'Map', href: '/map', matches: (pathname) => pathname.startsWith('/map'), Icon: MapIcon },
  {
    key: 'calendar',
    label: 'Calendar',
    href: '/calendar',
    // A window's own pages are reached from the calendar, so they keep it highlighted.
    matches: (pathname) => pathname.startsWith('/calendar') || pathname.startsWith('/windows'),
    Icon: CalendarIcon,
  },
  { key: 'freezes', label: 'Freezes', href: '/freezes', matches: (pathname) => pathname.startsWith('/freezes'), Icon: FreezeIcon },
];
