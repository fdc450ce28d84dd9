import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { GET as cutSheet } from '@/app/api/plans/[planId]/cut-sheet/route';
import { POST as emailPlan } from '@/app/api/plans/[planId]/email/route';
import * as schema from '@/db/schema';
import { startMailCatcher } from '@/lib/mail/mail-catcher';
import type { CuttingPlanPrice } from '@/lib/pricing';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let catcher: Awaited<ReturnType<typeof startMailCatcher>>;
const savedPort = process.env.KERFWISE_SMTP_PORT;

beforeEach(async () => {
  t = await useApiTestDb();
  catcher = await startMailCatcher({ smtpPort: 0 });
  process.env.KERFWISE_SMTP_PORT = String(catcher.smtpPort);
  actAs(AS.hand);
});
afterEach(async () => {
  process.env.KERFWISE_SMTP_PORT = savedPort;
  await catcher.close();
  await t.close();
});
afterAll(closeTemplate);

/** The demo seed plans J-1003 (planned) as its only plan. */
async function j1003Plan() {
  const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.reference, 'J-1003'));
  const [plan] = await t.db.select().from(schema.plans).where(eq(schema.plans.jobId, job.id));
  return { job, plan };
}
const send = (planId: number, body: unknown = {}) =>
  call(emailPlan, { method: 'POST', params: { planId: String(planId) }, body });

describe('cut sheet PDF', () => {
  it('downloads as a PDF for the office roles, not for the saw operator (no prices at the saw)', async () => {
    const { plan } = await j1003Plan();
    const download = async () =>
      cutSheet(new (await import('next/server')).NextRequest('http://test.local/x'), {
        params: Promise.resolve({ planId: String(plan.id) }),
      });
    actAs(AS.saw);
    expect((await download()).status).toBe(403);
    actAs(AS.hand);
    const res = await download();
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const bytes = Buffer.from(await res.arrayBuffer());
    // A PDF file starts with "%PDF-" (ISO 32000-1, 7.5.2 File header).
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(bytes.length).toBeGreaterThan(2_000);
  }, 60_000);
});

describe('POST /api/plans/[planId]/email', () => {
  it('sends the cut sheet and quote to the customer and records it', async () => {
    const { job, plan } = await j1003Plan();
    const res = await send(plan.id, { message: 'Ready Friday.' });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ sent: true, to: 'ade.t@example.com' });
    const [mail] = catcher.messages();
    expect(mail.to).toEqual(['ade.t@example.com']);
    expect(mail.subject).toContain('J-1003');
    expect(mail.text).toContain('Ready Friday.');
    expect(mail.text).toMatch(/Total to pay: £\d+\.\d\d \(includes VAT of £\d+\.\d\d\)/);
    expect(mail.attachments).toEqual([
      expect.objectContaining({
        contentType: 'application/pdf',
        filename: `cut-sheet-J-1003-plan-${plan.id}.pdf`,
      }),
    ]);
    const rows = await t.db.select().from(schema.sentMail).where(eq(schema.sentMail.jobId, job.id));
    expect(rows.map((r) => r.status)).toEqual(['sent']);
  }, 60_000);

  it('answers 503 with a clear message when the mail server is down; the job keeps its state', async () => {
    const { job, plan } = await j1003Plan();
    await catcher.close();
    const res = await send(plan.id);
    expect(res.status).toBe(503);
    expect(res.json.error).toMatch(/not sent/);
    const [after] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, job.id));
    expect(after.status).toBe(job.status);
    const rows = await t.db.select().from(schema.sentMail).where(eq(schema.sentMail.jobId, job.id));
    expect(rows.map((r) => r.status)).toEqual(['failed']);
    catcher = await startMailCatcher({ smtpPort: 0 }); // afterEach closes it again
  }, 60_000);

  it('refuses saw operators (403) and a bad address (422)', async () => {
    const { plan } = await j1003Plan();
    expect((await send(plan.id, { to: 'not-an-address' })).status).toBe(422);
    actAs(AS.saw);
    expect((await send(plan.id)).status).toBe(403);
    expect(catcher.messages()).toHaveLength(0);
  });
});

describe('prices of stored plans', () => {
  it('charge every new board at its yard price plus the per-cut charge', async () => {
    // The yard's pricing rule (stock at list price, offcuts free by default, a charge per saw cut):
    // common practice, no published source. Recomputed here from the stored boards and price list.
    const { plan } = await j1003Plan();
    const boards = await t.db.select().from(schema.planBoards).where(eq(schema.planBoards.planId, plan.id));
    const prices = new Map((await t.db.select().from(schema.stockLengths)).map((l) => [l.id, l.pricePence]));
    const [yard] = await t.db.select().from(schema.yardSettings);
    const stockPence = boards
      .filter((b) => b.source === 'stock')
      .reduce((sum, b) => sum + prices.get(b.stockLengthId!)!, 0);
    const cuts = boards.reduce((sum, b) => sum + (b.pieces as unknown[]).length, 0);
    expect(plan.pricePence).toBe(stockPence + cuts * yard.perCutChargePence);
    expect((plan.price as CuttingPlanPrice).totalPence).toBe(plan.pricePence);
  });
});
