// POST /api/jobs/[jobId]/items/import – import a cut list (body: CSV or tab-separated text), all or nothing.
// ?replace=1 swaps the whole list. 200 { imported } or 422 { errors: [{ line, column, message }] }.
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { importJobItems } from '@/lib/jobs/import-job-items';
import { MAX_IMPORT_BYTES } from '@/lib/validations/jobs';

// The wrapper accepts only CSV types (text/csv, tab-separated) and refuses more than 5 MB with 413.
export const POST = route<{ jobId: string }>(
  'jobs:edit',
  async ({ req, params }) => {
    const jobId = parseId(params.jobId, 'That job');
    const csvText = await req.text();
    const replace = ['1', 'true'].includes(req.nextUrl.searchParams.get('replace') ?? '');
    const result = await importJobItems({ jobId, csvText, replace });
    if (!result.ok) {
      return NextResponse.json(
        {
          error: `The file was not imported: ${result.errors.length} problem${result.errors.length === 1 ? '' : 's'} to fix.`,
          errors: result.errors,
        },
        { status: 422 },
      );
    }
    return NextResponse.json({ imported: result.imported });
  },
  { body: 'csv', maxBytes: MAX_IMPORT_BYTES },
);
