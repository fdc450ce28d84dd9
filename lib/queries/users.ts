import { queryOptions } from '@tanstack/react-query';
import type { Role } from '@/db/enums';
import { fetchJson } from './fetch-json';
import { userKeys } from './query-keys';

export type UserRow = {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  canUseSaw: boolean;
};

export const usersQuery = () =>
  queryOptions({
    queryKey: userKeys.all,
    queryFn: () => fetchJson<{ users: UserRow[] }>('/api/users').then((r) => r.users),
  });

export function updateUserRequest(userId: number, changes: Partial<UserRow> & { password?: string }) {
  return fetchJson<{ user: UserRow }>(`/api/users/${userId}`, {
    method: 'PATCH',
    body: JSON.stringify(changes),
  });
}

export function createUserRequest(body: { email: string; name: string; role: Role; password: string }) {
  return fetchJson<{ user: UserRow }>('/api/users', { method: 'POST', body: JSON.stringify(body) });
}

export function changeOwnPasswordRequest(body: { currentPassword: string; newPassword: string }) {
  return fetchJson<{ changed: true }>('/api/account/password', {
    method: 'POST',
    body: JSON.stringify(body),
  });
}
