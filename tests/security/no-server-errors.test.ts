// Inputs that used to end in a 500 (each reproduced against the previous code) now get a 4xx or
// succeed, and a refused request changes nothing.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as createJob } from '@/app/api/jobs/route';
import { POST as addItem } from '@/app/api/jobs/[jobId]/items/route';
import { PATCH as patchItem } from '@/app/api/jobs/[jobId]/items/[itemId]/route';
import { POST as importRack } from '@/app/api/offcuts/import/route';
import { GET as cutSheet } from '@/app/api/plans/[planId]/cut-sheet/route';
import { POST as createUser } from '@/app/api/users/route';
import * as schema from '@/db/schema';
import { MAX_RACK_IMPORT_ROWS } from '@/lib/offcuts/import-offcuts';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeAll(async () => {
  t = await useApiTestDb();
});
afterAll(async () => {
  await t.close();
  await closeTemplate();
});

const rackCsv = (rows: number, tag: (i: number) => string = () => '') =>
  'section,length,location,tag\n' +
  Array.from({ length: rows }, (_, i) => `T47100,${600 + (i % 1000)},Bay ${i % 40},${tag(i)}`).join('\n');

describe('rack import', () => {
  it('takes 10 000 rows in one go (batched inserts, one transaction)', async () => {
    actAs(AS.hand);
    const res = await call(importRack, { method: 'POST', body: { csv: rackCsv(10_000) } });
    expect(res.status).toBe(201);
    expect(res.json.imported).toBe(10_000);
  }, 120_000); // 10 000 rows through the embedded database: over 30 s on a loaded 2-core machine

  it('refuses more than the stated row limit with 422 and imports nothing', async () => {
    actAs(AS.hand);
    const before = (await t.db.select({ id: schema.offcuts.id }).from(schema.offcuts)).length;
    const res = await call(importRack, { method: 'POST', body: { csv: rackCsv(MAX_RACK_IMPORT_ROWS + 1) } });
    expect(res.status).toBe(422);
    expect((await t.db.select({ id: schema.offcuts.id }).from(schema.offcuts)).length).toBe(before);
  });

  it('never issues a tag that is already on the rack (issued tags follow the highest offcut id)', async () => {
    actAs(AS.hand);
    const rows = await t.db.select({ id: schema.offcuts.id }).from(schema.offcuts);
    const nextIssued = `K-${String(Math.max(...rows.map((r) => r.id)) + 1).padStart(5, '0')}`;
    const pinned = await call(importRack, { method: 'POST', body: { csv: rackCsv(1, () => nextIssued) } });
    expect(pinned.status).toBe(201);
    const res = await call(importRack, { method: 'POST', body: { csv: rackCsv(3) } });
    expect(res.status).toBe(201);
    expect(res.json.tags).not.toContain(nextIssued);
  });
});

describe('jobs', () => {
  it('numbers the next job after a huge typed-in reference, twice over', async () => {
    actAs(AS.hand);
    expect(
      (await call(createJob, { method: 'POST', body: { customerName: 'Big', reference: 'J-99999999999' } }))
        .status,
    ).toBe(201);
    const first = await call(createJob, { method: 'POST', body: { customerName: 'Next' } });
    expect(first.status).toBe(201);
    expect(first.json.job.reference).toBe('J-100000000000');
    const second = await call(createJob, { method: 'POST', body: { customerName: 'After' } });
    expect(second.status).toBe(201);
    expect(second.json.job.reference).toBe('J-100000000001');
  });

  it('keeps the label and note of a line item on a partial change', async () => {
    actAs(AS.hand);
    const job = await call(createJob, { method: 'POST', body: { customerName: 'Partial' } });
    const jobId = String(job.json.job.id);
    const added = await call(addItem, {
      method: 'POST',
      params: { jobId },
      body: { sectionId: 1, length: 1200, quantity: 2, label: 'rail', note: 'keep the grain' },
    });
    expect(added.status).toBe(201);
    const itemId = String(added.json.item?.id ?? added.json.id);
    const patched = await call(patchItem, {
      method: 'PATCH',
      params: { jobId, itemId },
      body: { quantity: 3 },
    });
    expect(patched.status).toBe(200);
    const [item] = await t.db
      .select()
      .from(schema.jobItems)
      .where(eq(schema.jobItems.id, Number(itemId)));
    expect(item).toMatchObject({ quantity: 3, label: 'rail', note: 'keep the grain' });
  });
});

describe('users', () => {
  it('answers one of two simultaneous creations of one account with 409', async () => {
    actAs(AS.owner);
    const body = { email: 'twin@yard.test', name: 'Twin', role: 'yard_hand', password: 'long-enough' };
    const answers = await Promise.all([1, 2].map(() => call(createUser, { method: 'POST', body })));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
  });
});

describe('downloads', () => {
  it('names a cut sheet for a reference with € and quotes safely (RFC 6266)', async () => {
    const [plan] = await t.db.select().from(schema.plans).limit(1);
    await t.db.update(schema.jobs).set({ reference: 'J-€"7/../x' }).where(eq(schema.jobs.id, plan.jobId));
    actAs(AS.owner);
    const res = await call(cutSheet, { params: { planId: String(plan.id) } });
    expect(res.status).toBe(200);
    const disposition = res.response.headers.get('content-disposition')!;
    expect(disposition).toMatch(/^attachment; filename="[ -~]+"; filename\*=UTF-8''/);
    expect(disposition).toContain('%E2%82%AC');
    expect(disposition).not.toContain('../');
  });
});
