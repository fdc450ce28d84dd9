'use client';

import { signOut } from 'next-auth/react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { PASSWORD_MIN_LENGTH } from '@/lib/auth/password-rules';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { changeOwnPasswordRequest } from '@/lib/queries/users';

/** Changing the password ends every session, this one too, so the form signs out afterwards. */
export function ChangePasswordForm() {
  const change = useApiMutation({
    mutationFn: changeOwnPasswordRequest,
    onSuccess: () => signOut({ callbackUrl: '/sign-in' }),
  });
  const errors = change.fieldErrors;

  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    change.mutate({
      currentPassword: String(form.get('currentPassword')),
      newPassword: String(form.get('newPassword')),
    });
  }

  return (
    <form onSubmit={onSubmit} className="max-w-md space-y-4" data-testid="change-password-form" noValidate>
      {change.error && !Object.keys(errors).length && <Notice tone="error">{change.error.message}</Notice>}
      {change.isSuccess && <Notice>Password changed. Sign in again with the new one.</Notice>}
      <Field label="Current password" error={errors.currentPassword}>
        {(p) => (
          <input {...p} name="currentPassword" type="password" autoComplete="current-password" required />
        )}
      </Field>
      <Field
        label="New password"
        error={errors.newPassword}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. You will be asked to sign in again.`}
      >
        {(p) => <input {...p} name="newPassword" type="password" autoComplete="new-password" required />}
      </Field>
      <Button type="submit" disabled={change.isPending}>
        {change.isPending ? 'Changing…' : 'Change password'}
      </Button>
    </form>
  );
}
