import type { Metadata } from 'next';
import { Suspense } from 'react';
import { SignInForm } from '@/components/auth/sign-in-form';
import { Logo } from '@/components/ui/logo';

export const metadata: Metadata = { title: 'Sign in' };

export default function SignInPage() {
  return (
    <main
      id="main-content"
      tabIndex={-1}
      className="flex min-h-screen items-center justify-center bg-[repeating-linear-gradient(90deg,var(--color-sawdust)_0_46px,var(--color-shaving)_46px_48px)] p-4"
    >
      <div className="w-full max-w-md rounded-2xl border-2 border-grain bg-white p-8 shadow-lg">
        <Logo size={44} />
        <h1 className="mt-6 text-2xl font-bold">Sign in to the yard</h1>
        <p className="mt-1 text-bark-soft">Cutting plans, the saw queue and the offcut rack.</p>
        <Suspense>
          <SignInForm />
        </Suspense>
      </div>
    </main>
  );
}
