// Thin data access for the owner's reports: read the rows, hand them to the pure computations.
import 'server-only';
import { and, eq, gte, inArray, isNotNull, lt, ne, or } from 'drizzle-orm';
import { getDb } from '@/db';
import {
  jobs,
  offcuts,
  planBoards,
  plans,
  sections,
  stockLengths,
  stockMovements,
  yardSettings,
} from '@/db/schema';
import type { BoardPiece, PlanTotals } from '@/lib/plans/plan-shapes';
import { getSectionPencePerMetre } from '@/lib/stock/section-prices';
import { computeOffcutReport, type OffcutMovementRow } from './offcut-report';
import { rangeBounds, type ReportRange } from './report-range';
import { computeSavingsReport } from './savings-report';
import { computeStockReport } from './stock-report';
import { computeWasteReport, type MaterialMovementRow } from './waste-report';

export async function getWasteReport(range: ReportRange) {
  const db = await getDb();
  const { start, end } = rangeBounds(range);
  const [boardRows, movements, perMetre] = await Promise.all([
    db
      .select({
        doneAt: planBoards.doneAt,
        sectionId: planBoards.sectionId,
        sectionName: sections.name,
        lengthMm: planBoards.lengthMm,
        pieces: planBoards.pieces,
        remainderMm: planBoards.remainderMm,
        keepRemainder: planBoards.keepRemainder,
      })
      .from(planBoards)
      .innerJoin(sections, eq(sections.id, planBoards.sectionId))
      .where(and(eq(planBoards.status, 'done'), gte(planBoards.doneAt, start), lt(planBoards.doneAt, end))),
    db
      .select({
        at: stockMovements.at,
        kind: stockMovements.kind,
        quantityDelta: stockMovements.quantityDelta,
        lengthMm: stockMovements.lengthMm,
        valuePence: stockMovements.valuePence,
      })
      .from(stockMovements)
      .where(
        and(
          or(
            inArray(stockMovements.kind, ['receipt', 'stock_cut']),
            // a stock board taken back at the saw cancels its cut
            and(eq(stockMovements.kind, 'board_undone'), isNotNull(stockMovements.stockLengthId)),
          ),
          gte(stockMovements.at, start),
          lt(stockMovements.at, end),
        ),
      ),
    getSectionPencePerMetre(db),
  ]);
  const boards = boardRows.map((b) => ({
    doneAt: b.doneAt!,
    sectionName: b.sectionName,
    lengthMm: b.lengthMm,
    pieceMm: (b.pieces as BoardPiece[]).reduce((n, p) => n + p.lengthMm, 0),
    remainderMm: b.remainderMm,
    keepRemainder: b.keepRemainder,
    pencePerMetre: perMetre.get(b.sectionId) ?? 0,
  }));
  return computeWasteReport({ boards, movements: movements as MaterialMovementRow[], start, end });
}

export async function getOffcutReport(range: ReportRange, now = new Date()) {
  const db = await getDb();
  const { start, end } = rangeBounds(range);
  const [movements, rackRows, perMetre, [settings]] = await Promise.all([
    db
      .select({ at: stockMovements.at, kind: stockMovements.kind, lengthMm: stockMovements.lengthMm })
      .from(stockMovements)
      .where(
        and(
          inArray(stockMovements.kind, ['offcut_made', 'offcut_used', 'offcut_scrapped']),
          gte(stockMovements.at, start),
          lt(stockMovements.at, end),
        ),
      ),
    db
      .select({
        id: offcuts.id,
        tag: offcuts.tag,
        sectionId: offcuts.sectionId,
        sectionName: sections.name,
        lengthMm: offcuts.lengthMm,
        location: offcuts.location,
        createdAt: offcuts.createdAt,
      })
      .from(offcuts)
      .innerJoin(sections, eq(sections.id, offcuts.sectionId))
      .where(inArray(offcuts.status, ['available', 'reserved'])),
    getSectionPencePerMetre(db),
    db.select({ days: yardSettings.clearOffcutsAfterDays }).from(yardSettings),
  ]);
  const rack = rackRows.map((o) => ({ ...o, pencePerMetre: perMetre.get(o.sectionId) ?? 0 }));
  return computeOffcutReport({
    movements: movements as OffcutMovementRow[],
    rack,
    start,
    end,
    now,
    clearAfterDays: settings?.days ?? 90,
  });
}

export async function getSavingsReport(range: ReportRange) {
  const db = await getDb();
  const { start, end } = rangeBounds(range);
  const rows = await db
    .select({
      planId: plans.id,
      plannedAt: plans.createdAt,
      totals: plans.totals,
      jobReference: jobs.reference,
      customerName: jobs.customerName,
    })
    .from(plans)
    .innerJoin(jobs, eq(jobs.id, plans.jobId))
    .where(and(ne(plans.status, 'superseded'), gte(plans.createdAt, start), lt(plans.createdAt, end)));
  const planRows = rows.map((r) => {
    const t = r.totals as PlanTotals;
    return {
      planId: r.planId,
      jobReference: r.jobReference,
      customerName: r.customerName,
      plannedAt: r.plannedAt,
      stockBoards: t.stockBoards,
      stockCostPence: t.stockCostPence,
      baselineBoards: t.baseline.boards,
      baselineCostPence: t.baseline.stockCostPence,
    };
  });
  return computeSavingsReport({ plans: planRows, start, end });
}

export async function getStockReport(range: ReportRange) {
  const db = await getDb();
  const { start, end } = rangeBounds(range);
  const [lengths, cuts] = await Promise.all([
    db
      .select({
        stockLengthId: stockLengths.id,
        sectionName: sections.name,
        lengthMm: stockLengths.lengthMm,
        onHand: stockLengths.onHand,
        active: stockLengths.active,
      })
      .from(stockLengths)
      .innerJoin(sections, eq(sections.id, stockLengths.sectionId)),
    db
      .select({
        at: stockMovements.at,
        stockLengthId: stockMovements.stockLengthId,
        quantityDelta: stockMovements.quantityDelta,
      })
      .from(stockMovements)
      .where(
        and(
          // A board taken back at the saw ('board_undone', +1 on hand) cancels its cut.
          inArray(stockMovements.kind, ['stock_cut', 'board_undone']),
          gte(stockMovements.at, start),
          lt(stockMovements.at, end),
        ),
      ),
  ]);
  return computeStockReport({
    lengths,
    cuts: cuts.flatMap(({ at, stockLengthId, quantityDelta }) =>
      stockLengthId === null ? [] : [{ at, stockLengthId, boards: -quantityDelta }],
    ),
    start,
    end,
  });
}
