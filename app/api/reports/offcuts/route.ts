// GET /api/reports/offcuts?from=YYYY-MM-DD&to=YYYY-MM-DD – the owner's offcuts report for a date range
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { getOffcutReport } from '@/lib/reports/get-reports';
import { reportRangeSchema } from '@/lib/reports/report-range';

export const GET = route('reports:read', async ({ req }) => {
  const range = reportRangeSchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return NextResponse.json({ range, report: await getOffcutReport(range) });
});
