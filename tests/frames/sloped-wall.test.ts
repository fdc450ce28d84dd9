import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { generateFrameItems, layoutPanel } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

const studsOf = (items: ReturnType<typeof generateFrameItems>['items'], prefix: string) =>
  items.filter((i) => i.label.startsWith(prefix)).sort((a, b) => a.length - b.length);

describe('mono-pitch wall', () => {
  // US Navy Builder training manual NAVEDTRA 14044: stud step = spacing × rise / run;
  // 6 in 12 at 24 in centres → 12 in, at 16 in → 8 in. Here the same 6-in-12 slope in whole mm:
  // 600 mm centres step 300 mm, 400 mm centres step 200 mm (rounding to whole mm allows 1 mm).
  it.each([
    [600, 300],
    [400, 200],
  ])('6 in 12 slope at %i mm centres steps each stud by %i mm', (centres, step) => {
    const panels = parsePanels([
      {
        kind: 'sloped_wall',
        name: 'side',
        sectionId: 1,
        length: 4800,
        lowHeight: 1800,
        highHeight: 4200,
        centres,
      },
    ]);
    const studs = studsOf(generateFrameItems(panels, { sections }).items, 'side stud');
    const inner = studs.slice(1, -1); // end studs sit off the centre grid
    expect(inner.length).toBeGreaterThan(3);
    for (let k = 1; k < inner.length; k++)
      expect(Math.abs(inner[k].length - inner[k - 1].length - step)).toBeLessThanOrEqual(1);
    // Top cut of 6 in 12 is atan(0.5) = 26.6°.
    expect(inner.every((s) => s.angle === 26.6)).toBe(true);
  });

  it('sloping top plate runs along the slope: 2400 long, 300 rise → 2419 mm, blank 2425 at the long point', () => {
    const panels = parsePanels([
      {
        kind: 'sloped_wall',
        name: 'side',
        sectionId: 1,
        length: 2400,
        lowHeight: 1900,
        highHeight: 2200,
        centres: 400,
        topPlate: 'single',
      },
    ]);
    const plate = generateFrameItems(panels, { sections }).items.find((i) => i.label === 'side top plate');
    // Along the slope √(2400² + 300²) = 2418.7; two parallel plumb cuts add the plate's depth in the
    // elevation × tan(slope) = 47 × 300/2400 = 5.9 (trigonometry), so the blank is 2425, not 2419.
    expect(plate).toMatchObject({ length: 2425, quantity: 1, angle: 7.1, note: 'plumb cut both ends' });
  });

  it('property: studs grow steadily from the low end, every length positive and within the panel', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 600, max: 8000 }),
        fc.integer({ min: 1200, max: 3000 }),
        fc.integer({ min: 0, max: 1500 }),
        fc.constantFrom(300, 400, 450, 600),
        (length, low, rise, centres) => {
          fc.pre(centres <= length);
          const [wall] = parsePanels([
            {
              kind: 'sloped_wall',
              name: 'w',
              sectionId: 1,
              length,
              lowHeight: low,
              highHeight: low + rise,
              centres,
              nogginRows: 1,
            },
          ]);
          const { items } = generateFrameItems([wall], { sections });
          const shapes = layoutPanel(wall, { sections }).shapes.filter((s) => s.label.startsWith('w stud'));
          const byX = shapes
            .map((s) => ({ x: Math.min(...s.points.map((p) => p.x)), mark: s.mark }))
            .sort((a, b) => a.x - b.x);
          const lengthOf = (mark: string | null) => items.find((i) => i.mark === mark)!.length;
          const maxStep = Math.ceil((centres * rise) / length) + 1;
          for (let k = 1; k < byX.length; k++) {
            const step = lengthOf(byX[k].mark) - lengthOf(byX[k - 1].mark);
            expect(step).toBeGreaterThanOrEqual(0);
            expect(step).toBeLessThanOrEqual(maxStep);
          }
          for (const item of items) {
            expect(item.length).toBeGreaterThan(0);
            expect(item.length).toBeLessThanOrEqual(
              // The raking plate's blank adds its 47 mm depth × tan(slope) for two parallel plumb cuts.
              Math.ceil(Math.max(Math.hypot(length, rise) + (47 * rise) / length, low + rise)),
            );
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
