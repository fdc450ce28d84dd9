'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { formatPence } from '@/lib/format/money';
import { refundJobRequest } from '@/lib/queries/quotes';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { PaymentsOverview } from '@/lib/quotes/get-payments-overview';

type Row = PaymentsOverview['refundsDue'][number];

/** Cancelled jobs still holding the customer's money; the owner refunds each with a reason. */
export function RefundDueList({ rows }: { rows: Row[] }) {
  // Kept here, not in the row: once refunded, the refresh drops the row and its state with it.
  const [sent, setSent] = useState<string | null>(null);
  return (
    <div className="space-y-2">
      {sent && <Notice>{sent}</Notice>}
      {rows.length ? (
        <ul className="divide-y divide-sand" data-testid="refunds-due">
          {rows.map((row) => (
            <RefundDueRow
              key={row.jobId}
              row={row}
              onRefunded={(pence) =>
                setSent(`Refund of ${formatPence(pence)} sent to the card for ${row.reference}.`)
              }
            />
          ))}
        </ul>
      ) : (
        <p data-testid="refunds-due">No cancelled job holds a payment.</p>
      )}
    </div>
  );
}

function RefundDueRow({ row, onRefunded }: { row: Row; onRefunded: (pence: number) => void }) {
  const router = useRouter();
  const refund = useApiMutation({
    mutationFn: (reason: string) => refundJobRequest(row.jobId, { reason }),
    onSuccess: (data) => {
      onRefunded(data.requestedPence);
      router.refresh();
    },
  });

  function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    refund.mutate(String(new FormData(e.currentTarget).get('reason') ?? ''));
  }

  return (
    <li className="space-y-2 py-3">
      <p>
        <span className="font-semibold">{row.reference}</span> · {row.customerName} · paid{' '}
        <span className="font-mono">{formatPence(row.paidPence)}</span>
      </p>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate>
        <div className="min-w-64 flex-1">
          <Field label={`Reason for refunding ${row.reference}`} error={refund.fieldErrors.reason}>
            {(p) => <input {...p} name="reason" required maxLength={200} />}
          </Field>
        </div>
        <Button type="submit" variant="danger" disabled={refund.isPending}>
          {refund.isPending ? 'Refunding…' : `Refund ${formatPence(row.paidPence)}`}
        </Button>
      </form>
      {refund.isError && <Notice tone="error">{refund.error.message}</Notice>}
    </li>
  );
}
