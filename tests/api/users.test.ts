import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET, POST } from '@/app/api/users/route';
import { PATCH } from '@/app/api/users/[userId]/route';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { minimalYard } from '../support/minimal-yard';
import { closeTemplate } from '../support/test-db';

let db: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  db = await useApiTestDb({ fixture: minimalYard });
});
afterEach(() => db.close());
afterAll(closeTemplate);

describe('GET /api/users', () => {
  it('answers 401 signed out, 403 for other roles and 200 with the list for the owner', async () => {
    actAs(AS.nobody);
    expect((await call(GET)).status).toBe(401);
    actAs(AS.hand);
    expect((await call(GET)).status).toBe(403);
    actAs(AS.saw);
    expect((await call(GET)).status).toBe(403);
    actAs(AS.owner);
    const ok = await call(GET);
    expect(ok.status).toBe(200);
    expect(ok.json.users.map((u: { email: string }) => u.email).sort()).toEqual([
      'hand@yard.test',
      'owner@yard.test',
      'saw@yard.test',
    ]);
    expect(JSON.stringify(ok.json)).not.toContain('passwordHash');
  });
});

describe('POST /api/users', () => {
  it('adds an account and refuses a duplicate e-mail with 409', async () => {
    actAs(AS.owner);
    const body = {
      email: 'New.Hand@Yard.test',
      name: 'New Hand',
      role: 'yard_hand',
      password: 'long-enough',
    };
    const created = await call(POST, { method: 'POST', body });
    expect(created.status).toBe(201);
    expect(created.json.user.email).toBe('new.hand@yard.test');
    expect((await call(POST, { method: 'POST', body })).status).toBe(409);
  });

  it('answers 422 with field messages for bad input and 422 for a body that is not JSON', async () => {
    actAs(AS.owner);
    const bad = await call(POST, {
      method: 'POST',
      body: { email: 'nope', name: '', role: 'boss', password: 'x' },
    });
    expect(bad.status).toBe(422);
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'email',
      'name',
      'password',
      'role',
    ]);
    expect((await call(POST, { method: 'POST', body: '{not json' })).status).toBe(422);
  });

  it('is refused to a yard hand', async () => {
    actAs(AS.hand);
    const res = await call(POST, {
      method: 'POST',
      body: { email: 'x@y.test', name: 'X', role: 'owner', password: 'long-enough' },
    });
    expect(res.status).toBe(403);
  });
});

describe('PATCH /api/users/[userId]', () => {
  it('changes a role and disables an account', async () => {
    actAs(AS.owner);
    const res = await call(PATCH, {
      method: 'PATCH',
      params: { userId: '3' },
      body: { role: 'yard_hand', disabled: true },
    });
    expect(res.status).toBe(200);
    expect(res.json.user).toMatchObject({ role: 'yard_hand', disabled: true });
  });

  it('never demotes or disables the last active owner', async () => {
    actAs(AS.owner);
    expect(
      (await call(PATCH, { method: 'PATCH', params: { userId: '1' }, body: { role: 'saw_operator' } }))
        .status,
    ).toBe(409);
    expect(
      (await call(PATCH, { method: 'PATCH', params: { userId: '1' }, body: { disabled: true } })).status,
    ).toBe(409);
    // With a second owner the first may step down.
    await call(PATCH, { method: 'PATCH', params: { userId: '2' }, body: { role: 'owner' } });
    expect(
      (await call(PATCH, { method: 'PATCH', params: { userId: '1' }, body: { role: 'yard_hand' } })).status,
    ).toBe(200);
  });

  it('answers 404 for an unknown user and 422 for an empty change', async () => {
    actAs(AS.owner);
    expect(
      (await call(PATCH, { method: 'PATCH', params: { userId: '999' }, body: { name: 'Ghost' } })).status,
    ).toBe(404);
    expect(
      (await call(PATCH, { method: 'PATCH', params: { userId: 'abc' }, body: { name: 'Ghost' } })).status,
    ).toBe(404);
    expect((await call(PATCH, { method: 'PATCH', params: { userId: '2' }, body: {} })).status).toBe(422);
  });

  it('a disabled user loses access at once', async () => {
    actAs(AS.owner);
    await call(PATCH, { method: 'PATCH', params: { userId: '2' }, body: { role: 'owner' } });
    await call(PATCH, { method: 'PATCH', params: { userId: '2' }, body: { disabled: true } });
    actAs(AS.hand);
    expect((await call(GET)).status).toBe(401);
  });
});
