'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { emailPlanRequest } from '@/lib/queries/plans';

/** E-mails the quote with a link to accept and pay, and the customer's cut sheet (PDF). */
export function EmailSheetForm({ planId, defaultTo }: { planId: number; defaultTo: string }) {
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ tone: 'info' | 'error'; text: string } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    setBusy(true);
    setResult(null);
    try {
      const sent = await emailPlanRequest(planId, {
        to: String(data.get('to')),
        message: String(data.get('message') ?? ''),
      });
      setResult({ tone: 'info', text: `Quote, link to accept and pay, and cut sheet sent to ${sent.to}.` });
      // The message was for this e-mail only; the next one starts blank.
      (form.elements.namedItem('message') as HTMLTextAreaElement).value = '';
    } catch (error) {
      setResult({ tone: 'error', text: (error as Error).message });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="space-y-3" data-testid="email-sheet-form">
      <Field label="Send to">
        {(p) => <input {...p} name="to" type="email" required defaultValue={defaultTo} />}
      </Field>
      <Field label="Message (optional)">{(p) => <textarea {...p} name="message" rows={2} />}</Field>
      <Button type="submit" disabled={busy}>
        {busy ? 'Sending…' : 'E-mail quote and cut sheet'}
      </Button>
      {result && (
        <Notice tone={result.tone} data-testid="email-result">
          {result.text}
        </Notice>
      )}
    </form>
  );
}
