'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { emailPlanRequest } from '@/lib/queries/plans';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** E-mails the quote with a link to accept and pay, and the customer's cut sheet (PDF). */
export function EmailSheetForm({ planId, defaultTo }: { planId: number; defaultTo: string }) {
  const [to, setTo] = useState(defaultTo);
  const [message, setMessage] = useState('');
  const send = useApiMutation({
    mutationFn: () => emailPlanRequest(planId, { to, message }),
    // The message was for this e-mail only; the next one starts blank.
    onSuccess: () => setMessage(''),
  });

  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        send.mutate();
      }}
      className="space-y-3"
      data-testid="email-sheet-form"
    >
      <Field label="Send to" error={send.fieldErrors.to}>
        {(p) => (
          <input {...p} name="to" type="email" required value={to} onChange={(e) => setTo(e.target.value)} />
        )}
      </Field>
      <Field label="Message (optional)" error={send.fieldErrors.message}>
        {(p) => (
          <textarea
            {...p}
            name="message"
            rows={2}
            value={message}
            onChange={(e) => setMessage(e.target.value)}
          />
        )}
      </Field>
      <Button type="submit" disabled={send.isPending}>
        {send.isPending ? 'Sending…' : 'E-mail quote and cut sheet'}
      </Button>
      {(send.isSuccess || send.isError) && (
        <Notice tone={send.isError ? 'error' : 'info'} data-testid="email-result">
          {send.isError
            ? send.error.message
            : `Quote, link to accept and pay, and cut sheet sent to ${send.data?.to}.`}
        </Notice>
      )}
    </form>
  );
}
