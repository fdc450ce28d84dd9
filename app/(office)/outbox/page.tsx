import type { Metadata } from 'next';
import Link from 'next/link';
import { CaughtMailList } from '@/components/mail/caught-mail-list';
import { SentMailTable } from '@/components/mail/sent-mail-table';
import { Card, cardClass } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { listCaughtMail, listSentMail } from '@/lib/mail/list-outbox';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';

export const metadata: Metadata = { title: 'Outbox' };
export const dynamic = 'force-dynamic';

export default async function OutboxPage() {
  await requirePageUser('mail:outbox');
  const [sent, caught] = await Promise.all([listSentMail(), listCaughtMail()]);
  return (
    <>
      <PageHeader
        title="Outbox"
        lead="Cut sheets and quotes the yard has e-mailed, and whether the mail server took them."
      />
      <div className="space-y-6">
        <ScrollRegion label="Sent mail" className={cn(cardClass, 'p-0')}>
          <SentMailTable rows={sent} />
        </ScrollRegion>
        {caught && (
          <Card>
            <h2 className="mb-3 text-xl font-bold">Caught by the local mail catcher</h2>
            <p className="mb-3 text-sm text-bark-soft">
              In development nothing leaves this machine: messages land here instead of in the customer&apos;s
              inbox.
            </p>
            <CaughtMailList messages={caught} />
          </Card>
        )}
        <p className="text-sm">
          <Link href="/jobs" className="text-spruce underline">
            Back to jobs
          </Link>
        </p>
      </div>
    </>
  );
}
