'use client';

import { signIn } from 'next-auth/react';
import { useRouter, useSearchParams } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';

export function SignInForm() {
  const router = useRouter();
  const next = useSearchParams().get('callbackUrl');
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(null);
    const result = await signIn('credentials', {
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
      redirect: false,
    });
    setPending(false);
    if (!result || result.error) {
      setError(
        result?.error && result.error !== 'CredentialsSignin' ? result.error : 'Sign-in failed. Try again.',
      );
      return;
    }
    router.replace(sameSitePath(next));
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="mt-6 space-y-4" noValidate>
      {error && (
        <Notice tone="error" data-testid="sign-in-error">
          {error}
        </Notice>
      )}
      <Field label="E-mail">
        {(p) => <input {...p} name="email" type="email" autoComplete="username" required />}
      </Field>
      <Field label="Password">
        {(p) => <input {...p} name="password" type="password" autoComplete="current-password" required />}
      </Field>
      <Button type="submit" size="lg" className="w-full" disabled={pending}>
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}

/** A callback URL from the query string must never send people to another site. */
function sameSitePath(next: string | null): string {
  if (!next) return '/';
  try {
    const url = new URL(next, window.location.origin);
    return url.origin === window.location.origin ? `${url.pathname}${url.search}` : '/';
  } catch {
    return '/';
  }
}
