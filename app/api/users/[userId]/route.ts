// PATCH /api/users/[userId] – change a name, role, password or disable an account (owner only)
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { updateUser } from '@/lib/users/manage-users';
import { updateUserBodySchema } from '@/lib/validations/users';

export const PATCH = route<{ userId: string }>('users:manage', async ({ req, params }) => {
  const userId = parseId(params.userId, 'That user');
  const changes = await parseJsonBody(req, updateUserBodySchema);
  return NextResponse.json({ user: await updateUser({ userId, changes }) });
});
