import type { Role } from '@/db/enums';

export type NavItem = { href: string; label: string; roles: Role[] };

// The office navigation. Later features add their pages here.
export const officeNav: NavItem[] = [
  { href: '/overview', label: 'Overview', roles: ['owner'] },
  { href: '/jobs', label: 'Jobs', roles: ['owner', 'yard_hand'] },
  { href: '/customers', label: 'Customers', roles: ['owner', 'yard_hand'] },
  { href: '/payments', label: 'Payments', roles: ['owner'] },
  { href: '/frames', label: 'Frame schedules', roles: ['owner', 'yard_hand'] },
  { href: '/rack', label: 'Offcut rack', roles: ['owner', 'yard_hand'] },
  { href: '/stock', label: 'Stock', roles: ['owner', 'yard_hand'] },
  { href: '/reports', label: 'Reports', roles: ['owner'] },
  { href: '/saw', label: 'Saw queue', roles: ['owner', 'saw_operator'] },
  { href: '/users', label: 'Users', roles: ['owner'] },
  { href: '/settings', label: 'Yard settings', roles: ['owner'] },
];
