import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as importItems } from '@/app/api/jobs/[jobId]/items/import/route';
import { GET as getJob } from '@/app/api/jobs/[jobId]/route';
import { POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import * as schema from '@/db/schema';
import { buildYardCutListTemplate } from '@/lib/cut-lists';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
  actAs(AS.hand);
});
afterEach(() => t.close());
afterAll(closeTemplate);

const J1001 = '1'; // demo draft job with 5 line items
const csv = (text: string, jobId = J1001, query = '') =>
  call(importItems, {
    method: 'POST',
    url: `http://test.local/api/jobs/${jobId}/items/import${query}`,
    body: text,
    params: { jobId },
    headers: { 'content-type': 'text/csv' },
  });
const itemsOf = async (jobId = 1) =>
  t.db.select().from(schema.jobItems).where(eq(schema.jobItems.jobId, jobId));

describe('POST /api/jobs/[jobId]/items/import: good files', () => {
  it('imports the downloadable template, made with the yard sections, and appends its rows', async () => {
    const before = (await itemsOf()).length;
    const sections = await t.db.select().from(schema.sections);
    const template = buildYardCutListTemplate(sections);
    expect(template.split('\n')[1]).toMatch(/^T47100,2400,9,stud/);
    const res = await csv(template);
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ imported: 4 });
    expect(await itemsOf()).toHaveLength(before + 4);
  });

  it('reads mm, metres and feet-inches and stores whole millimetres', async () => {
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959):
    // 7'-8 5/8" = 92 5/8" = 2352.675 mm → 2353; 8 ft = 2438.4 mm → 2438.
    const text = [
      'Section,Length,Qty,Label,Note',
      '47×100 C24 treated,2400,2,stud,',
      't47100,2.4m,1,plate,',
      'CLS3889,"7\' 8 5/8""",3,door stud,',
      'CLS3889,"92-5/8""",1,precut,',
      'CLS3889,8ft,1,long,"by name, code, any case"',
    ].join('\n');
    const res = await csv(text, J1001, '?replace=1');
    expect(res.status).toBe(200);
    expect(res.json.imported).toBe(5);
    const items = (await itemsOf()).sort((a, b) => a.position - b.position);
    expect(items.map((i) => [i.lengthMm, i.quantity, i.label])).toEqual([
      [2400, 2, 'stud'],
      [2400, 1, 'plate'],
      [2353, 3, 'door stud'],
      [2353, 1, 'precut'],
      [2438, 1, 'long'],
    ]);
  });

  it('takes tab-separated text pasted from a spreadsheet', async () => {
    const res = await csv('section\tlength\tquantity\nT47100\t1200\t4\n', J1001, '?replace=1');
    expect(res.status).toBe(200);
    expect((await itemsOf()).map((i) => i.lengthMm)).toEqual([1200]);
  });

  it('sends a planned job back to draft and supersedes its plans', async () => {
    const planned = await call(planJob, {
      method: 'POST',
      params: { jobId: J1001 },
      body: { timeLimitMs: 300 },
    });
    expect(planned.status).toBe(201);
    expect((await csv('section,length,quantity\nT47100,900,1')).status).toBe(200);
    const job = await call(getJob, { params: { jobId: J1001 } });
    expect(job.json.job.status).toBe('draft');
    expect(job.json.plans[0].status).toBe('superseded');
  });

  it('reads a 20 000-row file', async () => {
    const rows = Array.from({ length: 20_000 }, (_, i) => `T47100,${300 + (i % 4000)},1,r${i},`);
    const res = await csv(['section,length,quantity,label,note', ...rows].join('\n'), J1001, '?replace=1');
    expect(res.status).toBe(200);
    expect(res.json.imported).toBe(20_000);
    expect(await itemsOf()).toHaveLength(20_000);
  }, 60_000);
});

describe('POST /api/jobs/[jobId]/items/import: bad files save nothing', () => {
  it('lists each bad row by line and column', async () => {
    const before = await itemsOf();
    const text = [
      'section,length,quantity,label,note',
      'T47100,2400,2,ok,', // line 2 fine
      'Oak beam,2400,1,,', // 3 unknown section
      'T47100,long,1,,', // 4 not a number
      'T47100,0,1,,', // 5 zero
      'T47100,1200,-2,,', // 6 negative quantity
      'T47100,6500,1,,', // 7 longer than any stock length (6000) and offcut
      'T47100,1200,10001,,', // 8 quantity over 10 000
    ].join('\n');
    const res = await csv(text);
    expect(res.status).toBe(422);
    const errors = res.json.errors as { line: number; column: string | null; message: string }[];
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [3, 'section'],
      [4, 'length'],
      [5, 'length'],
      [6, 'quantity'],
      [7, 'length'],
      [8, 'quantity'],
    ]);
    expect(errors[0].message).toMatch(/Unknown section "Oak beam"/);
    expect(errors[4].message).toMatch(/longer than any stock length or offcut/);
    expect(errors[5].message).toMatch(/at most 10 000/);
    expect(await itemsOf()).toEqual(before);
  });

  it('refuses a bare 2.4 (2 mm) with "did you mean 2.4 m?" and pieces under the minimum safe length', async () => {
    // The demo yard's minimum safe piece length is 150 mm (a yard setting; common practice, no published source).
    const before = await itemsOf();
    const text = ['section,length,quantity', 'T47100,2.4,2', 'T47100,100 mm,1', 'T47100,150,1'].join('\n');
    const res = await csv(text);
    expect(res.status).toBe(422);
    const errors = res.json.errors as { line: number; column: string | null; message: string }[];
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [2, 'length'],
      [3, 'length'],
    ]);
    expect(errors[0].message).toMatch(/Did you mean 2.4 m \(2400 mm\)\?/);
    expect(errors[1].message).toMatch(/minimum safe piece length \(150 mm\)/);
    expect(await itemsOf()).toEqual(before);
  });

  it('refuses an empty file and wrong columns', async () => {
    const empty = await csv('');
    expect(empty.status).toBe(422);
    expect(empty.json.errors[0]).toMatchObject({ line: 1, message: 'The file is empty.' });
    const wrong = await csv('timber,size\nT47100,2400\n');
    expect(wrong.status).toBe(422);
    expect(wrong.json.errors.some((e: { message: string }) => /quantity/i.test(e.message))).toBe(true);
  });

  it('leaves a planned job planned when the file is bad', async () => {
    await call(planJob, { method: 'POST', params: { jobId: J1001 }, body: { timeLimitMs: 300 } });
    expect((await csv('section,length,quantity\nNope,1,1')).status).toBe(422);
    const job = await call(getJob, { params: { jobId: J1001 } });
    expect(job.json.job.status).toBe('planned');
    expect(job.json.plans[0].status).toBe('planned');
  });

  it('refuses a released job, a non-CSV body, saw operators and strangers', async () => {
    expect((await csv('section,length,quantity\nCLS3889,900,1', '2')).status).toBe(409); // J-1002 is released
    const json = await call(importItems, { method: 'POST', body: { rows: [] }, params: { jobId: J1001 } });
    expect(json.status).toBe(415); // the request guard takes only text/csv here
    actAs(AS.saw);
    expect((await csv('section,length,quantity\nT47100,900,1')).status).toBe(403);
    actAs(AS.nobody);
    expect((await csv('section,length,quantity\nT47100,900,1')).status).toBe(401);
    actAs(AS.hand);
    expect((await csv('section,length,quantity\nT47100,900,1', '9999')).status).toBe(404);
  });
});
