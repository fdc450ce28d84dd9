'use client';

import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ROLES, type Role } from '@/db/enums';
import { userKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { createUserRequest } from '@/lib/queries/users';
import { ROLE_NAMES } from './role-names';

export function AddUserForm() {
  const create = useApiMutation({ mutationFn: createUserRequest, invalidates: [userKeys.all] });
  const errors = create.fieldErrors;

  function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const target = event.currentTarget;
    create.mutate(
      {
        email: String(form.get('email')),
        name: String(form.get('name')),
        role: String(form.get('role')) as Role,
        password: String(form.get('password')),
      },
      { onSuccess: () => target.reset() },
    );
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-2" data-testid="add-user-form" noValidate>
      {create.error && !Object.keys(errors).length && (
        <Notice tone="error" className="sm:col-span-2">
          {create.error.message}
        </Notice>
      )}
      {create.isSuccess && <Notice className="sm:col-span-2">Account added.</Notice>}
      <Field label="Name" error={errors.name}>
        {(p) => <input {...p} name="name" required />}
      </Field>
      <Field label="E-mail" error={errors.email}>
        {(p) => <input {...p} name="email" type="email" required />}
      </Field>
      <Field label="Role" error={errors.role}>
        {(p) => (
          <select {...p} name="role" defaultValue="yard_hand">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_NAMES[r]}
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field
        label="First password"
        error={errors.password}
        hint="At least 8 characters; they can change it later."
      >
        {(p) => <input {...p} name="password" type="password" autoComplete="new-password" required />}
      </Field>
      <div className="sm:col-span-2">
        <Button type="submit" disabled={create.isPending}>
          Add account
        </Button>
      </div>
    </form>
  );
}
