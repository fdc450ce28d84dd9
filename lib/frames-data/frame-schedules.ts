import 'server-only';
import { desc, eq, inArray } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db';
import type { DisplayUnit } from '@/db/enums';
import { frameSchedules, jobs } from '@/db/schema';
import { frameSchedulePanelSchema, type FrameSchedulePanel } from '@/lib/frames';
import { AppError, notFound } from '@/lib/errors';
import type { SaveFrameScheduleBody } from '@/lib/validations/frames';
import { assertKnownSections } from './assert-known-sections';
import { getYardFrameSections } from './get-yard-frame-sections';

export type FrameScheduleRecord = {
  id: number;
  name: string;
  customerName: string;
  customerEmail: string;
  unit: DisplayUnit;
  panels: FrameSchedulePanel[];
  updatedAt: string;
  jobs: { id: number; reference: string; status: string }[];
};

const SCHEDULE = 'That frame schedule';

// Stored panels were validated on save; parse again so readers always get defaults filled in.
const readPanels = (stored: unknown): FrameSchedulePanel[] =>
  (Array.isArray(stored) ? stored : []).map((p) => frameSchedulePanelSchema.parse(p));

export async function listFrameSchedules() {
  const db = await getDb();
  const rows = await db.select().from(frameSchedules).orderBy(desc(frameSchedules.updatedAt));
  const linked = rows.length
    ? await db
        .select({ id: jobs.id, reference: jobs.reference, frameScheduleId: jobs.frameScheduleId })
        .from(jobs)
        .where(
          inArray(
            jobs.frameScheduleId,
            rows.map((r) => r.id),
          ),
        )
    : [];
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    customerName: r.customerName,
    customerEmail: r.customerEmail,
    unit: r.unit,
    panelCount: Array.isArray(r.panels) ? r.panels.length : 0,
    updatedAt: r.updatedAt.toISOString(),
    jobReferences: linked.filter((j) => j.frameScheduleId === r.id).map((j) => j.reference),
  }));
}

export async function getFrameScheduleById({
  id,
  db,
}: {
  id: number;
  db?: DbOrTx;
}): Promise<FrameScheduleRecord> {
  const conn = db ?? (await getDb());
  const [row] = await conn.select().from(frameSchedules).where(eq(frameSchedules.id, id));
  if (!row) throw notFound(SCHEDULE);
  const linked = await conn
    .select({ id: jobs.id, reference: jobs.reference, status: jobs.status })
    .from(jobs)
    .where(eq(jobs.frameScheduleId, id));
  return {
    id: row.id,
    name: row.name,
    customerName: row.customerName,
    customerEmail: row.customerEmail,
    unit: row.unit,
    panels: readPanels(row.panels),
    updatedAt: row.updatedAt.toISOString(),
    jobs: linked,
  };
}

export async function createFrameSchedule({ body, userId }: { body: SaveFrameScheduleBody; userId: number }) {
  assertKnownSections(body.panels, (await getYardFrameSections()).dimensions);
  const db = await getDb();
  const [row] = await db
    .insert(frameSchedules)
    .values({
      name: body.name,
      customerName: body.customerName,
      customerEmail: body.customerEmail,
      unit: body.unit,
      panels: body.panels,
      createdBy: userId,
    })
    .returning({ id: frameSchedules.id });
  return getFrameScheduleById({ id: row.id });
}

export async function updateFrameSchedule({ id, body }: { id: number; body: SaveFrameScheduleBody }) {
  assertKnownSections(body.panels, (await getYardFrameSections()).dimensions);
  const db = await getDb();
  const updated = await db
    .update(frameSchedules)
    .set({
      name: body.name,
      customerName: body.customerName,
      customerEmail: body.customerEmail,
      unit: body.unit,
      panels: body.panels,
      updatedAt: new Date(),
    })
    .where(eq(frameSchedules.id, id))
    .returning({ id: frameSchedules.id });
  if (updated.length === 0) throw notFound(SCHEDULE);
  return getFrameScheduleById({ id });
}

/** Refused while a job remembers the schedule, so no job loses where its cut list came from. */
export async function deleteFrameSchedule({ id }: { id: number }) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const schedule = await getFrameScheduleById({ id, db: tx });
    if (schedule.jobs.length > 0) {
      const refs = schedule.jobs.map((j) => j.reference).join(', ');
      throw new AppError(
        'conflict',
        `Job ${refs} came from this schedule, so it is kept. Copy it to start a new design.`,
      );
    }
    await tx.delete(frameSchedules).where(eq(frameSchedules.id, id));
  });
}

export async function copyFrameSchedule({ id, userId }: { id: number; userId: number }) {
  const db = await getDb();
  const source = await getFrameScheduleById({ id, db });
  const [row] = await db
    .insert(frameSchedules)
    .values({
      name: `${source.name} (copy)`.slice(0, 120),
      customerName: source.customerName,
      customerEmail: source.customerEmail,
      unit: source.unit,
      panels: source.panels,
      createdBy: userId,
    })
    .returning({ id: frameSchedules.id });
  return getFrameScheduleById({ id: row.id });
}
