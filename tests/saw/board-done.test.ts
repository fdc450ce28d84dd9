import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { POST as done } from '@/app/api/plans/[planId]/boards/[boardNo]/done/route';
import { POST as undo } from '@/app/api/plans/[planId]/undo-board/route';
import * as schema from '@/db/schema';
import { getStockReport, getWasteReport } from '@/lib/reports/get-reports';
import { defaultReportRange } from '@/lib/reports/report-range';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import {
  addOffcut,
  boardsOf,
  clearRack,
  movementsOf,
  releasedDemoPlanId,
  releasedJob,
  sectionByCode,
} from './saw-fixtures';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
});
afterEach(() => t.close());
afterAll(closeTemplate);

const confirm = (planId: number, boardNo: number, body?: unknown) =>
  call(done, { method: 'POST', params: { planId: String(planId), boardNo: String(boardNo) }, body });

/**
 * A 1500 mm piece that fits a 2000 mm rack offcut, and a 3000 mm piece that needs a 3600 stock length
 * (3000 + 5 trim + 3 kerf is over 3000). Both leave a remainder over the 300 mm minimum, so both keep one.
 */
async function twoBoardJob() {
  const section = await sectionByCode(t.db, 'T47100');
  await clearRack(t.db, section.id);
  const offcut = await addOffcut(t.db, { tag: 'T-2000', sectionId: section.id, lengthMm: 2000 });
  const job = await releasedJob(t.db, {
    reference: 'J-T1',
    sectionId: section.id,
    pieces: [
      [1500, 1, 'rail'],
      // Not 3000: a piece that takes a whole stock length is sold full length, uncut, with no remainder.
      [3200, 1, 'beam'],
    ],
  });
  const boards = await boardsOf(t.db, job.planId);
  return {
    section,
    offcut,
    ...job,
    boards,
    offcutBoard: boards.find((b) => b.source === 'offcut')!,
    stockBoard: boards.find((b) => b.source === 'stock')!,
  };
}

