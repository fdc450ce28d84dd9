import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { generateFrameItems, getMemberCentres } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

describe('studs in a straight wall', () => {
  // TRADE.md, Framing: ceil(L / s) + 1 studs with the first at the wall's end — common practice, no published source.
  it.each([
    [4800, 600, 9],
    [4900, 600, 10],
  ])('%i mm at %i mm centres has %i studs', (length, centres, expected) => {
    expect(getMemberCentres(length, centres, 47)).toHaveLength(expected);
    const [panel] = parsePanels([
      { kind: 'wall', name: 'back wall', sectionId: 1, length, height: 2400, centres },
    ]);
    const { items } = generateFrameItems([panel], { sections });
    expect(items.find((i) => i.label === 'back wall stud')?.quantity).toBe(expected);
  });

  it('lists a stud at height less plates: 2400 high, bottom plate and double top plate of 47 → 2259', () => {
    const panels = parsePanels([
      {
        kind: 'wall',
        name: 'wall',
        sectionId: 1,
        length: 1200,
        height: 2400,
        centres: 600,
        topPlate: 'double',
      },
    ]);
    const { items } = generateFrameItems(panels, { sections });
    expect(items.find((i) => i.label === 'wall stud')).toMatchObject({ length: 2400 - 3 * 47, quantity: 3 });
    expect(items.find((i) => i.label === 'wall top plate')).toMatchObject({ length: 1200, quantity: 2 });
  });

  // North American precut stud: 92-5/8 in + 3 × 1.5 in plates = 97-1/8 in — TRADE.md, common practice.
  it('an imperial wall of 97-1/8 in with three 1-1/2 in plates gives a 92-5/8 in stud (to the mm)', () => {
    const imperial = new Map([[9, { thickness: 38, width: 89 }]]); // 1-1/2 in ≈ 38 mm dressed
    const height = Math.round(97.125 * 25.4);
    const panels = parsePanels([
      { kind: 'wall', name: 'w', sectionId: 9, length: 2438, height, centres: 406 },
    ]);
    const stud = generateFrameItems(panels, { sections: imperial }).items.find((i) => i.label === 'w stud');
    expect(Math.abs(stud!.length - 92.625 * 25.4)).toBeLessThanOrEqual(2); // 38 mm plates vs 38.1 mm
  });

  it('property: no gap between stud centres is wider than the centres, and studs stay in the wall', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 40, max: 12_000 }),
        fc.integer({ min: 40, max: 1200 }),
        fc.integer({ min: 19, max: 50 }),
        (length, centres, t) => {
          fc.pre(centres <= length && centres >= 2 * t);
          const xs = getMemberCentres(length, centres, t);
          // Cramped runs (under three thicknesses, or centres under 2.5 thicknesses) may drop a member that cannot fit.
          const rule = Math.ceil(length / centres) + 1;
          if (length >= 3 * t && centres >= 2.5 * t) expect(xs).toHaveLength(rule);
          else expect(xs.length).toBeLessThanOrEqual(rule);
          expect(xs[0]).toBe(t / 2);
          expect(xs.at(-1)).toBe(length - t / 2);
          for (let k = 1; k < xs.length; k++) {
            expect(xs[k] - xs[k - 1]).toBeLessThanOrEqual(centres + 1e-9);
            expect(xs[k] - xs[k - 1]).toBeGreaterThanOrEqual(t - 1e-9); // never overlapping
          }
        },
      ),
    );
  });
});
