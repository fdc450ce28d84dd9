import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET as listJobs, POST as createJob } from '@/app/api/jobs/route';
import { GET as getJob, PATCH as patchJob } from '@/app/api/jobs/[jobId]/route';
import { POST as addItem } from '@/app/api/jobs/[jobId]/items/route';
import { DELETE as deleteItem, PATCH as patchItem } from '@/app/api/jobs/[jobId]/items/[itemId]/route';
import { GET as jobPlans, POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import { GET as listSections } from '@/app/api/sections/route';
import { customers } from '@/db/schema';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
  actAs(AS.hand);
});
afterEach(() => t.close());
afterAll(closeTemplate);

const list = (query = '') => call(listJobs, { url: `http://test.local/api/jobs${query}` });
const create = (body: unknown) => call(createJob, { method: 'POST', body });

describe('GET /api/sections', () => {
  it('lists sections with their stock lengths for every signed-in role', async () => {
    actAs(AS.saw);
    const res = await call(listSections);
    expect(res.status).toBe(200);
    const cls = res.json.sections.find((s: { code: string }) => s.code === 'CLS3889');
    expect(cls.lengths.map((l: { lengthMm: number }) => l.lengthMm)).toEqual([2400, 3000, 3600, 4800]);
    actAs(AS.nobody);
    expect((await call(listSections)).status).toBe(401);
  });
});

describe('POST /api/jobs', () => {
  it('creates a draft job with the next J-number when no reference is given', async () => {
    const res = await create({ customerName: 'Orla Penhaligon', dueDate: '2026-12-24' });
    expect(res.status).toBe(201);
    expect(res.json.job).toMatchObject({
      reference: 'J-1005',
      customerName: 'Orla Penhaligon',
      dueDate: '2026-12-24',
      status: 'draft',
    });
    const second = await create({ customerName: 'B', reference: '' });
    expect(second.json.job.reference).toBe('J-1006');
  });

  it('keeps a given reference and refuses a duplicate with 409', async () => {
    expect((await create({ customerName: 'A', reference: 'SHED-7' })).json.job.reference).toBe('SHED-7');
    expect((await create({ customerName: 'B', reference: 'SHED-7' })).status).toBe(409);
  });

  it('answers 422 for a missing customer or a bad date, 403 to saw operators', async () => {
    const bad = await create({ customerName: ' ', dueDate: '24/12/2026' });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual(['customerName', 'dueDate']);
    actAs(AS.saw);
    expect((await create({ customerName: 'A' })).status).toBe(403);
  });
});

describe('POST /api/jobs with a customer', () => {
  it('links a chosen customer record, or makes a new one inline in the same transaction', async () => {
    const [existing] = await t.db.select().from(customers).limit(1);
    const picked = await create({ customerId: existing.id });
    expect(picked.status).toBe(201);
    expect(picked.json.job).toMatchObject({ customerId: existing.id, customerName: existing.name });

    const newCustomer = { name: 'Tamsin Oakes Joinery', account: 'trade', phone: '01632 960 111' };
    const made = await create({ newCustomer });
    expect(made.status).toBe(201);
    const [record] = await t.db.select().from(customers).where(eq(customers.id, made.json.job.customerId));
    expect(record).toMatchObject({ ...newCustomer, creditDays: 30 });
    expect(made.json.job.customerPhone).toBe('01632 960 111');
  });

  it('leaves no stray customer when the job is refused, and takes only one way of naming the customer', async () => {
    const before = (await t.db.select().from(customers)).length;
    const clash = await create({
      newCustomer: { name: 'Ivo Penrose', account: 'retail' },
      reference: 'J-1001',
    });
    expect(clash.status).toBe(409);
    expect((await t.db.select().from(customers)).length).toBe(before);
    const both = await create({ customerId: 1, newCustomer: { name: 'Ivo Penrose', account: 'retail' } });
    expect(both.status).toBe(422);
    expect(both.json.issues.map((i: { path: string }) => i.path)).toEqual(['customerId']);
    const unnamed = await create({ newCustomer: { name: '', account: 'retail' } });
    expect(unnamed.json.issues.map((i: { path: string }) => i.path)).toEqual(['newCustomer.name']);
    expect((await t.db.select().from(customers)).length).toBe(before);
  });
});

