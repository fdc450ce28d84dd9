// Seeds the demo yard into an empty database. Does nothing when users already exist.
import { sql } from 'drizzle-orm';
import type { Db } from '@/db/types';
import { hashPassword } from '@/lib/auth/password';
import { formatOffcutTag } from '@/lib/offcuts/offcut-tag';
import { seedDemoCustomers } from './customers';
import * as schema from '@/db/schema';
import { seedDemoPlans } from './demo-plans';
import {
  DEMO_PASSWORD,
  demoJobItems,
  demoJobs,
  demoSections,
  demoUsers,
  demoYardName,
  rackLocations,
  seededRandom,
} from './demo-yard';
import { seedDemoFrameSchedules } from './frames';
import { seedHistory } from './history';

type SeedDb = Db;
const DAY_MS = 86_400_000;

export async function seedDemoYard(db: SeedDb, now = new Date()): Promise<boolean> {
  const [{ count }] = await db.select({ count: sql<number>`count(*)::int` }).from(schema.users);
  if (count > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const random = seededRandom(20261201);

  const handId = await db.transaction(async (tx) => {
    const users = await tx
      .insert(schema.users)
      .values(demoUsers.map((u) => ({ ...u, passwordHash })))
      .returning();
    const ownerId = users.find((u) => u.role === 'owner')!.id;
    // End trim 15 mm: clears split or out-of-square ends; a thinner sliver can be thrown by the blade.
    await tx
      .insert(schema.yardSettings)
      .values({ id: 1, yardName: demoYardName, trimMm: 15, minSafePieceMm: 150, region: 'uk' });

    const sectionIds = new Map<string, number>();
    for (const s of demoSections) {
      const [section] = await tx
        .insert(schema.sections)
        .values({
          code: s.code,
          name: s.name,
          thicknessMm: s.thicknessMm,
          widthMm: s.widthMm,
          species: s.species,
          grade: s.grade,
          treatment: s.treatment,
          finish: s.finish,
        })
        .returning();
      sectionIds.set(s.code, section.id);
      await tx.insert(schema.stockLengths).values(
        s.lengthsMm.map((lengthMm) => ({
          sectionId: section.id,
          lengthMm,
          pricePence: Math.round((s.pencePerMetre * lengthMm) / 1000),
          // The demo yard buys at about 70 % of its selling price (an invented figure).
          costPence: Math.round((0.7 * s.pencePerMetre * lengthMm) / 1000),
          onHand: s.unlimited ? null : 10 + Math.floor(random() * 50),
        })),
      );
    }

    // About forty offcuts left by earlier jobs, spread over the rack.
    const offcutSections = demoSections.filter((s) => !s.unlimited);
    const offcutRows = Array.from({ length: 42 }, (_, i) => {
      const s = offcutSections[Math.floor(random() * offcutSections.length)];
      const ageDays = Math.floor(random() * 150);
      const lengthMm = 300 + Math.round((random() * 2600) / 10) * 10;
      const createdAt = new Date(now.getTime() - ageDays * DAY_MS);
      return {
        tag: formatOffcutTag(i + 1),
        sectionId: sectionIds.get(s.code)!,
        lengthMm,
        location: lengthMm < 600 ? 'Short bin' : rackLocations[Math.floor(random() * 7)],
        origin: 'On the rack before Kerfwise',
        createdAt,
        updatedAt: createdAt,
      };
    });
    const offcuts = await tx.insert(schema.offcuts).values(offcutRows).returning();
    await tx.insert(schema.stockMovements).values(
      offcuts.map((o) => ({
        at: o.createdAt,
        kind: 'offcut_imported' as const,
        userId: ownerId,
        sectionId: o.sectionId,
        offcutId: o.id,
        lengthMm: o.lengthMm,
        reason: 'Opening rack count',
      })),
    );

    for (const j of demoJobs) {
      const due = new Date(now.getTime() + j.dueInDays * DAY_MS).toISOString().slice(0, 10);
      const [job] = await tx
        .insert(schema.jobs)
        .values({
          reference: j.reference,
          customerName: j.customerName,
          customerEmail: j.customerEmail,
          dueDate: due,
          status: j.status,
          notes: j.notes,
          createdBy: users.find((u) => u.role === 'yard_hand')!.id,
        })
        .returning();
      await tx.insert(schema.jobItems).values(
        demoJobItems[j.reference].map(([code, lengthMm, quantity, label], position) => ({
          jobId: job.id,
          sectionId: sectionIds.get(code)!,
          lengthMm,
          quantity,
          label,
          position,
        })),
      );
    }
    await seedDemoFrameSchedules(tx, { sectionIds, userId: users.find((u) => u.role === 'yard_hand')!.id });
    const userId = (role: string) => users.find((u) => u.role === role)!.id;
    await seedHistory(tx, {
      now,
      userIds: { owner: ownerId, hand: userId('yard_hand'), saw: userId('saw_operator') },
    });
    await seedDemoCustomers(tx);
    return users.find((u) => u.role === 'yard_hand')!.id;
  });
  await seedDemoPlans(db, handId);
  return true;
}
