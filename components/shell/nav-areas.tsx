// The areas of the signed-in app. List only areas that work; add each new one here when its screens land.
import type { ComponentType } from 'react';
import type { Href } from 'expo-router';
import { OverviewIcon } from '@/components/icons';

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
];
