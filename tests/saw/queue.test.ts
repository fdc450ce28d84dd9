import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as release } from '@/app/api/plans/[planId]/release/route';
import { POST as done } from '@/app/api/plans/[planId]/boards/[boardNo]/done/route';
import { GET as queue } from '@/app/api/saw/queue/route';
import { GET as findOffcut } from '@/app/api/saw/offcuts/route';
import { POST as moveOffcuts } from '@/app/api/offcuts/move/route';
import * as schema from '@/db/schema';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { releasedDemoPlanId } from './saw-fixtures';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

describe('GET /api/saw/queue', () => {
  it('lists released plans soonest due first with their progress, and needs a session', async () => {
    actAs(AS.nobody);
    expect((await call(queue)).status).toBe(401);
    // Release J-1003 too (due later than J-1002 in the demo yard).
    const [j3] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.reference, 'J-1003'));
    const [p3] = await t.db.select().from(schema.plans).where(eq(schema.plans.jobId, j3.id));
    // Its quote is not paid, so the owner releases it with a recorded reason.
    actAs(AS.owner);
    const released = await call(release, {
      method: 'POST',
      params: { planId: String(p3.id) },
      body: { override: 'Collecting and paying at the counter' },
    });
    expect(released.status).toBe(200);

    const planId = await releasedDemoPlanId(t.db);
    actAs(AS.saw);
    await call(done, { method: 'POST', params: { planId: String(planId), boardNo: '1' } });
    const res = await call(queue);
    expect(res.status).toBe(200);
    expect(res.json.queue.map((q: { reference: string }) => q.reference)).toEqual(['J-1002', 'J-1003']);
    expect(res.json.queue[0]).toMatchObject({
      planId,
      customerName: 'Fenwick Joinery',
      sections: ['38×89 CLS'],
      boardsDone: 1,
      jobStatus: 'cutting',
    });
    expect(res.json.queue[0].boards).toBeGreaterThan(1);
  });
});

describe('offcuts at the saw', () => {
  it('finds an offcut by its tag in any case, and records where it is racked', async () => {
    actAs(AS.saw);
    const found = await call(findOffcut, { url: 'http://test.local/api/saw/offcuts?tag=k-0001' });
    expect(found.status).toBe(200);
    expect(found.json.offcut.tag).toBe('K-0001');
    expect((await call(findOffcut, { url: 'http://test.local/api/saw/offcuts?tag=NOPE' })).status).toBe(404);
    expect((await call(findOffcut, { url: 'http://test.local/api/saw/offcuts' })).status).toBe(422);

    const id = found.json.offcut.id as number;
    expect((await call(moveOffcuts, { method: 'POST', body: { ids: [id], location: '' } })).status).toBe(422);
    const moved = await call(moveOffcuts, { method: 'POST', body: { ids: [id], location: 'Rack C2' } });
    expect(moved.status).toBe(200);
    const rows = await t.db
      .select()
      .from(schema.stockMovements)
      .where(eq(schema.stockMovements.offcutId, Number(id)));
    expect(rows.map((r) => r.kind)).toContain('offcut_moved');
  });
});
