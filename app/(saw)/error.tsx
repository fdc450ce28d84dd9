'use client';

import { PageError } from '@/components/layout/page-error';

export default function GroupError({ reset }: { error: Error; reset: () => void }) {
  return <PageError reset={reset} home="/saw" />;
}
