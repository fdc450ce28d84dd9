// POST /api/account/password – change your own password (everyone signed in); ends your sessions
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { changeOwnPassword } from '@/lib/users/manage-users';
import { changeOwnPasswordBodySchema } from '@/lib/validations/users';

export const POST = route('account:edit', async ({ req, user }) => {
  const body = await parseJsonBody(req, changeOwnPasswordBodySchema);
  await changeOwnPassword({ userId: user.id, body });
  return NextResponse.json({ changed: true, signInAgain: true });
});
