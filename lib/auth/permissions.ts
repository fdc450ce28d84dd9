// Who may do what. Every route handler and server action names the action it performs.
import type { Role } from '@/db/enums';

/** Marks an action anyone may perform without signing in; the comment beside it says what guards it. */
export const PUBLIC = 'public' as const;

export const ACTIONS = {
  'account:edit': ['owner', 'yard_hand', 'saw_operator'],
  'users:manage': ['owner'],
  'settings:edit': ['owner'],
  'sections:read': ['owner', 'yard_hand', 'saw_operator'],
  'sections:edit': ['owner'],
  'stock:receive': ['owner', 'yard_hand'],
  'stock:adjust': ['owner'],
  // Jobs and office plan views carry customer details and prices: not for the saw operator.
  'jobs:read': ['owner', 'yard_hand'],
  'jobs:edit': ['owner', 'yard_hand'],
  'plans:create': ['owner', 'yard_hand'],
  'plans:release': ['owner', 'yard_hand'],
  'plans:read': ['owner', 'yard_hand'],
  /** The saw screens: released plans only, without customer contact details or prices. */
  'saw:read': ['owner', 'saw_operator'],
  /** The saw queue's progress (references, customer names, boards cut), shown at the saw and in the office. */
  'saw:progress': ['owner', 'yard_hand', 'saw_operator'],
  'mail:send': ['owner', 'yard_hand'],
  'mail:outbox': ['owner'],
  'saw:cut': ['owner', 'saw_operator'],
  'offcuts:read': ['owner', 'yard_hand', 'saw_operator'],
  'offcuts:edit': ['owner', 'yard_hand'],
  'offcuts:label': ['owner', 'yard_hand', 'saw_operator'],
  /** Saying where offcuts lie: the office moves them on the rack, the saw racks the ones it makes. */
  'offcuts:move': ['owner', 'yard_hand', 'saw_operator'],
  'frames:edit': ['owner', 'yard_hand'],
  'reports:read': ['owner'],
  'customers:read': ['owner', 'yard_hand'],
  'customers:edit': ['owner', 'yard_hand'],
  'quotes:share': ['owner', 'yard_hand'],
  'plans:override-release': ['owner'],
  'payments:read': ['owner'],
  'payments:refund': ['owner'],
  // Deliberately without sign-in. The customer's quote page and its accept and pay calls: the
  // unguessable, expiring, revocable token in the link is the authority.
  'quotes:customer': PUBLIC,
  // The payment service's webhook: the signature over the raw body is the authority (checked by the
  // SDK), so it is also exempt from the browser Origin check.
  'payments:webhook': PUBLIC,
} as const satisfies Record<string, readonly Role[] | typeof PUBLIC>;

export type Action = keyof typeof ACTIONS;
export type PublicAction = { [A in Action]: (typeof ACTIONS)[A] extends typeof PUBLIC ? A : never }[Action];

export function isPublicAction(action: Action): action is PublicAction {
  return ACTIONS[action] === PUBLIC;
}

export function can(role: Role, action: Action): boolean {
  const allowed = ACTIONS[action];
  return allowed === PUBLIC || (allowed as readonly Role[]).includes(role);
}

/** Actions the owner can grant a yard hand with the "may use the saw" switch (small yards share the saw). */
export const SAW_GRANT_ACTIONS: readonly Action[] = ['saw:read', 'saw:cut'];

/** What one person may do: their role, plus the saw screens when the owner has granted them. */
export function userCan(user: { role: Role; canUseSaw?: boolean }, action: Action): boolean {
  if (can(user.role, action)) return true;
  return user.role === 'yard_hand' && user.canUseSaw === true && SAW_GRANT_ACTIONS.includes(action);
}

/** Where each role lands after signing in. */
export const HOME_BY_ROLE: Record<Role, string> = {
  owner: '/overview',
  yard_hand: '/jobs',
  saw_operator: '/saw',
};
