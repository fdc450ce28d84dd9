// PATCH /api/saw/offcuts/[offcutId] – say where a newly labelled offcut was racked
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { moveOffcut } from '@/lib/saw/move-offcut';
import { moveOffcutBodySchema } from '@/lib/validations/saw';

export const PATCH = route<{ offcutId: string }>('offcuts:label', async ({ req, user, params }) => {
  const offcutId = parseId(params.offcutId, 'That offcut');
  const { location } = await parseJsonBody(req, moveOffcutBodySchema);
  return NextResponse.json({ offcut: await moveOffcut({ offcutId, location, userId: user.id }) });
});
