// GET /api/quote-links/[token]/cut-sheet – public: the quoted plan's cut sheet PDF for the customer
import { route } from '@/lib/api/route';
import { renderCutSheet } from '@/lib/cut-sheets/render-cut-sheet';
import { resolveQuoteToken } from '@/lib/quotes/quote-links';

export const GET = route<{ token: string }, 'quotes:customer'>('quotes:customer', async ({ params }) => {
  const quote = await resolveQuoteToken(params.token);
  const { pdf, fileName } = await renderCutSheet({ planId: quote.planId, forCustomer: true });
  return new Response(new Uint8Array(pdf), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${fileName}"` },
  });
});
