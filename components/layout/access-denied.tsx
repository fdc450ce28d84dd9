import Link from 'next/link';
import { Notice } from '@/components/ui/notice';

export function AccessDenied() {
  return (
    <div className="mx-auto max-w-xl py-12" data-testid="access-denied">
      <h1 className="mb-4 text-2xl font-bold">Not available to your role</h1>
      <Notice tone="warning">
        This page belongs to another role in the yard. Ask the owner if you need it.
      </Notice>
      <Link href="/" className="mt-6 inline-block font-semibold text-spruce underline">
        Back to your home page
      </Link>
    </div>
  );
}
