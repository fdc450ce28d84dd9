// Who may do what. Every route handler and server action names the action it performs.
import type { Role } from '@/db/enums';

export const ACTIONS = {
  'users:manage': ['owner'],
  'settings:edit': ['owner'],
  'sections:read': ['owner', 'yard_hand', 'saw_operator'],
  'sections:edit': ['owner'],
  'stock:receive': ['owner', 'yard_hand'],
  'stock:adjust': ['owner'],
  'jobs:read': ['owner', 'yard_hand', 'saw_operator'],
  'jobs:edit': ['owner', 'yard_hand'],
  'plans:create': ['owner', 'yard_hand'],
  'plans:release': ['owner', 'yard_hand'],
  'plans:read': ['owner', 'yard_hand', 'saw_operator'],
  'mail:send': ['owner', 'yard_hand'],
  'mail:outbox': ['owner'],
  'saw:cut': ['owner', 'saw_operator'],
  'offcuts:read': ['owner', 'yard_hand', 'saw_operator'],
  'offcuts:edit': ['owner', 'yard_hand'],
  'offcuts:label': ['owner', 'yard_hand', 'saw_operator'],
  'frames:edit': ['owner', 'yard_hand'],
  'reports:read': ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof ACTIONS;

export function can(role: Role, action: Action): boolean {
  return (ACTIONS[action] as readonly Role[]).includes(role);
}

/** Where each role lands after signing in. */
export const HOME_BY_ROLE: Record<Role, string> = {
  owner: '/overview',
  yard_hand: '/jobs',
  saw_operator: '/saw',
};
