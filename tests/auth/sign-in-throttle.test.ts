// Sign-in: the throttle counts per e-mail and per client address in the database (so a restart
// keeps it), and unknown e-mails cost the same password check as known ones (OWASP
// Authentication Cheat Sheet: "Authentication Responses" and "Login Throttling").
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import {
  waitBeforeNextTry,
  recordFailedSignIn,
  recordSuccessfulSignIn,
  waitFor,
} from '@/lib/auth/sign-in-throttle';
import { verifyCredentials, WRONG_CREDENTIALS } from '@/lib/users/verify-credentials';
import { useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

const checks = vi.hoisted(() => ({ count: 0 }));
vi.mock('@/lib/auth/password', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/lib/auth/password')>();
  return {
    ...real,
    verifyPassword: async (hash: string, password: string) => {
      checks.count++;
      return real.verifyPassword(hash, password);
    },
  };
});

let db: Awaited<ReturnType<typeof useApiTestDb>>;
beforeAll(async () => {
  db = await useApiTestDb();
});
afterAll(async () => {
  await db.close();
  await closeTemplate();
});

describe('throttle rule', () => {
  it('lets the first misses through, then doubles the wait up to the cap', () => {
    const rule = { freeFailures: 3, maxWaitMs: 60_000 };
    const at = new Date(1_000_000);
    expect(waitFor({ failures: 2, lastFailureAt: at }, rule, at.getTime())).toBe(0);
    expect(waitFor({ failures: 3, lastFailureAt: at }, rule, at.getTime())).toBe(1000);
    expect(waitFor({ failures: 4, lastFailureAt: at }, rule, at.getTime() + 500)).toBe(1500);
    expect(waitFor({ failures: 500, lastFailureAt: at }, rule, at.getTime())).toBe(60_000);
    expect(waitFor({ failures: 9, lastFailureAt: at }, rule, at.getTime() + 16 * 60_000)).toBe(0);
  });
});

describe('throttle in the database', () => {
  it('counts per e-mail, survives reloading the code, and forgets the e-mail after a success', async () => {
    const t0 = Date.now();
    const attempt = { email: 'Hand@Yard.test', clientAddress: '10.0.0.5' };
    for (let i = 0; i < 4; i++) await recordFailedSignIn(db.db, attempt, t0);
    expect(await waitBeforeNextTry(db.db, attempt, t0)).toBe(2000);
    // A restart: fresh module state, same database.
    vi.resetModules();
    const reloaded = await import('@/lib/auth/sign-in-throttle');
    expect(await reloaded.waitBeforeNextTry(db.db, { ...attempt, clientAddress: '10.0.0.9' }, t0)).toBe(2000);
    await recordSuccessfulSignIn(db.db, attempt);
    expect(await waitBeforeNextTry(db.db, { ...attempt, clientAddress: '10.0.0.9' }, t0)).toBe(0);
  });

  it('slows one client address trying many different e-mails', async () => {
    const t0 = Date.now();
    for (let i = 0; i < 11; i++) {
      await recordFailedSignIn(db.db, { email: `guess${i}@yard.test`, clientAddress: '203.0.113.7' }, t0);
    }
    const fresh = { email: 'someone-new@yard.test', clientAddress: '203.0.113.7' };
    expect(await waitBeforeNextTry(db.db, fresh, t0)).toBe(2000);
    expect(await waitBeforeNextTry(db.db, { ...fresh, clientAddress: '203.0.113.8' }, t0)).toBe(0);
  });
});

describe('verifyCredentials', () => {
  it('does one password check for an unknown e-mail too, and answers the same words', async () => {
    checks.count = 0;
    await expect(
      verifyCredentials({ email: 'nobody@yard.test', password: 'kerfwise', clientAddress: '198.51.100.1' }),
    ).rejects.toThrow(WRONG_CREDENTIALS);
    expect(checks.count).toBe(1);
    await expect(
      verifyCredentials({ email: 'owner@yard.test', password: 'wrong-one', clientAddress: '198.51.100.1' }),
    ).rejects.toThrow(WRONG_CREDENTIALS);
    expect(checks.count).toBe(2);
    const user = await verifyCredentials({
      email: 'owner@yard.test',
      password: 'kerfwise',
      clientAddress: '198.51.100.1',
    });
    expect(user).toMatchObject({ email: 'owner@yard.test', role: 'owner', sessionVersion: 0 });
  });
});
