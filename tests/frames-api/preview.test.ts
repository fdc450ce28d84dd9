import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/frames/preview/route';
import { FRAME_STRUCTURE_NOTICE } from '@/lib/frames';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { leanToPanels, sectionIdOf } from './helpers';

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let stud: number;
let rafter: number;
beforeEach(async () => {
  t = await useApiTestDb();
  stud = await sectionIdOf(t.db, 'T47100');
  rafter = await sectionIdOf(t.db, 'T47150');
});
afterEach(() => t.close());
afterAll(closeTemplate);

const preview = (body: unknown) => call(POST, { method: 'POST', body });
const paths = (res: { json: { issues: { path: string }[] } }) => res.json.issues.map((i) => i.path);

describe('POST /api/frames/preview', () => {
  it('answers 401 signed out and 403 to a saw operator', async () => {
    const body = { unit: 'mm', panels: leanToPanels(stud, rafter) };
    actAs(AS.nobody);
    expect((await preview(body)).status).toBe(401);
    actAs(AS.saw);
    expect((await preview(body)).status).toBe(403);
  });

  // TRADE.md, Framing: a 4.8 m wall at 600 mm centres has ceil(4800 / 600) + 1 = 9 studs — common practice, no published source.
  it('lists 9 studs for a 4800 mm wall at 600 mm centres, with the structure notice', async () => {
    actAs(AS.hand);
    const res = await preview({
      unit: 'mm',
      panels: [
        { kind: 'wall', name: 'back wall', sectionId: stud, length: 4800, height: 2400, centres: 600 },
      ],
    });
    expect(res.status).toBe(200);
    const studs = res.json.items.find((i: { label: string }) => i.label === 'back wall stud');
    expect(studs).toMatchObject({ sectionId: stud, quantity: 9, length: 2400 - 3 * 47 });
    expect(res.json.notice).toBe(FRAME_STRUCTURE_NOTICE);
    expect(res.json.warnings).toEqual([]);
  });

  // R. Hunter, "Framing Shed Roofs": rafter along the slope = √(run² + rise²); run 2500, rise 500 → 2549.5 mm.
  it('gives the rafter its slope length and its angled cut', async () => {
    actAs(AS.hand);
    const res = await preview({
      unit: 'mm',
      panels: [
        { kind: 'roof', name: 'roof', sectionId: rafter, span: 2500, rise: 500, centres: 600, length: 2400 },
      ],
    });
    expect(res.status).toBe(200);
    const rafters = res.json.items.find((i: { label: string }) => i.label === 'roof rafter');
    // The blank for two parallel plumb cuts is the slope length plus depth × tan(pitch) (trigonometry):
    // 2549.5 + 150 × 500 / 2500 = 2579.5 → 2580 mm at the long point.
    expect(rafters.length).toBe(2580);
    // atan(500 / 2500) = 11.31° (plain trigonometry).
    expect(rafters.angle).toBeCloseTo(11.3, 1);
  });

  it('previews the lean-to: door framing, sloped studs with angles, every piece labelled by where it goes', async () => {
    actAs(AS.hand);
    const res = await preview({ unit: 'imperial', panels: leanToPanels(stud, rafter) });
    expect(res.status).toBe(200);
    const labels: string[] = res.json.items.map((i: { label: string }) => i.label);
    expect(labels).toEqual(
      // UK names, the default region: lintel over the opening, full-height studs beside it.
      expect.arrayContaining([
        'door opening lintel',
        'door opening full-height stud 1',
        'front wall stud',
        'roof rafter',
      ]),
    );
    expect(labels.some((l) => l.startsWith('side wall stud'))).toBe(true);
    const sideStuds = res.json.items.filter((i: { label: string }) => i.label.startsWith('side wall stud'));
    for (const s of sideStuds) expect(s.angle).toBeCloseTo((Math.atan2(300, 1500) * 180) / Math.PI, 1);
    expect(res.json.unit).toBe('imperial');
  });

  it('names the field for each bad geometry with a clear 422', async () => {
    actAs(AS.hand);
    const tooWideCentres = await preview({
      unit: 'mm',
      panels: [{ kind: 'wall', name: 'w', sectionId: stud, length: 300, height: 2400, centres: 400 }],
    });
    expect(tooWideCentres.status).toBe(422);
    expect(paths(tooWideCentres)).toEqual(['panels.0.centres']);
    expect(tooWideCentres.json.issues[0].message).toContain('larger than the wall length');

    const upsideDown = await preview({
      unit: 'mm',
      panels: [
        {
          kind: 'sloped_wall',
          name: 's',
          sectionId: stud,
          length: 1500,
          lowHeight: 2200,
          highHeight: 1900,
          centres: 400,
        },
      ],
    });
    expect(upsideDown.status).toBe(422);
    expect(paths(upsideDown)).toEqual(['panels.0.highHeight']);
    expect(upsideDown.json.issues[0].message).toContain('lower than the low side');

    const wideOpening = await preview({
      unit: 'mm',
      panels: [
        { kind: 'wall', id: 'w', name: 'w', sectionId: stud, length: 1200, height: 2400, centres: 400 },
        { kind: 'opening', name: 'door', wallId: 'w', position: 0, width: 1500, height: 1800 },
      ],
    });
    expect(wideOpening.status).toBe(422);
    expect(paths(wideOpening)).toEqual(['panels.1.width']);
    expect(wideOpening.json.issues[0].message).toContain('wider than its wall');
  });

  it('answers 422 for a section the yard does not have and for fields of the wrong type', async () => {
    actAs(AS.hand);
    const unknown = await preview({
      unit: 'mm',
      panels: [{ kind: 'wall', name: 'w', sectionId: 9999, length: 2400, height: 2400, centres: 400 }],
    });
    expect(unknown.status).toBe(422);
    expect(paths(unknown)).toEqual(['panels.0.sectionId']);
    const wrongType = await preview({
      unit: 'mm',
      panels: [{ kind: 'wall', name: 'w', sectionId: stud, length: '2.4 m', height: 2400, centres: 400 }],
    });
    expect(wrongType.status).toBe(422);
    expect(paths(wrongType)).toEqual(['panels.0.length']);
    expect((await preview({ unit: 'mm', panels: [] })).status).toBe(422);
  });
});
