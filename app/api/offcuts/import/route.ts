// POST /api/offcuts/import – enter an existing rack from CSV text, all or nothing (owner, yard hand)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { importOffcuts } from '@/lib/offcuts/import-offcuts';
import { importOffcutsBodySchema } from '@/lib/validations/offcuts';

// A rack list of up to 20 000 offcuts arrives as JSON { csv } of at most 2 MB of text.
export const POST = route(
  'offcuts:edit',
  async ({ req, user }) => {
    const { csv } = await parseJsonBody(req, importOffcutsBodySchema);
    return NextResponse.json(await importOffcuts({ csv, userId: user.id }), { status: 201 });
  },
  { maxBytes: 3 * 1024 * 1024 },
);
