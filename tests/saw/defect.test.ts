import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { POST as defect } from '@/app/api/plans/[planId]/boards/[boardNo]/defect/route';
import { GET as sawPlan } from '@/app/api/saw/plans/[planId]/route';
import * as schema from '@/db/schema';
import type { SolveInput, SolvePlan } from '@/solver';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { checkPlan } from '../solver/plan-checker';
import {
  addOffcut,
  boardsOf,
  clearRack,
  movementsOf,
  releasedDemoPlanId,
  releasedJob,
  sectionByCode,
} from './saw-fixtures';

// Every solve first runs a query of its own: with a transaction open on the one connection that
// query would wait for ever, so a solve inside a transaction shows up as a timeout.
const duringSolve = vi.hoisted(() => ({ before: async () => {}, after: async () => {} }));
vi.mock('@/lib/plans/run-solver', async (importActual) => {
  const actual = await importActual<typeof import('@/lib/plans/run-solver')>();
  return {
    runSolver: async (input: SolveInput) => {
      await duringSolve.before();
      const plan = await actual.runSolver(input);
      await duringSolve.after();
      return plan;
    },
  };
});

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  t = await useApiTestDb();
  duringSolve.before = async () => {
    const timeout = new Promise((_, reject) =>
      setTimeout(() => reject(new Error('the solve ran inside a transaction')), 3_000),
    );
    await Promise.race([t.db.execute(sql`select 1`), timeout]);
  };
  duringSolve.after = async () => {};
});
afterEach(() => t.close());
afterAll(closeTemplate);

const report = (planId: number, boardNo: number, body: unknown) =>
  call(defect, { method: 'POST', params: { planId: String(planId), boardNo: String(boardNo) }, body });

const sortedPieces = (boards: { pieces: unknown }[]) =>
  boards
    .flatMap((b) =>
      (b.pieces as { jobItemId: number; lengthMm: number }[]).map((p) => `${p.jobItemId}:${p.lengthMm}`),
    )
    .sort();

