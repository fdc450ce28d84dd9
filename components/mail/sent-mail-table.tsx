import Link from 'next/link';
import type { listSentMail } from '@/lib/mail/list-outbox';

type Row = Awaited<ReturnType<typeof listSentMail>>[number];

export function SentMailTable({ rows }: { rows: Row[] }) {
  if (rows.length === 0) return <p className="p-4 text-bark-soft">Nothing has been sent yet.</p>;
  return (
    <table className="w-full text-left" data-testid="sent-mail">
      <thead className="bg-shaving text-sm">
        <tr>
          <th className="p-3">When</th>
          <th className="p-3">Job</th>
          <th className="p-3">To</th>
          <th className="p-3">Subject</th>
          <th className="p-3">Result</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.id} className="border-t border-shaving align-top">
            <td className="p-3 text-sm whitespace-nowrap">{r.createdAt.toLocaleString('en-GB')}</td>
            <td className="p-3">
              {r.jobId ? (
                <Link className="text-spruce underline" href={`/jobs/${r.jobId}`}>
                  {r.jobReference}
                </Link>
              ) : (
                '—'
              )}
            </td>
            <td className="p-3">{r.to}</td>
            <td className="p-3">{r.subject}</td>
            <td className="p-3">
              {r.status === 'sent' ? (
                <span className="font-semibold text-spruce">sent</span>
              ) : (
                <span className="font-semibold text-brick">failed: {r.error}</span>
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
