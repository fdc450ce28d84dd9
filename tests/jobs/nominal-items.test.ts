// Nominal line items: a tolerance per line (0 = exact), else the section's, else the yard's.
// The layering is the product's own rule (DESIGN.md, "Full lengths and nominal pieces"); the figures
// here are test values, not trade data.
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as addItem } from '@/app/api/jobs/[jobId]/items/route';
import { PATCH as editItem } from '@/app/api/jobs/[jobId]/items/[itemId]/route';
import { POST as importItems } from '@/app/api/jobs/[jobId]/items/import/route';
import { PATCH as editSettings } from '@/app/api/settings/route';
import * as schema from '@/db/schema';
import { jobItemBodySchema } from '@/lib/validations/jobs';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { minimalYard } from '../support/minimal-yard';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let jobId: number;
let studs: number; // section without its own tolerance
let boards: number; // section with its own tolerance, set per test

beforeEach(async () => {
  t = await useApiTestDb({ fixture: minimalYard });
  const sections = await t.db.select().from(schema.sections);
  studs = sections.find((s) => s.code === 'T47X100')!.id;
  boards = sections.find((s) => s.code === 'T22X100')!.id;
  const [job] = await t.db
    .insert(schema.jobs)
    .values({ reference: 'J-NOM', customerName: 'Test' })
    .returning();
  jobId = job.id;
  actAs(AS.hand);
});
afterEach(() => t.close());
afterAll(closeTemplate);

const add = (body: Record<string, unknown>) =>
  call(addItem, { method: 'POST', params: { jobId: String(jobId) }, body: { quantity: 1, ...body } });
const edit = (itemId: number, body: Record<string, unknown>) =>
  call(editItem, { method: 'PATCH', params: { jobId: String(jobId), itemId: String(itemId) }, body });
const setSectionTolerance = (sectionId: number, mm: number | null) =>
  t.db.update(schema.sections).set({ nominalToleranceMm: mm }).where(eq(schema.sections.id, sectionId));

