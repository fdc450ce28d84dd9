import type { Action } from '@/lib/auth/permissions';

/** A link shown to whoever may perform its action (roles, plus a yard hand granted the saw). */
export type NavItem = { href: string; label: string; action: Action };

// The office navigation. Later features add their pages here.
export const officeNav: NavItem[] = [
  { href: '/overview', label: 'Overview', action: 'reports:read' },
  { href: '/jobs', label: 'Jobs', action: 'jobs:edit' },
  { href: '/customers', label: 'Customers', action: 'customers:read' },
  { href: '/payments', label: 'Payments', action: 'payments:read' },
  { href: '/frames', label: 'Frame schedules', action: 'frames:edit' },
  { href: '/rack', label: 'Offcut rack', action: 'offcuts:edit' },
  { href: '/stock', label: 'Stock', action: 'stock:receive' },
  { href: '/reports', label: 'Reports', action: 'reports:read' },
  { href: '/saw', label: 'Saw queue', action: 'saw:read' },
  { href: '/users', label: 'Users', action: 'users:manage' },
  { href: '/settings', label: 'Yard settings', action: 'settings:edit' },
];
