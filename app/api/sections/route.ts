// GET /api/sections – the sections catalogue with stock lengths (everyone signed in)
// POST /api/sections – add a section (owner)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { listSections } from '@/lib/stock/list-sections';
import { createSection } from '@/lib/stock/save-section';
import { sectionBodySchema } from '@/lib/validations/stock';

export const GET = route('sections:read', async () => NextResponse.json({ sections: await listSections() }));

export const POST = route('sections:edit', async ({ req }) => {
  const body = await parseJsonBody(req, sectionBodySchema);
  return NextResponse.json({ section: await createSection({ body }) }, { status: 201 });
});
