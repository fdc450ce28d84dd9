// Full lengths and nominal pieces through the app: line items → planning route → stored plan, boards
// and quote. Check values from DESIGN.md, "Solver contract" (kerf 3, trim 5; stock 3.6/4.8/6.0 m).
// Selling a piece that takes a whole stock length uncut, and accepting factory ends on nominal pieces,
// is common practice, no published source.
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as addItem } from '@/app/api/jobs/[jobId]/items/route';
import { POST as planJob } from '@/app/api/jobs/[jobId]/plans/route';
import * as schema from '@/db/schema';
import type { BoardPiece, PlanSection } from '@/lib/plans/plan-shapes';
import { loadQuoteInput } from '@/lib/quotes/load-quote-input';
import { priceQuote } from '@/lib/quotes/price-quote';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { minimalYard } from '../support/minimal-yard';
import { closeTemplate } from '../support/test-db';
import { checkPlan } from '../solver/plan-checker';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let sectionId: number; // 22 × 100, stock 3600/4800/6000 unlimited, priced by the metre; kerf 3, trim 5

beforeEach(async () => {
  t = await useApiTestDb({ fixture: minimalYard });
  const [section] = await t.db.select().from(schema.sections).where(eq(schema.sections.code, 'T22X100'));
  sectionId = section.id;
  actAs(AS.hand);
});
afterEach(() => t.close());
afterAll(closeTemplate);

type StoredBoard = {
  lengthMm: number;
  trimMm: number;
  fullLength: boolean;
  remainderMm: number;
  pieces: BoardPiece[];
};

/** A job with one line, planned through the route; the stored plan, its boards and its quote's cut count. */
async function planLine(line: { length: number; quantity: number; nominal?: boolean; toleranceMm?: number }) {
  const [job] = await t.db
    .insert(schema.jobs)
    .values({ reference: `J-${line.length}`, customerName: 'Test' })
    .returning();
  const added = await call(addItem, {
    method: 'POST',
    params: { jobId: String(job.id) },
    body: { sectionId, ...line },
  });
  expect(added.status).toBe(201);
  const res = await call(planJob, {
    method: 'POST',
    params: { jobId: String(job.id) },
    body: { timeLimitMs: 5000 },
  });
  expect(res.status).toBe(201);
  const plan = res.json as {
    id: number;
    sections: PlanSection[];
    boards: StoredBoard[];
    totals: { cuts: number };
  };
  for (const s of plan.sections) expect(checkPlan(s.input, s.output)).toEqual([]);
  const stored = await t.db.select().from(schema.planBoards).where(eq(schema.planBoards.planId, plan.id));
  const quote = priceQuote((await loadQuoteInput(t.db, plan.id)).input);
  const cutLine = quote.lines.find((l) => l.unit === 'cut');
  return { plan, stored, quoteCuts: cutLine?.quantity ?? 0 };
}

describe('full lengths and nominal pieces through the app (DESIGN.md check values)', () => {
  it('2 × 3600 exact → two 3.6 m boards sold full length: no trim, no cut, no cut charged', async () => {
    const { plan, stored, quoteCuts } = await planLine({ length: 3600, quantity: 2 });
    expect(plan.boards.map((b) => b.lengthMm)).toEqual([3600, 3600]);
    for (const b of plan.boards) {
      expect(b).toMatchObject({ fullLength: true, trimMm: 0, remainderMm: 0 });
      expect(b.pieces.map((p) => p.cutMm)).toEqual([3600]);
    }
    expect(stored.every((b) => b.fullLength)).toBe(true);
    expect(plan.totals.cuts).toBe(0);
    expect(quoteCuts).toBe(0);
  });

  it('1 × 6000 exact → one 6.0 m board, uncut', async () => {
    const { plan, quoteCuts } = await planLine({ length: 6000, quantity: 1 });
    expect(plan.sections[0].output.unplaced).toEqual([]);
    expect(plan.boards).toHaveLength(1);
    expect(plan.boards[0]).toMatchObject({ lengthMm: 6000, fullLength: true, trimMm: 0 });
    expect(quoteCuts).toBe(0);
  });

  it('4 × 2400 nominal at 5 mm → two 4.8 m boards, each cut once, pieces 2398–2399 mm, no trim', async () => {
    const { plan, stored } = await planLine({ length: 2400, quantity: 4, nominal: true, toleranceMm: 5 });
    expect(plan.sections[0].input.pieces[0].tolerance).toBe(5);
    expect(plan.boards.map((b) => b.lengthMm)).toEqual([4800, 4800]);
    for (const b of plan.boards) {
      expect(b.trimMm).toBe(0);
      expect(b.fullLength).toBe(false);
      expect(b.pieces.map((p) => p.lengthMm)).toEqual([2400, 2400]);
      expect(b.pieces.map((p) => p.cutMm).sort()).toEqual([2398, 2399]);
      // The tolerance stays with the pieces, so a re-plan of a bad board keeps it.
      expect(b.pieces.every((p) => p.toleranceMm === 5)).toBe(true);
    }
    expect(stored.every((b) => !b.fullLength)).toBe(true);
  });

  it("a nominal line at the yard's default takes 5 mm and plans the same way", async () => {
    const { plan } = await planLine({ length: 2400, quantity: 4, nominal: true });
    expect(plan.boards.map((b) => b.lengthMm)).toEqual([4800, 4800]);
  });

  it('2 × 2400 exact → not from one 4.8 m board (4803 > 4792)', async () => {
    const { plan } = await planLine({ length: 2400, quantity: 2 });
    expect(plan.boards.some((b) => b.lengthMm === 4800 && b.pieces.length === 2)).toBe(false);
    expect(plan.boards.every((b) => b.pieces.every((p) => p.cutMm === 2400))).toBe(true);
  });
});
