// GET /api/offcuts/export – the filtered rack as a CSV download (everyone signed in)
import { attachmentDisposition } from '@/lib/api/attachment';
import { route } from '@/lib/api/route';
import { offcutsToCsv } from '@/lib/offcuts/offcuts-csv';
import { listOffcutsForExport } from '@/lib/offcuts/list-offcuts';
import { offcutListQuerySchema } from '@/lib/validations/offcuts';

export const GET = route('offcuts:read', async ({ req }) => {
  const query = offcutListQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  const csv = offcutsToCsv(await listOffcutsForExport({ query }));
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': attachmentDisposition(`offcut-rack-${day}.csv`),
    },
  });
});
