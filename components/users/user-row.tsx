'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { ROLES, type Role } from '@/db/enums';
import { userKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { updateUserRequest, type UserRow as User } from '@/lib/queries/users';
import { ROLE_NAMES } from './role-names';
import { Cell, TableRow } from '@/components/ui/table';

type Changes = Parameters<typeof updateUserRequest>[1];
/** A role change or a disabling waits here until the owner confirms it. */
type Pending = { changes: Changes; question: string; yes: string; saved: string };

export function UserRow({ user, onError }: { user: User; onError: (message: string | null) => void }) {
  const [password, setPassword] = useState('');
  const [pending, setPending] = useState<Pending | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const update = useApiMutation({
    mutationFn: ({ changes }: { changes: Changes; saved: string }) => updateUserRequest(user.id, changes),
    invalidates: [userKeys.all],
    onSuccess: (_, { saved }) => {
      onError(null);
      setPassword('');
      setPending(null);
      setSaved(saved);
    },
    onError: (error) => onError(error.message),
  });
  const save = (changes: Changes, savedText: string) => {
    setSaved(null);
    update.mutate({ changes, saved: savedText });
  };
  const ask = (next: Pending) => {
    setSaved(null);
    setPending(next);
  };

  return (
    <TableRow className="align-middle" data-testid={`user-row-${user.email}`}>
      <Cell>
        <div className="font-semibold">{user.name}</div>
        <div className="text-sm text-bark-soft">{user.email}</div>
      </Cell>
      <Cell>
        <select
          aria-label={`Role of ${user.name}`}
          className={inputClass}
          value={user.role}
          disabled={update.isPending || pending !== null}
          onChange={(e) => {
            const role = e.target.value as Role;
            ask({
              changes: { role },
              question: `Change ${user.name}'s role to ${ROLE_NAMES[role].toLowerCase()}? What they may see and do changes at their next page.`,
              yes: 'Change the role',
              saved: `Saved: ${user.name} is now ${ROLE_NAMES[role].toLowerCase()}.`,
            });
          }}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_NAMES[r]}
            </option>
          ))}
        </select>
      </Cell>
      <Cell>
        <form
          className="flex gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            save({ password }, `Saved: ${user.name}'s new password.`);
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
      </Cell>
      <Cell>
        {user.role === 'yard_hand' && (
          <label className="mb-2 flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="size-5"
              checked={user.canUseSaw}
              disabled={update.isPending}
              onChange={(e) =>
                save(
                  { canUseSaw: e.target.checked },
                  `Saved: ${user.name} ${e.target.checked ? 'may' : 'may not'} use the saw screen.`,
                )
              }
            />
            May use the saw screen
          </label>
        )}
        <Button
          variant={user.disabled ? 'primary' : 'danger'}
          disabled={update.isPending || pending !== null}
          onClick={() =>
            user.disabled
              ? save({ disabled: false }, `Saved: ${user.name} can sign in again.`)
              : ask({
                  changes: { disabled: true },
                  question: `Disable ${user.name}'s account? They are signed out and can no longer sign in.`,
                  yes: 'Disable the account',
                  saved: `Saved: ${user.name}'s account is disabled.`,
                })
          }
        >
          {user.disabled ? 'Enable' : 'Disable'}
        </Button>
        {pending && (
          <div
            role="alertdialog"
            aria-label={pending.question}
            className="mt-2 space-y-2"
            data-testid="user-confirm"
          >
            <p className="text-sm font-semibold">{pending.question}</p>
            <div className="flex flex-wrap gap-2">
              <Button disabled={update.isPending} onClick={() => save(pending.changes, pending.saved)}>
                {pending.yes}
              </Button>
              <Button variant="secondary" onClick={() => setPending(null)}>
                Keep as it is
              </Button>
            </div>
          </div>
        )}
        <p role="status" className="mt-2 text-sm font-semibold text-spruce-dark" data-testid="user-saved">
          {saved}
        </p>
      </Cell>
    </TableRow>
  );
}
