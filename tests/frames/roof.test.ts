import { describe, expect, it } from 'vitest';
import { FRAME_STRUCTURE_NOTICE, generateFrameItems, getRoofGeometry } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

const roof = (extra: Record<string, number>) =>
  parsePanels([
    { kind: 'roof', name: 'roof', sectionId: 1, span: 2500, rise: 500, centres: 600, length: 3000, ...extra },
  ]);

describe('mono-pitch roof', () => {
  // R. Hunter, "Framing Shed Roofs": run 2500, rise 500 → 2549.5 mm along the slope;
  // a 500 mm horizontal overhang adds 500 · slope / run = 510 mm.
  it('rafter along the slope: run 2500, rise 500 → 2549.5 mm; listed at the long point', () => {
    const [panel] = roof({});
    if (panel.kind !== 'roof') throw new Error('roof expected');
    expect(getRoofGeometry(panel).rafterLength).toBeCloseTo(2549.5, 1);
    // Two parallel plumb cuts: blank = edge + depth × tan(pitch) = 2549.5 + 100 × 500/2500 = 2569.5
    // (trigonometry, no source needed).
    expect(
      generateFrameItems([panel], { sections }).items.find((i) => i.label === 'roof rafter')?.length,
    ).toBe(2570);
  });

  it('a 47 × 150 rafter blank is +30 mm at 11.3° and about +87 mm at 30° (trigonometry)', () => {
    const deep = new Map([[1, { thickness: 47, width: 150 }]]);
    const blankGain = (pitch: number) => {
      const [panel] = parsePanels([
        { kind: 'roof', name: 'roof', sectionId: 1, span: 2500, pitch, centres: 600, length: 1200 },
      ]);
      if (panel.kind !== 'roof') throw new Error('roof expected');
      const rafter = generateFrameItems([panel], { sections: deep }).items.find(
        (i) => i.label === 'roof rafter',
      );
      expect(rafter?.note).toMatch(/plumb cut both ends; birdsmouth/);
      return rafter!.length - getRoofGeometry(panel).rafterLength;
    };
    // 150 × tan 11.3° = 29.97; 150 × tan 30° = 86.60 (the listed length is rounded to whole mm).
    expect(Math.abs(blankGain(11.3) - 29.97)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(blankGain(30) - 86.6)).toBeLessThanOrEqual(0.5);
  });

  it('a 500 mm eaves overhang adds 510 mm', () => {
    const [plain] = roof({});
    const [eaves] = roof({ eavesOverhang: 500 });
    if (plain.kind !== 'roof' || eaves.kind !== 'roof') throw new Error('roof expected');
    expect(getRoofGeometry(eaves).rafterLength - getRoofGeometry(plain).rafterLength).toBeCloseTo(509.9, 1);
  });

  it('a pitch gives the same rafter as the matching rise', () => {
    const [byPitch] = parsePanels([
      {
        kind: 'roof',
        name: 'r',
        sectionId: 1,
        span: 2500,
        pitch: (Math.atan(0.2) * 180) / Math.PI,
        centres: 600,
        length: 3000,
      },
    ]);
    if (byPitch.kind !== 'roof') throw new Error('roof expected');
    expect(getRoofGeometry(byPitch).rafterLength).toBeCloseTo(2549.5, 1);
  });

  // Rafter count follows the stud rule: ceil(3000 / 600) + 1 = 6 (common practice).
  it('spaces rafters like studs, adds fly rafters, lookouts and fascias, and carries the notice', () => {
    const result = generateFrameItems(roof({ sideOverhang: 200, fasciaSectionId: 3, eavesOverhang: 300 }), {
      sections,
    });
    const q = (label: string) => result.items.find((i) => i.label === label);
    expect(q('roof rafter')).toMatchObject({ quantity: 6, angle: 11.3 });
    expect(q('roof fly rafter')?.quantity).toBe(2);
    expect(q('roof lookout')?.length).toBe(200 - 47);
    expect(q('roof eaves fascia')).toMatchObject({ length: 3400, sectionId: 3 });
    expect(result.notice).toBe(FRAME_STRUCTURE_NOTICE);
    expect(FRAME_STRUCTURE_NOTICE).toMatch(/does not size structure/);
  });
});
