// The customer's own quote page: no sign-in; the unguessable, expiring token in the link is the key.
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { CustomerQuoteView } from '@/components/quotes/customer-quote-view';
import { AppError } from '@/lib/errors';
import { getCustomerQuote } from '@/lib/quotes/get-customer-quote';

export const metadata: Metadata = { title: 'Your quote', robots: { index: false, follow: false } };

type Props = { params: Promise<{ token: string }>; searchParams: Promise<{ payment?: string }> };

export default async function CustomerQuotePage({ params, searchParams }: Props) {
  const [{ token }, { payment }] = await Promise.all([params, searchParams]);
  const data = await getCustomerQuote({ token }).catch((e: unknown) => {
    if (e instanceof AppError && e.code === 'not_found') notFound();
    if (e instanceof AppError && e.code === 'gone') return { gone: e.message };
    throw e;
  });
  return (
    <main className="mx-auto max-w-3xl px-4 py-6 sm:py-10">
      {'gone' in data ? (
        <div className="rounded-lg border-l-4 border-amber bg-amber-light px-4 py-3" role="status">
          <h1 className="text-xl font-bold">This link no longer opens a quote</h1>
          <p>{data.gone}</p>
        </div>
      ) : (
        <CustomerQuoteView token={token} data={data} returned={payment} />
      )}
    </main>
  );
}
