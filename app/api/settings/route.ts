// GET /api/settings – the yard's cutting and display settings (everyone signed in)
// PATCH /api/settings – change them (owner)
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { yardSettingsBodySchema } from '@/lib/validations/yard-settings';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { updateYardSettings } from '@/lib/yard/update-yard-settings';

export const GET = route('sections:read', async () =>
  NextResponse.json({ settings: await getYardSettings() }),
);

export const PATCH = route('settings:edit', async ({ req }) => {
  const body = await parseJsonBody(req, yardSettingsBodySchema);
  return NextResponse.json({ settings: await updateYardSettings({ body }) });
});
