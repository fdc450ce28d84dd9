import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { POST as create } from '@/app/api/frames/route';
import { POST as preview } from '@/app/api/frames/preview/route';
import { DELETE as remove } from '@/app/api/frames/[scheduleId]/route';
import { POST as send } from '@/app/api/frames/[scheduleId]/send-to-job/route';
import { POST as plan } from '@/app/api/jobs/[jobId]/plans/route';
import { customers, jobItems, jobs, plans } from '@/db/schema';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { leanToPanels, sectionIdOf } from './helpers';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let panels: ReturnType<typeof leanToPanels>;
let scheduleId: number;
beforeEach(async () => {
  t = await useApiTestDb();
  panels = leanToPanels(await sectionIdOf(t.db, 'T47100'), await sectionIdOf(t.db, 'T47150'));
  actAs(AS.hand);
  scheduleId = (
    await call(create, { method: 'POST', body: { name: 'Lean-to', customerName: 'Nell Ashdown', panels } })
  ).json.schedule.id;
});
afterEach(() => t.close());
afterAll(closeTemplate);

const sendTo = (body: unknown, id = scheduleId) =>
  call(send, { method: 'POST', params: { scheduleId: String(id) }, body });
const countRows = async () => ({
  jobs: (await t.db.select().from(jobs)).length,
  items: (await t.db.select().from(jobItems)).length,
});

