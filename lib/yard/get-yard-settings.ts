import 'server-only';
import { eq } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import { yardSettings } from '@/db/schema';

export async function getYardSettings(tx?: DbOrTx) {
  const db = tx ?? (await getDb());
  const [settings] = await db.select().from(yardSettings).where(eq(yardSettings.id, 1));
  if (!settings) throw new Error('The yard settings row is missing: the database was not seeded.');
  return settings;
}
