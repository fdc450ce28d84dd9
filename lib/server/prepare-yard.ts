// What a server start puts into a freshly opened database, as asked by the environment:
// the demo yard with KERFWISE_DEMO=1 (empty database only), the first owner from KERFWISE_OWNER_*.
import type { Db } from '@/db/types';
import { seedDemoYard } from '@/db/seed';
import { DEMO_PASSWORD } from '@/db/seed/demo-yard';
import { createFirstOwner } from '@/lib/users/first-owner';
import { getEnv } from '@/lib/env';

export async function prepareYard(db: Db): Promise<void> {
  const env = getEnv();
  if (env.KERFWISE_DEMO && (await seedDemoYard(db))) {
    console.log(`Kerfwise: seeded the demo yard (demo sign-ins, password "${DEMO_PASSWORD}").`);
  }
  if (env.KERFWISE_OWNER_EMAIL && env.KERFWISE_OWNER_PASSWORD) {
    const result = await createFirstOwner(db, {
      email: env.KERFWISE_OWNER_EMAIL,
      password: env.KERFWISE_OWNER_PASSWORD,
      name: env.KERFWISE_OWNER_NAME,
    });
    if (result.created) console.log(`Kerfwise: created the first owner ${result.email}.`);
  }
}
