// GET /api/sections – the yard's active sections with their stock lengths
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { listSectionsWithStock } from '@/lib/sections/list-sections';

export const GET = route('sections:read', async () => {
  return NextResponse.json({ sections: await listSectionsWithStock() });
});
