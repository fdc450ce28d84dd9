import type { Role } from '@/db/enums';

export const ROLE_NAMES: Record<Role, string> = {
  owner: 'Owner',
  yard_hand: 'Yard hand',
  saw_operator: 'Saw operator',
};
