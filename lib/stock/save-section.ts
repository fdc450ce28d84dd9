import 'server-only';
import { and, eq, ne } from 'drizzle-orm';
import { getDb, type Tx } from '@/db';
import { sections, stockLengths } from '@/db/schema';
import { AppError, notFound } from '@/lib/errors';
import type { SectionBody } from '@/lib/validations/stock';

async function saveLengths(tx: Tx, sectionId: number, lengths: SectionBody['lengths']) {
  const existing = await tx.select().from(stockLengths).where(eq(stockLengths.sectionId, sectionId));
  for (const input of lengths) {
    const current = input.id
      ? existing.find((l) => l.id === input.id)
      : existing.find((l) => l.lengthMm === input.lengthMm);
    if (input.id && !current) throw notFound(`Stock length ${input.id} of this section`);
    if (!current) {
      // A new counted length starts at zero; deliveries and stocktakes bring it up.
      await tx.insert(stockLengths).values({
        sectionId,
        lengthMm: input.lengthMm,
        pricePence: input.pricePence,
        costPence: input.costPence ?? null,
        onHand: input.unlimited ? null : 0,
        active: input.active,
      });
      continue;
    }
    // Switching to counted needs a stocktake (the count comes from movements), so only "unlimited" is set here.
    await tx
      .update(stockLengths)
      .set({
        lengthMm: input.lengthMm,
        pricePence: input.pricePence,
        costPence: input.costPence,
        active: input.active,
        ...(input.unlimited ? { onHand: null } : {}),
      })
      .where(eq(stockLengths.id, current.id));
  }
}

export async function createSection({ body }: { body: SectionBody }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [clash] = await tx.select({ id: sections.id }).from(sections).where(eq(sections.code, body.code));
    if (clash) throw new AppError('conflict', `There is already a section with code ${body.code}.`);
    const { lengths, ...fields } = body;
    const [section] = await tx.insert(sections).values(fields).returning();
    await saveLengths(tx, section.id, lengths);
    return section;
  });
}

export async function updateSection({ sectionId, body }: { sectionId: number; body: SectionBody }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [section] = await tx.select().from(sections).where(eq(sections.id, sectionId));
    if (!section) throw notFound('That section');
    const [clash] = await tx
      .select({ id: sections.id })
      .from(sections)
      .where(and(eq(sections.code, body.code), ne(sections.id, sectionId)));
    if (clash) throw new AppError('conflict', `There is already a section with code ${body.code}.`);
    const { lengths, ...fields } = body;
    const [updated] = await tx.update(sections).set(fields).where(eq(sections.id, sectionId)).returning();
    await saveLengths(tx, sectionId, lengths);
    return updated;
  });
}
