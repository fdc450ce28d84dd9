// GET /api/sections – the sections catalogue with stock lengths (everyone signed in; cost prices to the owner)
// POST /api/sections – add a section (owner)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { can } from '@/lib/auth/permissions';
import { listSections } from '@/lib/stock/list-sections';
import { createSection } from '@/lib/stock/save-section';
import { sectionBodySchema } from '@/lib/validations/stock';

export const GET = route('sections:read', async ({ user }) =>
  NextResponse.json({ sections: await listSections({ withCost: can(user.role, 'sections:edit') }) }),
);

export const POST = route('sections:edit', async ({ req }) => {
  const body = await parseJsonBody(req, sectionBodySchema);
  return NextResponse.json({ section: await createSection({ body }) }, { status: 201 });
});
