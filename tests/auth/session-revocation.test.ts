// Session tokens stop working after sign-out, a password change or a role change (OWASP Session
// Management Cheat Sheet: "Session Expiration" – invalidate on logout and on privilege change).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { JWT } from 'next-auth/jwt';
import { POST as changePassword } from '@/app/api/account/password/route';
import { PATCH as updateUser } from '@/app/api/users/[userId]/route';
import { authOptions } from '@/lib/auth/options';
import { verifyCredentials } from '@/lib/users/verify-credentials';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let db: Awaited<ReturnType<typeof useApiTestDb>>;
beforeAll(async () => {
  db = await useApiTestDb();
});
afterAll(async () => {
  await db.close();
  await closeTemplate();
});

const jwt = authOptions.callbacks!.jwt! as (args: { token: JWT; user?: unknown }) => Promise<JWT>;

async function signIn(email: string, password = 'kerfwise'): Promise<JWT> {
  const user = await verifyCredentials({ email, password, clientAddress: '192.0.2.1' });
  return jwt({ token: {} as JWT, user });
}
const stillValid = async (token: JWT) => Boolean((await jwt({ token })).uid);

describe('session versions', () => {
  it('ends a session on sign-out, and the next sign-in works', async () => {
    const token = await signIn('saw@yard.test');
    expect(await stillValid(token)).toBe(true);
    await authOptions.events!.signOut!({ token, session: null as never });
    expect(await stillValid(token)).toBe(false);
    expect(await stillValid(await signIn('saw@yard.test'))).toBe(true);
  });

  it('ends the sessions of someone whose role or password the owner changes, not on a rename', async () => {
    const token = await signIn('hand@yard.test');
    actAs(AS.owner);
    expect(
      (await call(updateUser, { method: 'PATCH', params: { userId: '2' }, body: { name: 'Hal' } })).status,
    ).toBe(200);
    expect(await stillValid(token)).toBe(true);
    expect(
      (await call(updateUser, { method: 'PATCH', params: { userId: '2' }, body: { role: 'saw_operator' } }))
        .status,
    ).toBe(200);
    expect(await stillValid(token)).toBe(false);
    const second = await signIn('hand@yard.test');
    await call(updateUser, {
      method: 'PATCH',
      params: { userId: '2' },
      body: { password: 'brand-new-pass' },
    });
    expect(await stillValid(second)).toBe(false);
  });

  it('refuses a token without a version (issued before versions existed)', async () => {
    expect(await stillValid({ uid: '1', role: 'owner' } as JWT)).toBe(false);
  });
});

describe('POST /api/account/password', () => {
  it('checks the current password, then changes it and ends the old sessions', async () => {
    const token = await signIn('owner@yard.test');
    actAs(AS.owner);
    const wrong = await call(changePassword, {
      method: 'POST',
      body: { currentPassword: 'not-it', newPassword: 'a-new-owner-pass' },
    });
    expect(wrong.status).toBe(422);
    expect(await stillValid(token)).toBe(true);
    const short = await call(changePassword, {
      method: 'POST',
      body: { currentPassword: 'kerfwise', newPassword: 'short' },
    });
    expect(short.status).toBe(422);
    const ok = await call(changePassword, {
      method: 'POST',
      body: { currentPassword: 'kerfwise', newPassword: 'a-new-owner-pass' },
    });
    expect(ok.status).toBe(200);
    expect(await stillValid(token)).toBe(false);
    expect(await stillValid(await signIn('owner@yard.test', 'a-new-owner-pass'))).toBe(true);
  });

  it('is open to every role and refused without a session', async () => {
    actAs(AS.nobody);
    const body = { currentPassword: 'kerfwise', newPassword: 'another-pass-1' };
    expect((await call(changePassword, { method: 'POST', body })).status).toBe(401);
    actAs(AS.saw);
    expect((await call(changePassword, { method: 'POST', body })).status).toBe(200);
  });
});
