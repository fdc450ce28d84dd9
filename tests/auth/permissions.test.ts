import { describe, expect, it } from 'vitest';
import { ROLES } from '@/db/enums';
import { ACTIONS, can, HOME_BY_ROLE, isPublicAction, type Action } from '@/lib/auth/permissions';

// The roles table of the product design: the owner does everything; the yard hand runs jobs,
// plans, mail and the rack; the saw operator reads plans and cuts.
const expected: Record<Action, { owner: boolean; yard_hand: boolean; saw_operator: boolean }> = {
  'users:manage': { owner: true, yard_hand: false, saw_operator: false },
  'settings:edit': { owner: true, yard_hand: false, saw_operator: false },
  'sections:read': { owner: true, yard_hand: true, saw_operator: true },
  'sections:edit': { owner: true, yard_hand: false, saw_operator: false },
  'stock:receive': { owner: true, yard_hand: true, saw_operator: false },
  'stock:adjust': { owner: true, yard_hand: false, saw_operator: false },
  'jobs:read': { owner: true, yard_hand: true, saw_operator: true },
  'jobs:edit': { owner: true, yard_hand: true, saw_operator: false },
  'plans:create': { owner: true, yard_hand: true, saw_operator: false },
  'plans:release': { owner: true, yard_hand: true, saw_operator: false },
  'plans:read': { owner: true, yard_hand: true, saw_operator: true },
  'mail:send': { owner: true, yard_hand: true, saw_operator: false },
  'mail:outbox': { owner: true, yard_hand: false, saw_operator: false },
  'saw:cut': { owner: true, yard_hand: false, saw_operator: true },
  'offcuts:read': { owner: true, yard_hand: true, saw_operator: true },
  'offcuts:edit': { owner: true, yard_hand: true, saw_operator: false },
  'offcuts:label': { owner: true, yard_hand: true, saw_operator: true },
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

  it('sends each role to its own home', () => {
    expect(HOME_BY_ROLE).toEqual({ owner: '/overview', yard_hand: '/jobs', saw_operator: '/saw' });
  });
});
