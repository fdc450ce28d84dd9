'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';

/** Cancelling a job is kept apart from everyday buttons and asks once more before it happens. */
export function CancelJob({ reference, onCancel }: { reference: string; onCancel: () => Promise<void> }) {
  const [asking, setAsking] = useState(false);
  if (!asking)
    return (
      <Button variant="quiet" onClick={() => setAsking(true)} data-testid="cancel-job">
        Cancel this job…
      </Button>
    );
  return (
    <div
      role="group"
      aria-label="Cancel the job"
      className="flex flex-wrap items-center gap-3 rounded-lg border-2 border-brick bg-brick-light p-3"
    >
      <p className="flex-1 font-semibold text-brick">
        Cancel {reference}? It leaves the open jobs; you can reopen it later.
      </p>
      <Button variant="danger" onClick={() => onCancel().then(() => setAsking(false))}>
        Yes, cancel {reference}
      </Button>
      <Button variant="secondary" onClick={() => setAsking(false)} autoFocus>
        Keep the job
      </Button>
    </div>
  );
}
