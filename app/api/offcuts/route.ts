// GET /api/offcuts – the rack, filtered, sorted and paged by query parameters (everyone signed in)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { listOffcuts } from '@/lib/offcuts/list-offcuts';
import { offcutListQuerySchema } from '@/lib/validations/offcuts';

export const GET = route('offcuts:read', async ({ req }) => {
  const query = offcutListQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return NextResponse.json(await listOffcuts({ query }));
});
