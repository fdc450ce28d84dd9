import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  FRAME_STRUCTURE_NOTICE,
  generateFrameItems,
  layoutPanel,
  sumItemsBySection,
  validateFrameSchedule,
} from '@/lib/frames';
import { parsePanels, sections } from './helpers';

describe('sumItemsBySection', () => {
  it('sums by section, length and label and keeps the notice', () => {
    const { lineItems, notice } = sumItemsBySection([
      { sectionId: 1, length: 2059, label: 'stud', quantity: 7 },
      { sectionId: 1, length: 2059, label: 'stud', quantity: 2 },
      { sectionId: 1, length: 2059, label: 'king stud', quantity: 2 },
      { sectionId: 2, length: 2400, label: 'board', quantity: 19 },
    ]);
    expect(lineItems).toEqual([
      { sectionId: 1, length: 2059, label: 'king stud', quantity: 2 },
      { sectionId: 1, length: 2059, label: 'stud', quantity: 9 },
      { sectionId: 2, length: 2400, label: 'board', quantity: 19 },
    ]);
    expect(notice).toBe(FRAME_STRUCTURE_NOTICE);
  });
});

describe('free items', () => {
  it('passes a free item through with its angle', () => {
    const panels = parsePanels([
      {
        kind: 'free',
        name: 'extras',
        sectionId: 1,
        label: 'corner brace',
        length: 600,
        quantity: 4,
        angle: 45,
      },
    ]);
    expect(generateFrameItems(panels, { sections }).items).toEqual([
      {
        mark: '1.1',
        panelIndex: 0,
        label: 'corner brace',
        sectionId: 1,
        length: 600,
        quantity: 4,
        angle: 45,
      },
    ]);
  });
});

describe('properties of generated walls', () => {
  const wallWithOpening = fc
    .record({
      length: fc.integer({ min: 1800, max: 7200 }),
      height: fc.integer({ min: 2100, max: 3000 }),
      rise: fc.integer({ min: 0, max: 900 }),
      centres: fc.constantFrom(400, 450, 600),
      nogginRows: fc.integer({ min: 0, max: 2 }),
      width: fc.integer({ min: 400, max: 1000 }),
      openingHeight: fc.integer({ min: 500, max: 1900 }),
      sillHeight: fc.constantFrom(0, 600),
      at: fc.double({ min: 0, max: 1, noNaN: true }),
    })
    .map((r) => {
      const room = r.length - r.width - 2 * 150;
      return [
        {
          kind: 'sloped_wall' as const,
          id: 'w',
          name: 'w',
          sectionId: 1,
          length: r.length,
          lowHeight: r.height,
          highHeight: r.height + r.rise,
          centres: r.centres,
          nogginRows: r.nogginRows,
        },
        {
          kind: 'opening' as const,
          name: 'o',
          wallId: 'w',
          position: 150 + Math.floor(r.at * room),
          width: r.width,
          height: Math.min(r.openingHeight, r.height - r.sillHeight - 300),
          sillHeight: r.sillHeight,
        },
      ];
    });

  it('every length is positive and no longer than the wall or its high side', () => {
    fc.assert(
      fc.property(wallWithOpening, (input) => {
        const checked = validateFrameSchedule({ unit: 'mm', panels: input });
        expect(checked.errors).toEqual([]);
        if (!checked.ok) return;
        const { items } = generateFrameItems(checked.value.panels, { sections });
        const wall = checked.value.panels[0];
        if (wall.kind !== 'sloped_wall') throw new Error('sloped wall expected');
        // The raking plate's blank is its length along the slope plus its 47 mm depth × tan(slope),
        // for its two parallel plumb cuts (trigonometry).
        const rise = wall.highHeight - wall.lowHeight;
        const limit = Math.max(
          Math.ceil(Math.hypot(wall.length, rise) + (47 * Math.abs(rise)) / wall.length),
          wall.highHeight,
        );
        for (const item of items) {
          expect(item.length).toBeGreaterThan(0);
          expect(item.length).toBeLessThanOrEqual(limit);
          expect(Number.isInteger(item.length)).toBe(true);
        }
        const layout = layoutPanel(checked.value.panels[0], { sections, panels: checked.value.panels });
        for (const s of layout.shapes)
          for (const p of s.points) {
            expect(p.x).toBeGreaterThanOrEqual(-1e-6);
            expect(p.x).toBeLessThanOrEqual(wall.length + 1e-6);
            expect(p.y).toBeGreaterThanOrEqual(-1e-6);
            expect(p.y).toBeLessThanOrEqual(wall.highHeight + 1e-6);
          }
      }),
      { numRuns: 60 },
    );
  });

  it('in a plain wall, no gap between drawn studs is wider than the centres', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 600, max: 9000 }),
        fc.constantFrom(300, 400, 450, 600),
        (length, centres) => {
          const [wall] = parsePanels([
            { kind: 'wall', name: 'w', sectionId: 1, length, height: 2400, centres },
          ]);
          const studs = layoutPanel(wall, { sections }).shapes.filter((s) => s.label.startsWith('w stud'));
          const mids = studs
            .map((s) => (Math.min(...s.points.map((p) => p.x)) + Math.max(...s.points.map((p) => p.x))) / 2)
            .sort((a, b) => a - b);
          expect(mids.length).toBe(Math.ceil(length / centres) + 1);
          for (let k = 1; k < mids.length; k++) expect(mids[k] - mids[k - 1]).toBeLessThanOrEqual(centres);
        },
      ),
      { numRuns: 60 },
    );
  });
});