describe('line item tolerance: line > section > yard', () => {
  it('is exact unless the line says nominal', async () => {
    const res = await add({ sectionId: studs, length: 2400 });
    expect(res.status).toBe(201);
    expect(res.json.item.toleranceMm).toBe(0);
  });

  it("takes the yard's tolerance for a nominal line of a section without its own, and the owner can change it", async () => {
    // The new yard default is 5 mm.
    expect((await add({ sectionId: studs, length: 2400, nominal: true })).json.item.toleranceMm).toBe(5);
    actAs(AS.owner);
    const settings = await call(editSettings, {
      method: 'PATCH',
      body: {
        yardName: 'Test yard',
        kerfMm: 3,
        trimMm: 5,
        minOffcutMm: 300,
        displayUnit: 'mm',
        perCutChargePence: 25,
        clearOffcutsAfterDays: 90,
        lengthToleranceMm: 4,
      },
    });
    expect(settings.status).toBe(200);
    expect(settings.json.settings.lengthToleranceMm).toBe(4);
    actAs(AS.hand);
    expect((await add({ sectionId: studs, length: 2400, nominal: true })).json.item.toleranceMm).toBe(4);
  });

  it("takes the section's own tolerance over the yard's", async () => {
    await setSectionTolerance(boards, 3);
    const res = await add({ sectionId: boards, length: 2400, nominal: true });
    expect(res.json.item.toleranceMm).toBe(3);
  });

  it("keeps the line's own figure over the section's and the yard's; 0 is exact", async () => {
    await setSectionTolerance(boards, 3);
    expect(
      (await add({ sectionId: boards, length: 2400, nominal: true, toleranceMm: 8 })).json.item.toleranceMm,
    ).toBe(8);
    expect(
      (await add({ sectionId: boards, length: 2400, nominal: true, toleranceMm: 0 })).json.item.toleranceMm,
    ).toBe(0);
  });

  it('switches a line between exact and nominal, and keeps it when other fields change', async () => {
    await setSectionTolerance(boards, 6);
    const id = (await add({ sectionId: boards, length: 2400 })).json.item.id as number;
    expect((await edit(id, { nominal: true })).json.item.toleranceMm).toBe(6);
    expect((await edit(id, { quantity: 4 })).json.item.toleranceMm).toBe(6);
    expect((await edit(id, { nominal: false })).json.item.toleranceMm).toBe(0);
  });

  it('saves the whole row as the items table sends it', async () => {
    const id = (await add({ sectionId: studs, length: 2400, label: 'stud' })).json.item.id as number;
    const body = { sectionId: studs, length: '2400', quantity: 2, label: 'stud', note: '', nominal: true };
    const res = await edit(id, { ...body, toleranceMm: 5 });
    expect(res.status).toBe(200);
    expect(res.json.item.toleranceMm).toBe(5);
    expect((await edit(id, { ...body, nominal: false, toleranceMm: 0 })).json.item.toleranceMm).toBe(0);
    expect((await edit(id, { ...body, toleranceMm: null })).json.item.toleranceMm).toBe(5);
  });

  it('refuses a negative, fractional or too large tolerance with a 422 on the field, and saves nothing', async () => {
    for (const toleranceMm of [-1, 2.5, 51, '5']) {
      const res = await add({ sectionId: studs, length: 2400, nominal: true, toleranceMm });
      expect(res.status).toBe(422);
      expect(res.json.issues.map((i: { path: string }) => i.path)).toContain('toleranceMm');
    }
    expect(await t.db.select().from(schema.jobItems).where(eq(schema.jobItems.jobId, jobId))).toEqual([]);
  });

  it('refuses a tolerance as long as the piece', () => {
    const parsed = jobItemBodySchema.safeParse({ sectionId: 1, length: 40, quantity: 1, toleranceMm: 40 });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => i.path.join('.'))).toEqual(['toleranceMm']);
    expect(
      jobItemBodySchema.safeParse({ sectionId: 1, length: 40, quantity: 1, toleranceMm: 39 }).success,
    ).toBe(true);
  });

  it('refuses a section tolerance over the limit', async () => {
    await setSectionTolerance(boards, null);
    const { sectionBodySchema } = await import('@/lib/validations/stock');
    const section = {
      code: 'X1',
      name: 'x',
      thicknessMm: 22,
      widthMm: 100,
      lengths: [],
    };
    expect(sectionBodySchema.safeParse({ ...section, nominalToleranceMm: 51 }).success).toBe(false);
    expect(sectionBodySchema.safeParse({ ...section, nominalToleranceMm: null }).success).toBe(true);
    expect(sectionBodySchema.safeParse({ ...section, nominalToleranceMm: 0 }).success).toBe(true);
  });
});

describe('cut-list import: the optional tolerance column', () => {
  const csv = (text: string) =>
    call(importItems, {
      method: 'POST',
      url: `http://test.local/api/jobs/${jobId}/items/import`,
      body: text,
      params: { jobId: String(jobId) },
      headers: { 'content-type': 'text/csv' },
    });

  it('reads exact, nominal (the section default) and millimetres; a file without the column is exact', async () => {
    await setSectionTolerance(boards, 3);
    const res = await csv(
      [
        'section,length,quantity,label,exact or nominal',
        'T22X100,2400,4,cladding,nominal',
        'T47X100,2400,2,stud,Nominal',
        'T22X100,1200,1,rail,exact',
        'T22X100,1800,1,batten,4 mm',
        'T22X100,900,1,sill,',
      ].join('\n'),
    );
    expect(res.status).toBe(200);
    expect((await csv('section,length,quantity\nT22X100,600,1\n')).status).toBe(200);
    const items = await t.db
      .select()
      .from(schema.jobItems)
      .where(eq(schema.jobItems.jobId, jobId))
      .orderBy(schema.jobItems.position);
    expect(items.map((i) => [i.label, i.toleranceMm])).toEqual([
      ['cladding', 3], // the section's own
      ['stud', 5], // the yard's
      ['rail', 0],
      ['batten', 4],
      ['sill', 0],
      ['', 0],
    ]);
  });

  it('names the row and column of a tolerance it cannot read, and imports nothing', async () => {
    const res = await csv(
      ['section,length,quantity,tolerance', 'T22X100,2400,1,lots', 'T22X100,2400,1,60'].join('\n'),
    );
    expect(res.status).toBe(422);
    const errors = res.json.errors as { line: number; column: string }[];
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [2, 'tolerance'],
      [3, 'tolerance'],
    ]);
    expect(await t.db.select().from(schema.jobItems).where(eq(schema.jobItems.jobId, jobId))).toEqual([]);
  });
});
