import { and, eq, sql } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { Db } from '@/db';
import * as schema from '@/db/schema';
import type { BoardPiece, PlanSection, PlanTotals } from '@/lib/plans/plan-shapes';
import { closeTemplate, createTestDb } from '../support/test-db';

let db: Db;
let close: () => Promise<void>;
beforeEach(async () => {
  ({ db, close } = await createTestDb());
});
afterEach(() => close());
afterAll(closeTemplate);

describe('seeded yard history', () => {
  it('has months of done jobs whose stored totals agree with their boards', async () => {
    const plans = await db.select().from(schema.plans).where(eq(schema.plans.status, 'done'));
    expect(plans.length).toBeGreaterThanOrEqual(20);
    const dates = plans.map((p) => p.createdAt.getTime());
    expect((Math.max(...dates) - Math.min(...dates)) / 86_400_000).toBeGreaterThan(90);
    for (const plan of plans) {
      const totals = plan.totals as PlanTotals;
      const boards = await db.select().from(schema.planBoards).where(eq(schema.planBoards.planId, plan.id));
      expect(boards.every((b) => b.status === 'done' && b.doneAt)).toBe(true);
      expect(boards.length).toBe(totals.boards);
      const pieceMm = boards.reduce(
        (n, b) => n + (b.pieces as BoardPiece[]).reduce((m, p) => m + p.lengthMm, 0),
        0,
      );
      expect(pieceMm).toBe(totals.pieceMm);
      expect(boards.reduce((n, b) => n + b.lengthMm, 0)).toBe(totals.materialMm);
      // Every piece of the job was placed, and the solver's plan is never dearer than the longest-first one.
      expect(totals.unplacedPieces).toBe(0);
      expect(totals.stockCostPence).toBeLessThanOrEqual(totals.baseline.stockCostPence);
      expect((plan.sections as PlanSection[]).every((s) => s.output.boards.length > 0)).toBe(true);
    }
  });

  it('keeps the yard’s week: no job planned and no delivery taken on a Sunday', async () => {
    const plans = await db.select().from(schema.plans).where(eq(schema.plans.status, 'done'));
    const receipts = await db
      .select()
      .from(schema.stockMovements)
      .where(eq(schema.stockMovements.kind, 'receipt'));
    expect(receipts.length).toBeGreaterThan(0);
    const sundays = [...plans.map((p) => p.createdAt), ...receipts.map((r) => r.at)].filter(
      (at) => at.getUTCDay() === 0,
    );
    expect(sundays).toEqual([]);
  });

  it('has a small yard’s week: a few cut jobs most weekdays, Saturday mornings only', async () => {
    // The demo history is invented; this checks its rhythm, not a reference figure.
    const plans = await db.select().from(schema.plans).where(eq(schema.plans.status, 'done'));
    const days = plans.map((p) => p.createdAt.getTime());
    const weeks = (Math.max(...days) - Math.min(...days)) / (7 * 86_400_000);
    expect(plans.length / weeks).toBeGreaterThanOrEqual(4);
    expect(plans.length / weeks).toBeLessThanOrEqual(10);
    const saturdays = plans.filter((p) => p.createdAt.getUTCDay() === 6);
    expect(saturdays.length).toBeGreaterThan(0);
    expect(saturdays.every((p) => p.createdAt.getUTCHours() < 12)).toBe(true);
  });

  it('every kept remainder of a cut board became a rack offcut with an offcut_made movement', async () => {
    const cut = and(eq(schema.planBoards.keepRemainder, true), eq(schema.planBoards.status, 'done'));
    const [{ kept }] = await db
      .select({ kept: sql<number>`count(*)::int` })
      .from(schema.planBoards)
      .where(cut);
    const [{ made }] = await db
      .select({ made: sql<number>`count(*)::int` })
      .from(schema.stockMovements)
      .where(eq(schema.stockMovements.kind, 'offcut_made'));
    const [{ linked }] = await db
      .select({ linked: sql<number>`count(new_offcut_id)::int` })
      .from(schema.planBoards)
      .where(cut);
    expect(made).toBe(kept);
    expect(linked).toBe(kept);
  });
});
