// GET /api/plans/[planId]/cut-sheet – the plan's cut sheet as a PDF download
import { attachmentDisposition } from '@/lib/api/attachment';
import { parseId, route } from '@/lib/api/route';
import { renderCutSheet } from '@/lib/cut-sheets/render-cut-sheet';

export const GET = route<{ planId: string }>('plans:read', async ({ params }) => {
  const { pdf, fileName } = await renderCutSheet({ planId: parseId(params.planId, 'That plan') });
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': attachmentDisposition(fileName),
    },
  });
});
