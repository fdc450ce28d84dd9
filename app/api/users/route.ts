// GET /api/users – the yard's accounts (owner only)
// POST /api/users – add an account (owner only)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { createUser, listUsers } from '@/lib/users/manage-users';
import { createUserBodySchema } from '@/lib/validations/users';

export const GET = route('users:manage', async () => {
  return NextResponse.json({ users: await listUsers() });
});

export const POST = route('users:manage', async ({ req }) => {
  const body = await parseJsonBody(req, createUserBodySchema);
  return NextResponse.json({ user: await createUser(body) }, { status: 201 });
});
