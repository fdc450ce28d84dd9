import { describe, expect, it } from 'vitest';
import { ROLES } from '@/db/enums';
import { ACTIONS, can, HOME_BY_ROLE, isPublicAction, userCan, type Action } from '@/lib/auth/permissions';

// The roles table of the product design: the owner does everything; the yard hand runs jobs,
// plans, mail and the rack; the saw operator sees only the saw screens (released plans, no
// customer contact details or prices) and cuts.
const expected: Record<Action, { owner: boolean; yard_hand: boolean; saw_operator: boolean }> = {
  'account:edit': { owner: true, yard_hand: true, saw_operator: true },
  'users:manage': { owner: true, yard_hand: false, saw_operator: false },
  'settings:edit': { owner: true, yard_hand: false, saw_operator: false },
  'sections:read': { owner: true, yard_hand: true, saw_operator: true },
  'sections:edit': { owner: true, yard_hand: false, saw_operator: false },
  'stock:receive': { owner: true, yard_hand: true, saw_operator: false },
  'stock:adjust': { owner: true, yard_hand: false, saw_operator: false },
  'jobs:read': { owner: true, yard_hand: true, saw_operator: false },
  'jobs:edit': { owner: true, yard_hand: true, saw_operator: false },
  'plans:create': { owner: true, yard_hand: true, saw_operator: false },
  'plans:release': { owner: true, yard_hand: true, saw_operator: false },
  'plans:read': { owner: true, yard_hand: true, saw_operator: false },
  'saw:read': { owner: true, yard_hand: false, saw_operator: true },
  'saw:progress': { owner: true, yard_hand: true, saw_operator: true },
  'mail:send': { owner: true, yard_hand: true, saw_operator: false },
  'mail:outbox': { owner: true, yard_hand: false, saw_operator: false },
  'saw:cut': { owner: true, yard_hand: false, saw_operator: true },
  'offcuts:read': { owner: true, yard_hand: true, saw_operator: true },
  'offcuts:edit': { owner: true, yard_hand: true, saw_operator: false },
  'offcuts:label': { owner: true, yard_hand: true, saw_operator: true },
  'offcuts:move': { owner: true, yard_hand: true, saw_operator: true },
  'frames:edit': { owner: true, yard_hand: true, saw_operator: false },
  'reports:read': { owner: true, yard_hand: false, saw_operator: false },
  'customers:read': { owner: true, yard_hand: true, saw_operator: false },
  'customers:edit': { owner: true, yard_hand: true, saw_operator: false },
  'quotes:share': { owner: true, yard_hand: true, saw_operator: false },
  'plans:override-release': { owner: true, yard_hand: false, saw_operator: false },
  'payments:read': { owner: true, yard_hand: false, saw_operator: false },
  'payments:refund': { owner: true, yard_hand: false, saw_operator: false },
  // Public on purpose: the customer's link token and the webhook's signature are the authority.
  'quotes:customer': { owner: true, yard_hand: true, saw_operator: true },
  'payments:webhook': { owner: true, yard_hand: true, saw_operator: true },
};

// Only these actions may be performed without signing in.
const publicActions = ['payments:webhook', 'quotes:customer'];

describe('role × action table', () => {
  it('covers every action the app declares', () => {
    expect(Object.keys(expected).sort()).toEqual(Object.keys(ACTIONS).sort());
  });

  for (const [action, row] of Object.entries(expected) as [Action, Record<string, boolean>][]) {
    for (const role of ROLES) {
      it(`${role} ${row[role] ? 'may' : 'may not'} ${action}`, () => {
        expect(can(role, action)).toBe(row[role]);
      });
    }
  }

  it('only the customer quote link and the signed payment webhook are public', () => {
    const found = (Object.keys(ACTIONS) as Action[]).filter(isPublicAction).sort();
    expect(found).toEqual(publicActions);
  });

  it('the owner may do everything', () => {
    for (const action of Object.keys(ACTIONS) as Action[]) expect(can('owner', action)).toBe(true);
  });

  it('lets the owner grant a yard hand the saw screens, and nothing else', () => {
    const hand = { role: 'yard_hand' as const, canUseSaw: true };
    for (const action of Object.keys(ACTIONS) as Action[]) {
      const expectedAllowed = can('yard_hand', action) || action === 'saw:read' || action === 'saw:cut';
      expect(userCan(hand, action), action).toBe(expectedAllowed);
    }
    expect(userCan({ role: 'yard_hand', canUseSaw: false }, 'saw:cut')).toBe(false);
    // The switch means nothing for a saw operator's office rights.
    expect(userCan({ role: 'saw_operator', canUseSaw: true }, 'jobs:read')).toBe(false);
  });

  it('sends each role to its own home', () => {
    expect(HOME_BY_ROLE).toEqual({ owner: '/overview', yard_hand: '/jobs', saw_operator: '/saw' });
  });
});
