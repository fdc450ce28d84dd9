import fc from 'fast-check';
import { eq, sql } from 'drizzle-orm';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as schema from '@/db/schema';
import { applyStockMovement } from '@/lib/stock/apply-stock-movement';
import { receiveStock } from '@/lib/stock/receive-stock';
import { takeStock } from '@/lib/stock/take-stock';
import { AppError } from '@/lib/errors';
import { useApiTestDb } from '../support/api';
import { minimalYard } from '../support/minimal-yard';
import { closeTemplate } from '../support/test-db';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
afterEach(() => t.close());
afterAll(closeTemplate);

async function onHandAndSums() {
  const { rows } = await t.client.query<{ id: number; on_hand: number | null; total: number }>(
    `select sl.id, sl.on_hand, coalesce(sum(m.quantity_delta), 0)::int as total
       from stock_lengths sl left join stock_movements m on m.stock_length_id = sl.id group by sl.id order by sl.id`,
  );
  return rows;
}

function expectInvariant(rows: { on_hand: number | null; total: number }[]) {
  for (const r of rows.filter((x) => x.on_hand !== null)) {
    expect(r.on_hand).toBe(r.total);
    expect(r.on_hand).toBeGreaterThanOrEqual(0);
  }
}

describe('stock movement invariants on the demo yard', () => {
  beforeEach(async () => {
    t = await useApiTestDb();
  });

  it('the demo yard starts with on-hand equal to the sum of movements', async () => {
    expectInvariant(await onHandAndSums());
  });
});

describe('stock movement invariants', () => {
  // A small yard of its own: counted and unlimited stock lengths, and few movements to sum.
  beforeEach(async () => {
    t = await useApiTestDb({ fixture: minimalYard });
  });

  it('after any sequence of receipts, stocktakes and cuts, on-hand equals the sum of movements and is never negative', async () => {
    const lengths = await t.db.select().from(schema.stockLengths).orderBy(schema.stockLengths.id).limit(4);
    const ids = lengths.map((l) => l.id);
    const command = fc.oneof(
      fc.record({ kind: fc.constant('receipt' as const), i: fc.nat(3), n: fc.integer({ min: 1, max: 30 }) }),
      fc.record({
        kind: fc.constant('stocktake' as const),
        i: fc.nat(3),
        n: fc.integer({ min: 0, max: 40 }),
      }),
      fc.record({ kind: fc.constant('cut' as const), i: fc.nat(3), n: fc.integer({ min: 1, max: 60 }) }),
    );
    await fc.assert(
      fc.asyncProperty(fc.array(command, { minLength: 1, maxLength: 12 }), async (commands) => {
        for (const c of commands) {
          const stockLengthId = ids[c.i];
          const [before] = await t.db
            .select()
            .from(schema.stockLengths)
            .where(eq(schema.stockLengths.id, stockLengthId));
          if (c.kind === 'receipt')
            await receiveStock({
              body: { reference: 'prop', lines: [{ stockLengthId, quantity: c.n }] },
              userId: 1,
            });
          else if (c.kind === 'stocktake')
            await takeStock({
              body: { reason: 'prop', counts: [{ stockLengthId, counted: c.n }] },
              userId: 1,
            });
          else {
            // A cut of n boards in one transaction: refused whole when fewer than n are on hand.
            const attempt = t.db.transaction(async (tx) => {
              for (let k = 0; k < c.n; k++)
                await applyStockMovement(tx, {
                  kind: 'stock_cut',
                  stockLengthId,
                  quantityDelta: -1,
                  userId: 3,
                  reason: 'prop',
                });
            });
            if (before.onHand !== null && before.onHand < c.n) {
              await expect(attempt).rejects.toBeInstanceOf(AppError);
              const [after] = await t.db
                .select()
                .from(schema.stockLengths)
                .where(eq(schema.stockLengths.id, stockLengthId));
              expect(after.onHand).toBe(before.onHand);
            } else await attempt;
          }
          expectInvariant(await onHandAndSums());
        }
      }),
      { numRuns: 15 },
    );
    const [{ negatives }] = await t.db
      .select({ negatives: sql<number>`count(*)::int` })
      .from(schema.stockLengths)
      .where(sql`${schema.stockLengths.onHand} < 0`);
    expect(negatives).toBe(0);
  }, 120_000); // 15 random runs of many transactions each; on a busy server that takes a while
});