describe('POST /api/plans/[planId]/boards/[boardNo]/defect', () => {
  it('is only for saw operators and owners, and checks the reason and usable length', async () => {
    const planId = await releasedDemoPlanId(t.db);
    actAs(AS.nobody);
    expect((await report(planId, 1, { reason: 'split' })).status).toBe(401);
    actAs(AS.hand);
    expect((await report(planId, 1, { reason: 'split' })).status).toBe(403);
    actAs(AS.saw);
    const bad = await report(planId, 1, { reason: 'woodworm' });
    expect(bad.status).toBe(422);
    expect(bad.json.issues[0].path).toBe('reason');
    const [board] = await boardsOf(t.db, planId);
    expect((await report(planId, 1, { reason: 'split', usableMm: board.lengthMm })).status).toBe(422);
    expect((await report(planId, 1, { reason: 'split', usableMm: 12.5 })).status).toBe(422);
  });

  it('records the bad board and re-plans its pieces with a plan that passes the independent checker', async () => {
    const planId = await releasedDemoPlanId(t.db);
    const before = await boardsOf(t.db, planId);
    // A board of new stock (the demo plan may start with an offcut): its defect re-cuts a stock length.
    const bad = before.find((b) => b.stockLengthId !== null)!;
    actAs(AS.owner);
    const res = await report(planId, bad.boardNo, { reason: 'shake', note: 'along the grain' });
    expect(res.status).toBe(200);
    const replan = res.json.replan as {
      input: SolveInput;
      output: SolvePlan;
      boardNos: number[];
      unplaced: unknown[];
    };
    expect(checkPlan(replan.input, replan.output)).toEqual([]);
    expect(replan.unplaced).toEqual([]);

    const after = await boardsOf(t.db, planId);
    const added = after.filter((b) => replan.boardNos.includes(b.boardNo));
    expect(replan.boardNos).toEqual(added.map((_, i) => before.length + i + 1));
    expect(added.every((b) => b.status === 'pending')).toBe(true);
    // The new boards hold exactly the pieces the bad board was to give.
    expect(sortedPieces(added)).toEqual(sortedPieces([bad]));
    expect(after.find((b) => b.boardNo === bad.boardNo)).toMatchObject({
      status: 'defective',
      defectReason: 'Shake (along the grain)',
    });

    const kinds = (await movementsOf(t.db, planId)).filter(
      (m) => m.kind === 'defect' || m.kind === 'stock_cut',
    );
    expect(kinds.map((m) => [m.kind, m.stockLengthId, m.quantityDelta])).toEqual([
      ['defect', bad.stockLengthId, 0],
      ['stock_cut', bad.stockLengthId, -1],
    ]);

    actAs(AS.saw);
    const view = await call(sawPlan, { params: { planId: String(planId) } });
    expect(view.json.boards).toHaveLength(after.length);
    expect(view.json.job.status).toBe('cutting');

    const again = await report(planId, bad.boardNo, { reason: 'shake' });
    expect(again.json.alreadyReported).toBe(true);
    expect(await boardsOf(t.db, planId)).toHaveLength(after.length);
  });

  it('never uses an offcut reserved by another plan, and flags the job when nothing can hold a piece', async () => {
    const section = await sectionByCode(t.db, 'T47100');
    await clearRack(t.db, section.id);
    const taken = await addOffcut(t.db, { tag: 'T-TAKEN', sectionId: section.id, lengthMm: 2000 });
    const other = await releasedJob(t.db, {
      reference: 'J-OTHER',
      sectionId: section.id,
      pieces: [[1500, 1, 'rail']],
    });
    const [otherBoard] = await boardsOf(t.db, other.planId);
    expect(otherBoard.offcutId).toBe(taken.id);

    const mine = await releasedJob(t.db, {
      reference: 'J-MINE',
      sectionId: section.id,
      pieces: [[1500, 1, 'rail']],
    });
    const [myBoard] = await boardsOf(t.db, mine.planId);
    expect(myBoard.source).toBe('stock');
    // The yard runs out of this section: only the reserved offcut could still hold the piece.
    await t.db
      .update(schema.stockLengths)
      .set({ onHand: 0 })
      .where(eq(schema.stockLengths.sectionId, section.id));

    const res = await report(mine.planId, myBoard.boardNo, { reason: 'rot' });
    expect(res.status).toBe(200);
    expect(res.json.replan.input.offcuts.map((o: { id: string }) => o.id)).not.toContain(`O${taken.id}`);
    expect(res.json.replan.boardNos).toEqual([]);
    expect(res.json.replan.unplaced).toHaveLength(1);
    const [job] = await t.db.select().from(schema.jobs).where(eq(schema.jobs.id, mine.jobId));
    expect(job.officeFlag).toMatch(/could not be re-planned/);
    const [still] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, taken.id));
    expect(still).toMatchObject({ status: 'reserved', reservedByPlanId: other.planId });
  });

  it('puts a sound part on the rack, where the re-plan may use it', async () => {
    const section = await sectionByCode(t.db, 'T47100');
    await clearRack(t.db, section.id);
    const mine = await releasedJob(t.db, {
      reference: 'J-SOUND',
      sectionId: section.id,
      pieces: [[1500, 1, 'rail']],
    });
    const [board] = await boardsOf(t.db, mine.planId);
    const res = await report(mine.planId, board.boardNo, { reason: 'split', usableMm: 1600 });
    expect(res.status).toBe(200);
    expect(checkPlan(res.json.replan.input, res.json.replan.output)).toEqual([]);
    const sound = res.json.newOffcut as { id: number; tag: string };
    expect(sound.tag).toMatch(/^K-/);
    const [added] = await boardsOf(t.db, mine.planId).then((b) => b.filter((x) => x.boardNo > board.boardNo));
    // 1600 mm holds the 1500 mm piece with no trim (offcuts are not trimmed): cheaper than new stock.
    expect(added).toMatchObject({ source: 'offcut', offcutId: sound.id });
    const [offcut] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, sound.id));
    expect(offcut).toMatchObject({ status: 'reserved', reservedByPlanId: mine.planId, lengthMm: 1600 });
  });

  it('scraps a bad rack offcut', async () => {
    const section = await sectionByCode(t.db, 'T47100');
    await clearRack(t.db, section.id);
    const offcut = await addOffcut(t.db, { tag: 'T-BAD', sectionId: section.id, lengthMm: 2000 });
    const mine = await releasedJob(t.db, {
      reference: 'J-BAD',
      sectionId: section.id,
      pieces: [[1500, 1, 'rail']],
    });
    const res = await report(mine.planId, 1, { reason: 'wane' });
    expect(res.status).toBe(200);
    const [bad] = await t.db.select().from(schema.offcuts).where(eq(schema.offcuts.id, offcut.id));
    expect(bad.status).toBe('scrapped');
    const kinds = (await movementsOf(t.db, mine.planId)).map((m) => m.kind);
    expect(kinds).toEqual(expect.arrayContaining(['defect', 'offcut_scrapped']));
    expect(kinds).not.toContain('stock_cut');
  });

  it('solves again when another plan takes a chosen rack offcut during the solve', async () => {
    const section = await sectionByCode(t.db, 'T47100');
    await clearRack(t.db, section.id);
    const mine = await releasedJob(t.db, {
      reference: 'J-RACE',
      sectionId: section.id,
      pieces: [[1500, 1, 'rail']],
    });
    const [board] = await boardsOf(t.db, mine.planId);
    const spare = await addOffcut(t.db, { tag: 'T-SPARE', sectionId: section.id, lengthMm: 1600 });
    let solves = 0;
    duringSolve.after = async () => {
      solves += 1;
      // While the first solve runs, another plan reserves the offcut it is about to choose.
      if (solves === 1)
        await t.db.update(schema.offcuts).set({ status: 'reserved' }).where(eq(schema.offcuts.id, spare.id));
    };
    const res = await report(mine.planId, board.boardNo, { reason: 'split' });
    expect(res.status).toBe(200);
    expect(solves).toBe(2);
    expect(res.json.replan.input.offcuts.map((o: { id: string }) => o.id)).not.toContain(`O${spare.id}`);
    expect(checkPlan(res.json.replan.input, res.json.replan.output)).toEqual([]);
    const added = (await boardsOf(t.db, mine.planId)).filter((b) => b.boardNo > board.boardNo);
    expect(added.map((b) => b.offcutId)).not.toContain(spare.id);
    const defects = (await movementsOf(t.db, mine.planId)).filter((m) => m.kind === 'defect');
    expect(defects).toHaveLength(1);
  });
});
