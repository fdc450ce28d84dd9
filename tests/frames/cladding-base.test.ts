import { describe, expect, it } from 'vitest';
import { generateFrameItems, getJointPositions } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

describe('cladding', () => {
  // Boards = ceil(height to cover / cover width) courses — common practice, no published source.
  it('counts ceil(height / cover) courses of the panel length, plus the waste allowance', () => {
    const panels = parsePanels([
      {
        kind: 'cladding',
        name: 'clad',
        sectionId: 2,
        width: 2400,
        height: 2000,
        cover: 110,
        wastePercent: 10,
      },
    ]);
    const { items } = generateFrameItems(panels, { sections });
    const boards = items.filter((i) => i.label.startsWith('clad board'));
    expect(boards.reduce((n, i) => n + i.quantity, 0)).toBe(Math.ceil(2000 / 110)); // 19
    expect(boards.every((b) => b.length === 2400)).toBe(true);
    expect(items.find((i) => i.label === 'clad spare board')).toMatchObject({ quantity: 2, length: 2400 }); // ceil(19 × 10 %)
  });

  it('splits runs longer than stock and lands joints on studs of a named wall', () => {
    const panels = parsePanels([
      { kind: 'wall', id: 'w', name: 'wall', sectionId: 1, length: 6000, height: 1000, centres: 600 },
      {
        kind: 'cladding',
        name: 'clad',
        sectionId: 2,
        wallId: 'w',
        cover: 110,
        maxStockLength: 4800,
        wastePercent: 0,
      },
    ]);
    const { items, warnings } = generateFrameItems(panels, { sections });
    const boards = items.filter((i) => i.label.startsWith('clad board'));
    // Joint at the stud centre 4800 (within 4800 of the start); the two edge courses are ripped, so listed apart.
    const perLength = (length: number) =>
      boards.filter((b) => b.length === length).reduce((n, b) => n + b.quantity, 0);
    expect(new Set(boards.map((b) => b.length))).toEqual(new Set([1200, 4800]));
    expect([perLength(1200), perLength(4800)]).toEqual([Math.ceil(1000 / 110), Math.ceil(1000 / 110)]);
    // 10 courses of 110 cover 1100: the 100 mm over is taken off both edge boards, 60 mm each.
    expect(boards.some((b) => b.note?.includes('rip to 60 mm cover'))).toBe(true);
    expect(warnings.some((w) => w.includes('jointed at 4800'))).toBe(true);
    expect(getJointPositions(10_000, 4800)).toEqual([10_000 / 3, 20_000 / 3]);
  });
});

describe('base frame', () => {
  it('has side rails, joists between them at centres and bearers along the length', () => {
    const panels = parsePanels([
      {
        kind: 'base',
        name: 'base',
        sectionId: 1,
        length: 2400,
        width: 1800,
        joistCentres: 400,
        bearerCentres: 600,
      },
    ]);
    const { items } = generateFrameItems(panels, { sections });
    expect(items.find((i) => i.label === 'base side rail')).toMatchObject({ quantity: 2, length: 2400 });
    // Stud rule, common practice: ceil(2400 / 400) + 1 = 7 joists, ceil(1800 / 600) + 1 = 4 bearers.
    expect(items.find((i) => i.label === 'base joist')).toMatchObject({ quantity: 7, length: 1800 - 2 * 47 });
    expect(items.find((i) => i.label === 'base bearer')).toMatchObject({ quantity: 4, length: 2400 });
  });
});
