// PATCH /api/offcuts/[offcutId] – move an offcut to another rack location (owner, yard hand)
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { updateOffcutLocation } from '@/lib/offcuts/update-offcut';
import { updateOffcutBodySchema } from '@/lib/validations/offcuts';

export const PATCH = route<{ offcutId: string }>('offcuts:edit', async ({ req, params, user }) => {
  const offcutId = parseId(params.offcutId, 'That offcut');
  const { location } = await parseJsonBody(req, updateOffcutBodySchema);
  return NextResponse.json({ offcut: await updateOffcutLocation({ offcutId, location, userId: user.id }) });
});