describe('POST /api/frames/[scheduleId]/send-to-job', () => {
  it('makes a new job from the cut list, summed by section, and the job remembers the schedule', async () => {
    const res = await sendTo({ newJob: { customerName: 'Nell Ashdown', dueDate: '2026-12-04' } });
    expect(res.status).toBe(201);
    const [job] = await t.db.select().from(jobs).where(eq(jobs.id, res.json.jobId));
    expect(job).toMatchObject({
      frameScheduleId: scheduleId,
      status: 'draft',
      customerName: 'Nell Ashdown',
      dueDate: '2026-12-04',
    });
    expect(job.reference).toBe('J-1005'); // the next after the demo yard's J-1001..J-1004

    const items = await t.db.select().from(jobItems).where(eq(jobItems.jobId, job.id));
    const previewed = (await call(preview, { method: 'POST', body: { unit: 'mm', panels } })).json.items as {
      sectionId: number;
      length: number;
      quantity: number;
      angle?: number;
    }[];
    // Every piece arrives: total count and total length per section match the preview.
    const totals = (rows: { sectionId: number; length: number; quantity: number }[]) => {
      const sums = new Map<number, { pieces: number; mm: number }>();
      for (const r of rows) {
        const s = sums.get(r.sectionId) ?? { pieces: 0, mm: 0 };
        sums.set(r.sectionId, { pieces: s.pieces + r.quantity, mm: s.mm + r.quantity * r.length });
      }
      return sums;
    };
    expect(
      totals(items.map((i) => ({ sectionId: i.sectionId, length: i.lengthMm, quantity: i.quantity }))),
    ).toEqual(totals(previewed));
    // Items come grouped by section, longest first within a section.
    for (let k = 1; k < items.length; k++) {
      const [a, b] = [items[k - 1], items[k]];
      expect(a.sectionId < b.sectionId || (a.sectionId === b.sectionId && a.lengthMm >= b.lengthMm)).toBe(
        true,
      );
    }
    const rafter = items.find((i) => i.label === 'roof rafter');
    expect(rafter?.angleTenths).toBe(113); // atan(300 / 1500) = 11.3°
    expect(items.find((i) => i.label === 'front wall stud')?.angleTenths).toBeNull();
  });

  it('a job made from a schedule plans with every piece on a board', async () => {
    const { jobId } = (await sendTo({ newJob: { customerName: 'Nell Ashdown' } })).json;
    const planned = await call(plan, { method: 'POST', params: { jobId: String(jobId) }, body: {} });
    expect(planned.status).toBe(201);
    const items = await t.db.select().from(jobItems).where(eq(jobItems.jobId, jobId));
    const onBoards = planned.json.boards.flatMap((b: { pieces: { jobItemId: number }[] }) =>
      b.pieces.map((p) => p.jobItemId),
    );
    for (const item of items)
      expect(onBoards.filter((id: number) => id === item.id)).toHaveLength(item.quantity);
  });

  it('adds to an existing draft job, after its own items', async () => {
    const [draft] = await t.db.select().from(jobs).where(eq(jobs.reference, 'J-1001'));
    expect(draft.status).toBe('draft');
    const before = await t.db.select().from(jobItems).where(eq(jobItems.jobId, draft.id));
    const res = await sendTo({ jobId: draft.id });
    expect(res.status).toBe(201);
    expect(res.json.jobId).toBe(draft.id);
    const after = await t.db.select().from(jobItems).where(eq(jobItems.jobId, draft.id));
    expect(after.length).toBe(before.length + res.json.lineCount);
    expect(
      Math.min(...after.filter((i) => !before.some((b) => b.id === i.id)).map((i) => i.position)),
    ).toBeGreaterThan(Math.max(...before.map((b) => b.position)));
    expect((await t.db.select().from(jobs).where(eq(jobs.id, draft.id)))[0].frameScheduleId).toBe(scheduleId);
  });

  it('sends to a planned job, which goes back to draft because its plan no longer covers every piece', async () => {
    const [job] = await t.db.select().from(jobs).where(eq(jobs.reference, 'J-1003'));
    expect(job.status).toBe('planned');
    expect((await sendTo({ jobId: job.id })).status).toBe(201);
    expect((await t.db.select().from(jobs).where(eq(jobs.id, job.id)))[0].status).toBe('draft');
    const jobPlans = await t.db.select().from(plans).where(eq(plans.jobId, job.id));
    expect(jobPlans.map((p) => p.status)).toEqual(jobPlans.map(() => 'superseded'));
  });

  it('changes nothing for an unknown job, a cancelled job, a taken reference or a bad body', async () => {
    const start = await countRows();
    expect((await sendTo({ jobId: 9999 })).status).toBe(404);
    const [cancelled] = await t.db.select().from(jobs).where(eq(jobs.reference, 'J-1004'));
    expect((await sendTo({ jobId: cancelled.id })).status).toBe(409);
    const [released] = await t.db.select().from(jobs).where(eq(jobs.reference, 'J-1002'));
    expect((await sendTo({ jobId: released.id })).status).toBe(409);
    expect((await sendTo({ newJob: { customerName: 'X', reference: 'J-1001' } })).status).toBe(409);
    const bad = await sendTo({ newJob: { customerName: '', dueDate: 'Friday' } });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'newJob.customerName',
      'newJob.dueDate',
    ]);
    expect((await sendTo({ jobId: 1, newJob: { customerName: 'X' } })).status).toBe(422);
    expect((await sendTo({ newJob: { customerName: 'X' } }, 9999)).status).toBe(404);
    expect(await countRows()).toEqual(start);
    expect((await t.db.select().from(jobs).where(eq(jobs.id, cancelled.id)))[0].frameScheduleId).toBeNull();
  });

  it('is refused to a saw operator, and a schedule a job came from cannot be deleted', async () => {
    actAs(AS.saw);
    expect((await sendTo({ newJob: { customerName: 'X' } })).status).toBe(403);
    actAs(AS.hand);
    await sendTo({ newJob: { customerName: 'Nell Ashdown' } });
    const refused = await call(remove, { method: 'DELETE', params: { scheduleId: String(scheduleId) } });
    expect(refused.status).toBe(409);
    expect(refused.json.error).toContain('J-1005');
  });

  it('makes the new job for a chosen customer record or a new one, so the quote knows the account', async () => {
    const [trade] = await t.db
      .insert(customers)
      .values({ name: 'Rook Lane Builders', account: 'trade', creditDays: 30, phone: '01632 960 222' })
      .returning();
    const picked = await sendTo({ newJob: { customerId: trade.id } });
    expect(picked.status).toBe(201);
    const [job] = await t.db.select().from(jobs).where(eq(jobs.id, picked.json.jobId));
    expect(job).toMatchObject({
      customerId: trade.id,
      customerName: 'Rook Lane Builders',
      customerPhone: '01632 960 222',
    });
    const made = await sendTo({ newJob: { newCustomer: { name: 'Mabli Trewin', account: 'retail' } } });
    const [second] = await t.db.select().from(jobs).where(eq(jobs.id, made.json.jobId));
    const [record] = await t.db.select().from(customers).where(eq(customers.id, second.customerId!));
    expect(record.name).toBe('Mabli Trewin');
    expect((await sendTo({ newJob: {} })).status).toBe(422);
  });

  it('refuses a schedule with no pieces yet', async () => {
    const empty = (await call(create, { method: 'POST', body: { name: 'Empty' } })).json.schedule.id;
    expect((await sendTo({ newJob: { customerName: 'X' } }, empty)).status).toBe(422);
  });
});
