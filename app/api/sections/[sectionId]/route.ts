// PATCH /api/sections/[sectionId] – change a section and its stock lengths (owner)
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { updateSection } from '@/lib/stock/save-section';
import { sectionBodySchema } from '@/lib/validations/stock';

export const PATCH = route<{ sectionId: string }>('sections:edit', async ({ req, params }) => {
  const sectionId = parseId(params.sectionId, 'That section');
  const body = await parseJsonBody(req, sectionBodySchema);
  return NextResponse.json({ section: await updateSection({ sectionId, body }) });
});
