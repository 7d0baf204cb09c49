// The areas of the signed-in app. List only areas that work; add each new one here when its screens land.
import type { ComponentType } from 'react';
import type { Href } from 'expo-router';
import type { RoleName } from '@/shared/api';
import {
  ADMIN_ROLES, AUDIT_READER_ROLES, CAMPAIGN_PLANNER_ROLES, holdsAnyRole, INVENTORY_IMPORT_ROLES, OPERATOR_ROLES, SIGNOFF_QUEUE_ROLES,
  SLOT_SEARCH_ROLES, TENANT_PORTAL_ROLES,
} from '@/shared/permissions';
import { CampaignIcon, SlotIcon } from '@/components/slots/slot-icons';
import { AuditIcon, CalendarIcon, FreezeIcon, ImportIcon, MapIcon, NetworkIcon, NoticeIcon, OutboxIcon, OverviewIcon, PersonIcon, SignoffIcon, SlicesIcon } from '@/components/icons';

export type NavArea = {
  key: string;
  label: string;
  href: Href;
  /** Path prefixes that count as being inside this area. */
  matches: (pathname: string) => boolean;
  Icon: ComponentType<{ size?: number; color?: string }>;
  /** Only users holding one of these roles (a set from shared/permissions) see the area (the API checks again); unset = everyone signed in. */
  roles?: readonly RoleName[];
};

export const NAV_AREAS: readonly NavArea[] = [
  { key: 'overview', label: 'Overview', href: '/', matches: (pathname) => pathname === '/', Icon: OverviewIcon },
  { key: 'network', label: 'Network', href: '/network', matches: (pathname) => pathname.startsWith('/network'), Icon: NetworkIcon },
  { key: 'slices', label: 'Slices', href: '/slices', matches: (pathname) => pathname.startsWith('/slices'), Icon: SlicesIcon },
  { key: 'map', label: 'Map', href: '/map', matches: (pathname) => pathname.startsWith('/map'), Icon: MapIcon },
  {
    key: 'calendar',
    label: 'Calendar',
    href: '/calendar',
    // A window's own pages are reached from the calendar, so they keep it highlighted.
    matches: (pathname) => pathname.startsWith('/calendar') || pathname.startsWith('/windows'),
    Icon: CalendarIcon,
  },
  {
    // When one window's work hurts least: the people who book windows.
    key: 'slots', label: 'Find a slot', href: '/slots', matches: (pathname) => pathname.startsWith('/slots'),
    Icon: SlotIcon, roles: SLOT_SEARCH_ROLES,
  },
  {
    // Many windows scheduled together: planners run them (others who may read one reach it from the calendar).
    key: 'campaigns', label: 'Campaigns', href: '/campaigns', matches: (pathname) => pathname.startsWith('/campaigns'),
    Icon: CampaignIcon, roles: CAMPAIGN_PLANNER_ROLES,
  },
  {
    key: 'freezes', label: 'Freezes', href: '/freezes', matches: (pathname) => pathname.startsWith('/freezes'),
    // Operator staff only: the API does not show freezes to tenant users.
    Icon: FreezeIcon, roles: OPERATOR_ROLES,
  },
  {
    key: 'imports', label: 'Imports', href: '/imports', matches: (pathname) => pathname.startsWith('/imports'),
    Icon: ImportIcon, roles: INVENTORY_IMPORT_ROLES,
  },
  {
    key: 'outbox', label: 'Outbox', href: '/outbox', matches: (pathname) => pathname.startsWith('/outbox'),
    Icon: OutboxIcon, roles: ADMIN_ROLES,
  },
  {
    // Who may sign in and how: the people, and the single sign-on settings reached from their screen.
    key: 'people', label: 'People', href: '/people', matches: (pathname) => pathname.startsWith('/people') || pathname.startsWith('/settings/sso'),
    Icon: PersonIcon, roles: ADMIN_ROLES,
  },
  {
    key: 'sign-off', label: 'Sign-off', href: '/sign-off', matches: (pathname) => pathname.startsWith('/sign-off') || pathname.startsWith('/security'),
    // Approvers decide; admins read the queue and set the sign-off policy.
    Icon: SignoffIcon, roles: SIGNOFF_QUEUE_ROLES,
  },
  {
    key: 'audit', label: 'Audit trail', href: '/audit', matches: (pathname) => pathname.startsWith('/audit'),
    // Read only, for the people who answer for changes: admins and change-board approvers.
    Icon: AuditIcon, roles: AUDIT_READER_ROLES,
  },
  {
    key: 'notices', label: 'Notices', href: '/notices', matches: (pathname) => pathname.startsWith('/notices'),
    // The tenant portal; staff follow notices on each window's page.
    Icon: NoticeIcon, roles: TENANT_PORTAL_ROLES,
  },
];

/** The areas a user with these roles may open. */
export function areasFor(roles: readonly RoleName[]): NavArea[] {
  return NAV_AREAS.filter((area) => !area.roles || holdsAnyRole(roles, area.roles));
}
