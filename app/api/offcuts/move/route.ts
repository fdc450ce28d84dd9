// POST /api/offcuts/move – move one or many offcuts to a rack location (the rack and the saw's labels)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { moveOffcuts } from '@/lib/offcuts/move-offcuts';
import { moveOffcutsBodySchema } from '@/lib/validations/offcuts';

export const POST = route('offcuts:move', async ({ req, user }) => {
  const { ids, location } = await parseJsonBody(req, moveOffcutsBodySchema);
  return NextResponse.json(await moveOffcuts({ ids, location, userId: user.id }));
});
