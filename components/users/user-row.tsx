'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { ROLES, type Role } from '@/db/enums';
import { updateUserRequest, type UserRow as User } from '@/lib/queries/users';
import { ROLE_NAMES } from './role-names';

export function UserRow({ user, onError }: { user: User; onError: (message: string | null) => void }) {
  const queryClient = useQueryClient();
  const [password, setPassword] = useState('');
  const update = useMutation({
    mutationFn: (changes: Parameters<typeof updateUserRequest>[1]) => updateUserRequest(user.id, changes),
    onSuccess: () => {
      onError(null);
      setPassword('');
      return queryClient.invalidateQueries({ queryKey: ['users'] });
    },
    onError: (error) => onError(error.message),
  });

  return (
    <tr className="border-t border-shaving align-middle" data-testid={`user-row-${user.email}`}>
      <td className="p-3">
        <div className="font-semibold">{user.name}</div>
        <div className="text-sm text-bark-soft">{user.email}</div>
      </td>
      <td className="p-3">
        <select
          aria-label={`Role of ${user.name}`}
          className={inputClass}
          value={user.role}
          disabled={update.isPending}
          onChange={(e) => update.mutate({ role: e.target.value as Role })}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_NAMES[r]}
            </option>
          ))}
        </select>
      </td>
      <td className="p-3">
        <form
          className="flex gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            update.mutate({ password });
          }}
        >
          <input
            aria-label={`New password for ${user.name}`}
            className={inputClass}
            type="password"
            autoComplete="new-password"
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            placeholder="New password"
          />
          <Button type="submit" variant="secondary" disabled={!password || update.isPending}>
            Reset
          </Button>
        </form>
      </td>
      <td className="p-3">
        {user.role === 'yard_hand' && (
          <label className="mb-2 flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="size-5"
              checked={user.canUseSaw}
              disabled={update.isPending}
              onChange={(e) => update.mutate({ canUseSaw: e.target.checked })}
            />
            May use the saw screen
          </label>
        )}
        <Button
          variant={user.disabled ? 'primary' : 'danger'}
          disabled={update.isPending}
          onClick={() => update.mutate({ disabled: !user.disabled })}
        >
          {user.disabled ? 'Enable' : 'Disable'}
        </Button>
      </td>
    </tr>
  );
}
