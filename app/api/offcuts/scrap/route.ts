// POST /api/offcuts/scrap – scrap one or many offcuts with a reason (owner, yard hand)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { scrapOffcuts } from '@/lib/offcuts/scrap-offcuts';
import { scrapOffcutsBodySchema } from '@/lib/validations/offcuts';

export const POST = route('offcuts:edit', async ({ req, user }) => {
  const body = await parseJsonBody(req, scrapOffcutsBodySchema);
  return NextResponse.json(await scrapOffcuts({ body, userId: user.id }));
});
