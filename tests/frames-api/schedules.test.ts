import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { GET as list, POST as create } from '@/app/api/frames/route';
import { DELETE as remove, GET as read, PUT as update } from '@/app/api/frames/[scheduleId]/route';
import { POST as copy } from '@/app/api/frames/[scheduleId]/copy/route';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { leanToPanels, sectionIdOf } from './helpers';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let panels: ReturnType<typeof leanToPanels>;
beforeEach(async () => {
  t = await useApiTestDb();
  panels = leanToPanels(await sectionIdOf(t.db, 'T47100'), await sectionIdOf(t.db, 'T47150'));
});
afterEach(() => t.close());
afterAll(closeTemplate);

const params = (id: number | string) => ({ scheduleId: String(id) });

describe('frame schedules CRUD', () => {
  it('is refused signed out and to a saw operator', async () => {
    actAs(AS.nobody);
    expect((await call(list)).status).toBe(401);
    actAs(AS.saw);
    expect((await call(list)).status).toBe(403);
    expect((await call(create, { method: 'POST', body: { name: 'x', panels } })).status).toBe(403);
    expect(
      (await call(update, { method: 'PUT', params: params(1), body: { name: 'x', panels } })).status,
    ).toBe(403);
    expect((await call(remove, { method: 'DELETE', params: params(1) })).status).toBe(403);
  });

  it('lists the demo lean-to, then saves, reads, edits and deletes a schedule', async () => {
    actAs(AS.hand);
    const before = await call(list);
    expect(before.status).toBe(200);
    expect(before.json.schedules.map((s: { name: string }) => s.name)).toContain('Lean-to for Ines Marwood');

    const created = await call(create, {
      method: 'POST',
      body: {
        name: 'Lean-to for the Quarry Lane garden',
        customerName: 'Nell Ashdown',
        unit: 'imperial',
        panels,
      },
    });
    expect(created.status).toBe(201);
    const id = created.json.schedule.id;
    expect(created.json.schedule).toMatchObject({
      name: 'Lean-to for the Quarry Lane garden',
      unit: 'imperial',
      jobs: [],
    });
    // Defaults are filled in on save: a wall gets a bottom plate; its top plate is left to the
    // yard's region (single head plate in the UK, double top plate in North America).
    expect(created.json.schedule.panels[0]).toMatchObject({ bottomPlate: true, nogginRows: 0 });
    expect(created.json.schedule.panels[0].topPlate).toBeUndefined();

    const edited = await call(update, {
      method: 'PUT',
      params: params(id),
      body: { name: 'Lean-to, deeper', customerName: 'Nell Ashdown', unit: 'mm', panels: panels.slice(0, 2) },
    });
    expect(edited.status).toBe(200);
    const got = await call(read, { params: params(id) });
    expect(got.json.schedule).toMatchObject({ name: 'Lean-to, deeper', unit: 'mm' });
    expect(got.json.schedule.panels).toHaveLength(2);

    expect((await call(remove, { method: 'DELETE', params: params(id) })).status).toBe(204);
    expect((await call(read, { params: params(id) })).status).toBe(404);
  });

  it('saves an empty schedule to start from, but refuses bad geometry per field', async () => {
    actAs(AS.owner);
    expect((await call(create, { method: 'POST', body: { name: 'Empty start' } })).status).toBe(201);
    const bad = await call(create, {
      method: 'POST',
      body: { name: '', panels: [{ ...panels[2], highHeight: 1000 }] },
    });
    expect(bad.status).toBe(422);
    // Every field that needs attention is named at once: the name and the slope that runs downhill.
    expect(bad.json.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'name',
      'panels.0.highHeight',
    ]);
  });

  it('copies a schedule into a new one that is edited on its own', async () => {
    actAs(AS.hand);
    const { json } = await call(create, {
      method: 'POST',
      body: { name: 'Stud wall', panels: panels.slice(0, 1) },
    });
    const copied = await call(copy, { method: 'POST', params: params(json.schedule.id) });
    expect(copied.status).toBe(201);
    expect(copied.json.schedule.id).not.toBe(json.schedule.id);
    expect(copied.json.schedule.name).toBe('Stud wall (copy)');
    expect(copied.json.schedule.panels).toEqual(json.schedule.panels);
    await call(update, {
      method: 'PUT',
      params: params(copied.json.schedule.id),
      body: { name: 'Stud wall B', panels: [] },
    });
    expect((await call(read, { params: params(json.schedule.id) })).json.schedule.panels).toHaveLength(1);
  });

  it('answers 404 for an unknown or malformed id', async () => {
    actAs(AS.hand);
    expect((await call(read, { params: params(9999) })).status).toBe(404);
    expect((await call(read, { params: params('abc') })).status).toBe(404);
    expect((await call(copy, { method: 'POST', params: params(9999) })).status).toBe(404);
    expect((await call(update, { method: 'PUT', params: params(9999), body: { name: 'x' } })).status).toBe(
      404,
    );
  });
});
