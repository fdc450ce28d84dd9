// The production way into a new yard: the first owner from a command or the environment, no demo data.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Db } from '@/db';
import * as schema from '@/db/schema';
import { verifyPassword } from '@/lib/auth/password';
import { prepareYard } from '@/lib/server/prepare-yard';
import { createFirstOwner } from '@/lib/users/first-owner';
import { closeTemplate, createTestDb, type Fixture, type TestDb } from '../support/test-db';

let db: Db;
let testDb: TestDb | undefined;
// An empty migrated database with no rows at all: a yard before its first start.
const noRows: Fixture = async () => {};
// Set up in a hook: starting PGlite can outlast a test's time limit on a busy machine.
beforeAll(async () => {
  testDb = await createTestDb({ fixture: noRows });
  db = testDb.db;
});
afterAll(async () => {
  await testDb?.close();
  await closeTemplate();
});

describe('the first owner of an empty yard', () => {
  it('refuses a password the sign-up rules refuse, and writes nothing', async () => {
    await expect(createFirstOwner(db, { email: 'first@yard.test', password: 'short' })).rejects.toThrow(
      /not valid/,
    );
    expect(await db.select().from(schema.users)).toEqual([]);
  });

  it('is created from the environment at start, once; later starts leave the accounts alone', async () => {
    const saved = { ...process.env };
    Object.assign(process.env, {
      KERFWISE_OWNER_EMAIL: 'first@yard.test',
      KERFWISE_OWNER_PASSWORD: 'a long enough passphrase',
      KERFWISE_OWNER_NAME: 'First Owner',
      KERFWISE_DEMO: '',
    });
    try {
      await prepareYard(db);
      await prepareYard(db);
    } finally {
      process.env = saved;
    }
    const users = await db.select().from(schema.users);
    expect(users.map((u) => [u.email, u.name, u.role])).toEqual([
      ['first@yard.test', 'First Owner', 'owner'],
    ]);
    expect(await verifyPassword(users[0].passwordHash, 'a long enough passphrase')).toBe(true);
    // No demo data came with it: one yard settings row, no sections or jobs.
    expect(await db.select().from(schema.yardSettings)).toHaveLength(1);
    expect(await db.select().from(schema.sections)).toEqual([]);
    expect(
      await createFirstOwner(db, { email: 'second@yard.test', password: 'another passphrase 2' }),
    ).toEqual({
      created: false,
      reason: 'the yard already has accounts',
    });
  });
});
