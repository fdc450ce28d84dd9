'use client';
// Shown by each route group's error.tsx: nothing technical, a way to try again, and a way back.
import Link from 'next/link';
import { Button } from '@/components/ui/button';

export function PageError({ reset, home = '/' }: { reset: () => void; home?: string }) {
  return (
    <div className="mx-auto max-w-xl py-12" role="alert" data-testid="page-error">
      <h1 className="mb-3 text-3xl font-bold">This page could not be shown</h1>
      <p className="text-lg">
        Something went wrong on our side while loading it. Nothing you entered was changed. Try again; if it
        keeps happening, tell the owner what you were doing.
      </p>
      <div className="mt-6 flex flex-wrap gap-3">
        <Button size="lg" onClick={reset}>
          Try again
        </Button>
        <Link
          href={home}
          className="inline-flex min-h-14 items-center rounded-lg border-2 border-grain bg-white px-6 text-lg font-semibold"
        >
          Back to your home page
        </Link>
      </div>
    </div>
  );
}