describe('GET /api/jobs', () => {
  it('filters by search text, status and due date', async () => {
    type Row = { reference: string; customerName: string; status: string; dueDate: string | null };
    const refs = (rows: Row[]) => rows.map((j) => j.reference);
    const all = (await list('?show=all')).json.jobs as Row[];
    expect(refs(all)).toEqual(expect.arrayContaining(['J-1001', 'J-1002', 'J-1003', 'J-1004']));
    const fenwick = (await list('?q=fenwick')).json.jobs as Row[];
    expect(refs(fenwick)).toContain('J-1002');
    expect(fenwick.every((j) => /fenwick/i.test(j.customerName))).toBe(true);
    expect(refs((await list('?q=J-1003')).json.jobs)).toEqual(['J-1003']);
    const cancelled = (await list('?status=cancelled')).json.jobs as Row[];
    expect(refs(cancelled)).toContain('J-1004');
    expect(cancelled.every((j) => j.status === 'cancelled')).toBe(true);
    // Demo "now" is 2026-11-20; J-1002 is due in 2 days, J-1001 in 4, J-1003 in 7.
    const soon = (await list('?dueFrom=2026-11-20&dueTo=2026-11-25')).json.jobs as Row[];
    expect(refs(soon)).toEqual(expect.arrayContaining(['J-1002', 'J-1001']));
    expect(refs(soon)).not.toContain('J-1003');
    expect(soon.every((j) => j.dueDate! >= '2026-11-20' && j.dueDate! <= '2026-11-25')).toBe(true);
    expect(soon.map((j) => j.dueDate)).toEqual([...soon.map((j) => j.dueDate)].sort());
    expect((await list('?status=nonsense')).status).toBe(422);
    const j1001 = all.find((j) => j.reference === 'J-1001');
    expect(j1001).toMatchObject({ itemCount: 5, pieceCount: 14 + 4 + 4 + 12 + 30 });
  });

  it('shows open jobs by default; done and cancelled ones only when asked, and always after open ones', async () => {
    type Row = { reference: string; status: string };
    const closed = (s: string) => s === 'done' || s === 'cancelled';
    const open = (await list()).json.jobs as Row[];
    expect(open.length).toBeGreaterThan(0);
    expect(open.some((j) => closed(j.status))).toBe(false);
    const behindFilter = (await list('?show=closed')).json.jobs as Row[];
    expect(behindFilter.map((j) => j.reference)).toContain('J-1004');
    expect(behindFilter.every((j) => closed(j.status))).toBe(true);
    const all = ((await list('?show=all')).json.jobs as Row[]).map((j) => closed(j.status));
    expect(all).toEqual([...all].sort((a, b) => Number(a) - Number(b)));
    expect(all.filter(Boolean).length).toBe(behindFilter.length);
  });
});

