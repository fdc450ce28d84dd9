import { describe, expect, it } from 'vitest';
import { generateFrameItems, layoutPanel } from '@/lib/frames';
import { parsePanels, sections } from './helpers';

// Stud each side of the opening, a head across, short studs above — common practice, no published source.
describe('openings in a wall', () => {
  const panels = parsePanels([
    {
      kind: 'wall',
      id: 'back',
      name: 'back wall',
      sectionId: 1,
      length: 3600,
      height: 2400,
      centres: 600,
      topPlate: 'double',
    },
    { kind: 'opening', name: 'door', wallId: 'back', position: 1000, width: 900, height: 2000 },
    {
      kind: 'opening',
      name: 'window',
      wallId: 'back',
      position: 2300,
      width: 600,
      height: 500,
      sillHeight: 1000,
    },
  ]);
  const { items, warnings } = generateFrameItems(panels, { sections });
  const q = (label: string) => items.find((i) => i.label === label);

  it('removes the full studs in the openings and frames each one', () => {
    // 3600 at 600 → 7 studs; 1200 and 1800 clash with the door's framing, 2400 and 3000 with the
    // window's (its right king stud spans 2947–2994), leaving the two ends and 600.
    expect(q('back wall stud')?.quantity).toBe(3);
    expect(q('door king stud')).toMatchObject({ quantity: 2, length: 2400 - 3 * 47 });
    expect(q('door trimmer')).toMatchObject({ quantity: 2, length: 2000 - 47 });
    expect(q('door head')).toMatchObject({ quantity: 1, length: 900 + 2 * 47 });
    expect(q('door cripple above head')).toMatchObject({ quantity: 2, length: 2400 - 2 * 47 - 2000 - 100 });
    expect(q('window sill')).toMatchObject({ length: 600 });
    expect(q('window cripple below sill')).toMatchObject({ quantity: 1, length: 1000 - 47 - 47 });
    expect(warnings).toEqual([]);
  });

  it('cuts the bottom plate across the door only', () => {
    const plates = items.filter((i) => i.label.startsWith('back wall bottom plate'));
    expect(plates.map((p) => p.length).sort((a, b) => a - b)).toEqual([1000, 3600 - 1900]);
  });

  it('draws the opening pieces on the wall with the marks the schedule uses', () => {
    const layout = layoutPanel(panels[0], { sections, panels });
    const marks = new Set(layout.shapes.map((s) => s.mark).filter(Boolean));
    for (const item of items) if (item.panelIndex <= 2) expect(marks.has(item.mark)).toBe(true);
    expect(layout.shapes.filter((s) => s.role === 'opening')).toHaveLength(2);
    expect(layout.dimensions[0].value).toBe(3600);
  });
});
