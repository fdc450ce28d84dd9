import { queryOptions } from '@tanstack/react-query';
import type { createUser, listUsers, updateUser } from '@/lib/users/manage-users';
import type {
  ChangeOwnPasswordBodyInput,
  CreateUserBodyInput,
  UpdateUserBodyInput,
} from '@/lib/validations/users';
import { fetchJson } from './fetch-json';
import { userKeys } from './query-keys';
import type { WireOf } from './wire';

export type UserRow = WireOf<typeof listUsers>[number];

export const usersQuery = () =>
  queryOptions({
    queryKey: userKeys.all,
    queryFn: () => fetchJson<{ users: UserRow[] }>('/api/users').then((r) => r.users),
  });

export function updateUserRequest(userId: number, changes: UpdateUserBodyInput) {
  return fetchJson<{ user: WireOf<typeof updateUser> }>(`/api/users/${userId}`, {
    method: 'PATCH',
    body: JSON.stringify(changes),
  });
}

export function createUserRequest(body: CreateUserBodyInput) {
  return fetchJson<{ user: WireOf<typeof createUser> }>('/api/users', {
    method: 'POST',
    body: JSON.stringify(body),
  });
}

export function changeOwnPasswordRequest(body: ChangeOwnPasswordBodyInput) {
  return fetchJson<{ changed: true; signInAgain: true }>('/api/account/password', {
    method: 'POST',
    body: JSON.stringify(body),
  });
}