describe('job details, edits and cancelling', () => {
  it('returns the job with items and plans; 404 for an unknown job', async () => {
    const res = await call(getJob, { params: { jobId: '3' } });
    expect(res.status).toBe(200);
    expect(res.json.job.reference).toBe('J-1003');
    expect(res.json.items).toHaveLength(4);
    expect(res.json.plans).toHaveLength(1);
    const plans = await call(jobPlans, { params: { jobId: '3' } });
    expect(plans.json.plans[0].id).toBe(res.json.plans[0].id);
    expect((await call(getJob, { params: { jobId: '999' } })).status).toBe(404);
  });

  it('edits details, cancels a draft, refuses to cancel a released job, reopens a cancelled one', async () => {
    const edit = await call(patchJob, {
      method: 'PATCH',
      params: { jobId: '1' },
      body: { customerName: 'Priya H.', dueDate: null },
    });
    expect(edit.status).toBe(200);
    expect(edit.json.job).toMatchObject({ customerName: 'Priya H.', dueDate: null });
    expect(
      (await call(patchJob, { method: 'PATCH', params: { jobId: '1' }, body: { status: 'cancelled' } })).json
        .job.status,
    ).toBe('cancelled');
    expect(
      (await call(patchJob, { method: 'PATCH', params: { jobId: '2' }, body: { status: 'cancelled' } }))
        .status,
    ).toBe(409);
    expect(
      (await call(patchJob, { method: 'PATCH', params: { jobId: '1' }, body: { status: 'draft' } })).json.job
        .status,
    ).toBe('draft');
    expect(
      (await call(patchJob, { method: 'PATCH', params: { jobId: '1' }, body: { status: 'done' } })).status,
    ).toBe(422);
    expect(
      (await call(patchJob, { method: 'PATCH', params: { jobId: '1' }, body: { reference: 'J-1002' } }))
        .status,
    ).toBe(409);
    expect((await call(patchJob, { method: 'PATCH', params: { jobId: '1' }, body: {} })).status).toBe(422);
  });
});

describe('line items', () => {
  const add = (body: unknown, jobId = '1') => call(addItem, { method: 'POST', params: { jobId }, body });

  it('adds, edits and deletes a row; lengths may be written in any notation', async () => {
    const added = await add({ sectionId: 1, length: '2.4m', quantity: 3, label: 'rail' });
    expect(added.status).toBe(201);
    expect(added.json.item).toMatchObject({ lengthMm: 2400, quantity: 3, label: 'rail' });
    const itemId = String(added.json.item.id);
    const changed = await call(patchItem, {
      method: 'PATCH',
      params: { jobId: '1', itemId },
      body: { length: 1500, quantity: 5 },
    });
    expect(changed.json.item).toMatchObject({ lengthMm: 1500, quantity: 5 });
    expect((await call(deleteItem, { method: 'DELETE', params: { jobId: '1', itemId } })).status).toBe(200);
    expect((await call(deleteItem, { method: 'DELETE', params: { jobId: '1', itemId } })).status).toBe(404);
  });

  it('refuses bad rows (422), too-long pieces, released jobs (409) and saw operators (403)', async () => {
    const bad = await add({ sectionId: 1, length: 'abc', quantity: 0 });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual(['length', 'quantity']);
    expect((await add({ sectionId: 1, length: 7000, quantity: 1 })).status).toBe(422);
    expect((await add({ sectionId: 999, length: 1000, quantity: 1 })).status).toBe(422);
    expect((await add({ sectionId: 1, length: 1000, quantity: 1 }, '2')).status).toBe(409);
    actAs(AS.saw);
    expect((await add({ sectionId: 1, length: 1000, quantity: 1 })).status).toBe(403);
  });

  it('refuses a too-short piece with a clear message, asking about a bare number', async () => {
    // Minimum safe piece length 150 mm in the demo yard (common practice, no published source).
    const bare = await add({ sectionId: 1, length: '2.4', quantity: 1 });
    expect(bare.status).toBe(422);
    expect(bare.json.error).toMatch(/Did you mean 2.4 m \(2400 mm\)\?/);
    const short = await add({ sectionId: 1, length: 35, quantity: 1 });
    expect(short.status).toBe(422);
    expect(short.json.details.issues[0]).toMatchObject({ path: 'length' });
    expect(short.json.error).toMatch(/^35 mm is shorter than the yard's minimum safe piece length/);
    expect((await add({ sectionId: 1, length: '2.4 m', quantity: 1 })).status).toBe(201);
  });

  it('changing the list of a planned job returns it to draft', async () => {
    await call(planJob, { method: 'POST', params: { jobId: '1' }, body: { timeLimitMs: 300 } });
    await add({ sectionId: 1, length: 1000, quantity: 1 });
    const job = await call(getJob, { params: { jobId: '1' } });
    expect(job.json.job.status).toBe('draft');
  });
});
