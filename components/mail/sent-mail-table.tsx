import Link from 'next/link';
import { Cell, Table, TableHead, TableRow } from '@/components/ui/table';
import type { listSentMail } from '@/lib/mail/list-outbox';

type Row = Awaited<ReturnType<typeof listSentMail>>[number];

export function SentMailTable({ rows }: { rows: Row[] }) {
  if (rows.length === 0) return <p className="p-4 text-bark-soft">Nothing has been sent yet.</p>;
  return (
    <Table data-testid="sent-mail">
      <TableHead columns={['When', 'Job', 'To', 'Subject', 'Result']} />
      <tbody>
        {rows.map((r) => (
          <TableRow key={r.id} className="align-top">
            <Cell className="text-sm whitespace-nowrap">{r.createdAt.toLocaleString('en-GB')}</Cell>
            <Cell>
              {r.jobId ? (
                <Link className="text-spruce underline" href={`/jobs/${r.jobId}`}>
                  {r.jobReference}
                </Link>
              ) : (
                '—'
              )}
            </Cell>
            <Cell>{r.to}</Cell>
            <Cell>{r.subject}</Cell>
            <Cell>
              {r.status === 'sent' ? (
                <span className="font-semibold text-spruce">sent</span>
              ) : (
                <span className="font-semibold text-brick">failed: {r.error}</span>
              )}
            </Cell>
          </TableRow>
        ))}
      </tbody>
    </Table>
  );
}
