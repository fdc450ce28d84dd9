'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { formatPence } from '@/lib/format/money';
import { fetchJson } from '@/lib/queries/fetch-json';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';

type Row = PaymentsOverview['refundsDue'][number];

/** Cancelled jobs still holding the customer's money; the owner refunds each with a reason. */
export function RefundDueList({ rows }: { rows: Row[] }) {
  if (!rows.length) return <p data-testid="refunds-due">No cancelled job holds a payment.</p>;
  return (
    <ul className="divide-y divide-sand" data-testid="refunds-due">
      {rows.map((row) => (
        <RefundDueRow key={row.jobId} row={row} />
      ))}
    </ul>
  );
}

function RefundDueRow({ row }: { row: Row }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const reason = String(new FormData(e.currentTarget).get('reason') ?? '');
    setBusy(true);
    setMessage(null);
    try {
      const { requestedPence } = await fetchJson<{ requestedPence: number }>(
        `/api/jobs/${row.jobId}/refund`,
        { method: 'POST', body: JSON.stringify({ reason }) },
      );
      setMessage({ tone: 'info', text: `Refund of ${formatPence(requestedPence)} sent to the card.` });
      router.refresh();
    } catch (error) {
      setMessage({ tone: 'error', text: (error as Error).message });
    } finally {
      setBusy(false);
    }
  }

  return (
    <li className="space-y-2 py-3">
      <p>
        <span className="font-semibold">{row.reference}</span> · {row.customer} · paid{' '}
        <span className="font-mono">{formatPence(row.paidPence)}</span>
      </p>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate>
        <div className="min-w-64 flex-1">
          <Field label={`Reason for refunding ${row.reference}`}>
            {(p) => <input {...p} name="reason" required maxLength={200} />}
          </Field>
        </div>
        <Button type="submit" variant="danger" disabled={busy}>
          {busy ? 'Refunding…' : `Refund ${formatPence(row.paidPence)}`}
        </Button>
      </form>
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
    </li>
  );
}