describe('POST /api/plans/[planId]/boards/[boardNo]/done', () => {
  it('is only for saw operators and owners', async () => {
    const planId = await releasedDemoPlanId(t.db);
    actAs(AS.nobody);
    expect((await confirm(planId, 1)).status).toBe(401);
    actAs(AS.hand);
    expect((await confirm(planId, 1)).status).toBe(403);
    actAs(AS.owner);
    expect((await confirm(planId, 1)).status).toBe(200);
    actAs(AS.saw);
    expect((await confirm(planId, 2)).status).toBe(200);
  });

  it('answers 404 for an unknown board, 409 for a plan not at the saw, 422 for a bad body', async () => {
    const planId = await releasedDemoPlanId(t.db);
    actAs(AS.saw);
    expect((await confirm(planId, 999)).status).toBe(404);
    expect((await confirm(planId, 1, { location: '' })).status).toBe(422);
    const section = await sectionByCode(t.db, 'T47100');
    const unreleased = await releasedJob(t.db, {
      reference: 'J-T9',
      sectionId: section.id,
      pieces: [[1000, 1, 'x']],
      releaseIt: false,
    });
    expect((await confirm(unreleased.planId, 1)).status).toBe(409);
  });

  it('cuts a stock board: one stock_cut at the stock price, on hand one fewer, a kept remainder tagged', async () => {
    const { stockBoard, planId, jobId, section } = await twoBoardJob();
    const [before] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    const res = await confirm(planId, stockBoard.boardNo);
    expect(res.status).toBe(200);
    expect(res.json.newOffcut.tag).toMatch(/^K-\d{4}$/);

    const [after] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    expect(after.onHand).toBe(before.onHand! - 1);
    const moves = (await movementsOf(t.db, planId)).filter(
      (m) => m.kind === 'stock_cut' || m.kind === 'offcut_made',
    );
    expect(moves.map((m) => [m.kind, m.quantityDelta, m.valuePence])).toEqual([
      ['stock_cut', -1, before.pricePence],
      ['offcut_made', 0, 0],
    ]);
    const [made] = await t.db
      .select()
      .from(schema.offcuts)
      .where(eq(schema.offcuts.tag, res.json.newOffcut.tag));
    expect(made).toMatchObject({
      sectionId: section.id,
      lengthMm: stockBoard.remainderMm,
      location: 'Rack intake',
      status: 'available',
      originPlanId: planId,
    });
    expect(made.origin).toContain('J-T1');
    const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, jobId));
    expect(job.status).toBe('cutting');
  });

  it('takes a consumed offcut off the rack, and the last board moves the job and plan to done', async () => {
    const { offcut, offcutBoard, stockBoard, planId, jobId } = await twoBoardJob();
    expect((await confirm(planId, offcutBoard.boardNo, { location: 'Rack B2' })).status).toBe(200);
    const [used] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
    expect(used.status).toBe('used');
    const moves = await movementsOf(t.db, planId);
    expect(moves.filter((m) => m.kind === 'offcut_used').map((m) => m.offcutId)).toEqual([offcut.id]);
    const [made] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.originPlanId, planId));
    expect(made.location).toBe('Rack B2');

    const last = await confirm(planId, stockBoard.boardNo);
    expect(last.json).toMatchObject({ planStatus: 'done', jobStatus: 'done', boardsDone: 2, boards: 2 });
    const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, jobId));
    const [plan] = await t.db.select().from(schema.plans).where(eq(schema.plans.id, planId));
    expect([job.status, plan.status]).toEqual(['done', 'done']);
  });

  it('changes nothing when a board is confirmed twice', async () => {
    const { stockBoard, planId } = await twoBoardJob();
    const first = await confirm(planId, stockBoard.boardNo);
    const countRows = async () => ({
      moves: (await movementsOf(t.db, planId)).length,
      offcuts: (await t.db.select().from(schema.offcuts)).length,
      stock: (
        await t.db
          .select()
          .from(schema.stockLengths)
          .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!))
      )[0].onHand,
    });
    const before = await countRows();
    const second = await confirm(planId, stockBoard.boardNo);
    expect(second.status).toBe(200);
    expect(second.json.alreadyDone).toBe(true);
    expect(second.json.newOffcut.tag).toBe(first.json.newOffcut.tag);
    expect(await countRows()).toEqual(before);
  });

  it('never takes on hand below zero: a board the count missed is recorded as counted short', async () => {
    const { stockBoard, planId } = await twoBoardJob();
    await t.db
      .update(schema.stockLengths)
      .set({ onHand: 0 })
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    expect((await confirm(planId, stockBoard.boardNo)).status).toBe(200);
    const [after] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    expect(after.onHand).toBe(0);
    const rows = (await movementsOf(t.db, planId)).filter(
      (m) => m.stockLengthId === stockBoard.stockLengthId,
    );
    expect(rows.map((m) => [m.kind, m.quantityDelta])).toEqual([
      ['stock_cut', -1],
      ['stocktake', 1],
    ]);
    expect(rows.reduce((n, m) => n + m.quantityDelta, 0)).toBe(0);
  });

  it('refuses to undo a finished plan with 409 and changes nothing', async () => {
    const { offcutBoard, stockBoard, planId } = await twoBoardJob();
    actAs(AS.saw);
    await confirm(planId, stockBoard.boardNo);
    expect((await confirm(planId, offcutBoard.boardNo)).json.planStatus).toBe('done');
    const moves = (await movementsOf(t.db, planId)).length;
    const undone = await call(undo, { method: 'POST', params: { planId: String(planId) } });
    expect(undone.status).toBe(409);
    expect(undone.json.error).toMatch(/finished/);
    expect((await movementsOf(t.db, planId)).length).toBe(moves);
  });

  it('takes back the latest board by adding reversing movements, never deleting any', async () => {
    const { stockBoard, planId } = await twoBoardJob();
    // on hand minus the sum of its movements, per stock length: an undo must leave it unchanged
    const ledger = async () => {
      const rows = await t.db.select().from(schema.stockLengths).orderBy(schema.stockLengths.id);
      const moves = await t.db.select().from(schema.stockMovements);
      return rows.map((r) =>
        r.onHand === null
          ? null
          : r.onHand - moves.filter((m) => m.stockLengthId === r.id).reduce((n, m) => n + m.quantityDelta, 0),
      );
    };
    const ledgerBefore = await ledger();
    // what the owner's stock and waste reports say was used of this board's stock length
    const reportedUse = async () => {
      const range = defaultReportRange(new Date());
      const stock = await getStockReport(range);
      const waste = await getWasteReport(range);
      return {
        boards: stock.lines.find((l) => l.stockLengthId === stockBoard.stockLengthId)?.used,
        cutMm: waste.totals.cutMm,
      };
    };
    const useBefore = await reportedUse();
    const [stockBefore] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    actAs(AS.saw);
    const cut = await confirm(planId, stockBoard.boardNo);
    expect(cut.json.jobStatus).toBe('cutting');
    expect(await reportedUse()).toEqual({
      boards: useBefore.boards! + 1,
      cutMm: useBefore.cutMm + stockBefore.lengthMm,
    });
    const idsBefore = (await t.db.select().from(schema.stockMovements)).map((m) => m.id);
    actAs(AS.hand);
    expect((await call(undo, { method: 'POST', params: { planId: String(planId) } })).status).toBe(403);
    actAs(AS.saw);
    const undone = await call(undo, { method: 'POST', params: { planId: String(planId) } });
    expect(undone.status).toBe(200);
    expect(undone.json).toMatchObject({ boardNo: stockBoard.boardNo, jobStatus: 'released' });
    const after = await t.db.select().from(schema.stockMovements);
    expect(after.map((m) => m.id)).toEqual(expect.arrayContaining(idsBefore));
    const reversing = after.filter((m) => !idsBefore.includes(m.id));
    expect(reversing.map((m) => m.kind)).toEqual(['board_undone', 'board_undone']);
    expect(await ledger()).toEqual(ledgerBefore);
    const [stockAfter] = await t.db
      .select()
      .from(schema.stockLengths)
      .where(eq(schema.stockLengths.id, stockBoard.stockLengthId!));
    expect(stockAfter.onHand).toBe(stockBefore.onHand);
    const [board] = (await boardsOf(t.db, planId)).filter((b) => b.boardNo === stockBoard.boardNo);
    expect(board).toMatchObject({ status: 'pending', newOffcutId: null });
    const [made] = await t.db
      .select()
      .from(schema.offcuts)
      .where(eq(schema.offcuts.id, cut.json.newOffcut.id));
    expect(made.status).toBe('scrapped');
    // nothing more to take back: the plan is no longer being cut
    expect((await call(undo, { method: 'POST', params: { planId: String(planId) } })).status).toBe(409);
  });

  it('refuses with 409 when the board’s new offcut is already in another plan', async () => {
    const { stockBoard, planId, section } = await twoBoardJob();
    actAs(AS.saw);
    const cut = await confirm(planId, stockBoard.boardNo);
    expect(cut.json.newOffcut).not.toBeNull();
    actAs(AS.hand);
    const other = await releasedJob(t.db, {
      reference: 'J-T9',
      sectionId: section.id,
      pieces: [[300, 1, 'block']],
      releaseIt: false,
    });
    const otherBoards = await boardsOf(t.db, other.planId);
    expect(otherBoards.map((b) => b.offcutId)).toContain(cut.json.newOffcut.id);
    actAs(AS.saw);
    const undone = await call(undo, { method: 'POST', params: { planId: String(planId) } });
    expect(undone.status).toBe(409);
    expect(undone.json.error).toContain('J-T9');
  });
});
