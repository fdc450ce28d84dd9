// GET /api/saw/offcuts?tag=K-0001 – one offcut by its tag (scanned or typed)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { findOffcutByTag } from '@/lib/saw/find-offcut';
import { findOffcutQuerySchema } from '@/lib/validations/saw';

export const GET = route('offcuts:read', async ({ req }) => {
  const { tag } = findOffcutQuerySchema.parse({ tag: req.nextUrl.searchParams.get('tag') ?? '' });
  return NextResponse.json({ offcut: await findOffcutByTag({ tag }) });
});
