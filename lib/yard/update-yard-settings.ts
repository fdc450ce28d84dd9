import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb } from '@/db';
import { yardSettings } from '@/db/schema';
import { notFound } from '@/lib/errors';
import type { YardSettingsBody } from '@/lib/validations/yard-settings';

export async function updateYardSettings({ body }: { body: YardSettingsBody }) {
  const db = await getDb();
  const [settings] = await db
    .update(yardSettings)
    .set({ ...body, updatedAt: new Date() })
    .where(eq(yardSettings.id, 1))
    .returning();
  if (!settings) throw notFound('The yard settings');
  return settings;
}
