// POST /api/jobs/[jobId]/items/import – import a cut list (body: CSV or tab-separated text), all or nothing.
// ?replace=1 swaps the whole list. 200 { imported } or 422 { errors: [{ line, column, message }] }.
import { NextResponse } from 'next/server';
import { parseId, route } from '@/lib/api/route';
import { AppError } from '@/lib/errors';
import { importJobItems } from '@/lib/jobs/import-job-items';
import { MAX_IMPORT_BYTES } from '@/lib/validations/jobs';

const ACCEPTED = [
  'text/csv',
  'text/plain',
  'text/tab-separated-values',
  'application/csv',
  'application/vnd.ms-excel',
];

export const POST = route<{ jobId: string }>('jobs:edit', async ({ req, params }) => {
  const jobId = parseId(params.jobId, 'That job');
  const type = (req.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase();
  if (!ACCEPTED.includes(type)) {
    throw new AppError('invalid', 'Send the cut list as CSV text (Content-Type: text/csv).');
  }
  const declared = Number(req.headers.get('content-length') ?? 0);
  if (declared > MAX_IMPORT_BYTES) throw tooLarge();
  const csvText = await req.text();
  if (Buffer.byteLength(csvText) > MAX_IMPORT_BYTES) throw tooLarge();
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
});

function tooLarge() {
  return new AppError('invalid', 'The file is larger than 5 MB; split it into smaller lists.', {
    errors: [{ line: 1, column: null, message: 'The file is larger than 5 MB.' }],
  });
}
