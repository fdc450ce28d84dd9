import { describe, expect, it } from 'vitest';
import { generateFrameItems, getDoorLeafGeometry, type DoorLeafPanel } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

const leaf = (extra: Record<string, unknown> = {}) =>
  parsePanels([
    {
      kind: 'door_leaf',
      name: 'door',
      sectionId: 3,
      boardSectionId: 2,
      openingWidth: 800,
      openingHeight: 1900,
      boardCover: 115,
      ...extra,
    },
  ]);

describe('ledged and braced door', () => {
  // Leaf = opening less clearances, about 15 mm across and 10–20 mm on height — common practice, no published source.
  it('makes the leaf the opening less 15 mm across and 10 mm in height by default', () => {
    const panels = leaf();
    const g = getDoorLeafGeometry(panels[0] as DoorLeafPanel, panels, { sections })!;
    expect([g.leafWidth, g.leafHeight]).toEqual([785, 1890]);
    const edited = leaf({ clearanceWidth: 10, clearanceHeight: 20 });
    const e = getDoorLeafGeometry(edited[0] as DoorLeafPanel, edited, { sections })!;
    expect([e.leafWidth, e.leafHeight]).toEqual([790, 1880]);
  });

  it('takes its size from a named opening', () => {
    const panels = parsePanels([
      { kind: 'wall', id: 'w', name: 'side', sectionId: 1, length: 2400, height: 2200, centres: 400 },
      { kind: 'opening', id: 'o', name: 'side door', wallId: 'w', position: 800, width: 760, height: 1850 },
      { kind: 'door_leaf', name: 'door', sectionId: 3, boardSectionId: 2, openingId: 'o', boardCover: 115 },
    ]);
    const g = getDoorLeafGeometry(panels[2] as DoorLeafPanel, panels, { sections })!;
    expect([g.leafWidth, g.leafHeight]).toEqual([745, 1840]);
  });

  // Braces run from low on the hinge side up to the latch side, so they are in compression — common practice.
  it.each(['left', 'right'] as const)('braces rise away from the hinges (hinges %s)', (hingeSide) => {
    const panels = leaf({ hingeSide });
    const g = getDoorLeafGeometry(panels[0] as DoorLeafPanel, panels, { sections })!;
    expect(g.braces).toHaveLength(2); // 3 ledges by default
    for (const b of g.braces) {
      expect(b.end.y).toBeGreaterThan(b.start.y);
      if (hingeSide === 'left') expect(b.end.x).toBeGreaterThan(b.start.x);
      else expect(b.end.x).toBeLessThan(b.start.x);
      expect(b.start.x < g.leafWidth / 2).toBe(hingeSide === 'left');
    }
  });

  it('lists ceil(leaf width / cover) boards, ripping the last, and braces no shorter than their diagonal', () => {
    const { items } = generateFrameItems(leaf(), { sections });
    const boards = items.filter((i) => i.label.startsWith('door board'));
    expect(boards.reduce((n, i) => n + i.quantity, 0)).toBe(Math.ceil(785 / 115));
    expect(boards.find((i) => i.note)?.note).toBe(`rip to ${785 - 6 * 115} mm cover`);
    expect(items.find((i) => i.label === 'door ledge')).toMatchObject({ quantity: 3, length: 785 });
    const brace = items.find((i) => i.label === 'door brace')!;
    const panels = leaf();
    const b = getDoorLeafGeometry(panels[0] as DoorLeafPanel, panels, { sections })!.braces[0];
    expect(brace.length).toBeGreaterThanOrEqual(
      Math.floor(Math.hypot(b.end.x - b.start.x, b.end.y - b.start.y)),
    );
    expect(brace.angle).toBeGreaterThan(0);
  });
});
