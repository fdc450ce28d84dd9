import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { inArray, sql } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';
import type { Db } from '@/db';
import * as schema from '@/db/schema';
import { seedDemoYard } from '@/lib/demo-yard';
import { verifyPassword } from '@/lib/auth/password';
import { closeTemplate, createTestDb } from '../support/test-db';

let db: Db;
let close: () => Promise<void>;
beforeEach(async () => {
  ({ db, close } = await createTestDb());
});
afterEach(() => close());
afterAll(closeTemplate);

describe('schema and demo seed on in-memory PGlite', () => {
  it('seeds the three demo users with the demo password and their roles', async () => {
    const users = await db.select().from(schema.users).orderBy(schema.users.id);
    expect(users.map((u) => [u.email, u.role])).toEqual([
      ['owner@yard.test', 'owner'],
      ['hand@yard.test', 'yard_hand'],
      ['saw@yard.test', 'saw_operator'],
    ]);
    expect(await verifyPassword(users[0].passwordHash, 'kerfwise')).toBe(true);
    expect(await verifyPassword(users[0].passwordHash, 'wrong')).toBe(false);
  });

  it('has at least 8 sections with stock lengths, about 40 offcuts and 4 jobs in different states', async () => {
    const count = async (table: PgTable) =>
      (await db.select({ n: sql<number>`count(*)::int` }).from(table))[0].n;
    expect(await count(schema.sections)).toBeGreaterThanOrEqual(8);
    expect(await count(schema.offcuts)).toBeGreaterThanOrEqual(35);
    const jobs = await db.select().from(schema.jobs);
    expect(jobs.length).toBeGreaterThanOrEqual(4);
    // The seeded history adds done jobs to the open ones.
    expect(new Set(jobs.map((j) => j.status))).toEqual(
      new Set(['draft', 'released', 'planned', 'cancelled', 'done']),
    );
    const lengths = await db.select().from(schema.stockLengths);
    // UK stock lengths step by 300 mm (common practice, see TRADE.md; no published source in the test).
    for (const l of lengths) expect(l.lengthMm % 300).toBe(0);
  });

  it('records every offcut entering the rack as a stock movement', async () => {
    const offcuts = await db.select().from(schema.offcuts);
    const moves = await db
      .select()
      .from(schema.stockMovements)
      .where(inArray(schema.stockMovements.kind, ['offcut_imported', 'offcut_made']));
    expect(moves.length).toBe(offcuts.length);
    expect(new Set(moves.map((m) => m.offcutId))).toEqual(new Set(offcuts.map((o) => o.id)));
  });

  it('does not seed twice', async () => {
    expect(await seedDemoYard(db)).toBe(false);
    const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(schema.users);
    expect(n).toBe(3);
  });

  it('tags every demo offcut, opening rack and history alike, in the one format Kerfwise issues', async () => {
    const tags = (await db.select({ tag: schema.offcuts.tag }).from(schema.offcuts)).map((o) => o.tag);
    expect(tags.length).toBeGreaterThan(42);
    for (const tag of tags) expect(tag).toMatch(/^K-\d{4,}$/);
    expect(new Set(tags).size).toBe(tags.length);
  });

  it('enforces unique offcut tags', async () => {
    const [first] = await db.select().from(schema.offcuts).limit(1);
    await expect(
      db.insert(schema.offcuts).values({ tag: first.tag, sectionId: first.sectionId, lengthMm: 500 }),
    ).rejects.toThrow();
  });
});
