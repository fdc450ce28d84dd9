import { describe, expect, it } from 'vitest';
import {
  findGeometryIssues,
  frameSchedulePanelSchema,
  generateFrameItems,
  getCourseBands,
  layoutPanel,
  type FrameItem,
  type FrameSchedulePanelInput,
  type SectionDimensions,
} from '@/lib/frames';
import { parsePanels, sections as testSections } from './helpers';

// Invented test sections, plus 4 = 38×89 framing for an end wall of a different depth.
const sections = new Map<number, SectionDimensions>([...testSections, [4, { thickness: 38, width: 89 }]]);
const total = (items: FrameItem[], label: string) =>
  items.filter((i) => i.label.startsWith(label)).reduce((n, i) => n + i.quantity, 0);
const one = (items: FrameItem[], label: string) => {
  const found = items.filter((i) => i.label.startsWith(label));
  expect(found, label).toHaveLength(1);
  return found[0];
};

// Plates lie flat, so a wall is as deep as its section is wide: 100 mm for 47×100, 89 mm for 38×89.
describe('corners counted once', () => {
  const box = (backSection: number) =>
    parsePanels([
      {
        kind: 'wall',
        id: 'front',
        name: 'front wall',
        sectionId: 1,
        length: 2400,
        height: 2000,
        centres: 400,
        topPlate: 'single',
      },
      {
        kind: 'wall',
        id: 'back',
        name: 'back wall',
        sectionId: backSection,
        length: 2400,
        height: 2000,
        centres: 400,
        topPlate: 'single',
      },
      {
        kind: 'wall',
        id: 'left',
        name: 'left wall',
        sectionId: 1,
        length: 1800,
        height: 2000,
        centres: 400,
        topPlate: 'single',
        startWallId: 'front',
        endWallId: 'back',
      },
      {
        kind: 'wall',
        id: 'right',
        name: 'right wall',
        sectionId: 1,
        length: 1800,
        height: 2000,
        centres: 400,
        topPlate: 'single',
        startWallId: 'front',
        endWallId: 'back',
      },
    ]);

  it('fits the side walls between the front and back walls: plates shortened by both end walls', () => {
    const { items } = generateFrameItems(box(1), { sections });
    // 1800 outside − 100 (front wall depth) − 100 (back wall depth) = 1600.
    expect(one(items, 'left wall bottom plate')).toMatchObject({ length: 1800 - 100 - 100, quantity: 1 });
    expect(one(items, 'left wall top plate').length).toBe(1600);
    expect(one(items, 'front wall bottom plate').length).toBe(2400);
    // Studs, common practice: ceil(1600 / 400) + 1 = 5 on the framed length, not 6 on the outside one.
    expect(total(items, 'left wall stud')).toBe(Math.ceil(1600 / 400) + 1);
    // Every plate row goes round the box once: 2 × 2400 + 2 × 1600 = 8000 = perimeter 8400 − 4 corners × 100.
    const bottomRun = items
      .filter((i) => i.label.includes('bottom plate'))
      .reduce((n, i) => n + i.length * i.quantity, 0);
    expect(bottomRun).toBe(2 * (2400 + 1800) - 4 * 100);
    expect(one(items, 'left wall bottom plate').note).toBe('fits between front wall and back wall');
  });

  it('takes each end wall’s own depth', () => {
    const { items } = generateFrameItems(box(4), { sections });
    expect(one(items, 'right wall bottom plate').length).toBe(1800 - 100 - 89); // 1611
  });

  it('a sloped side wall keeps its slope between the end walls; its raking plate blank is at the long point', () => {
    const panels = parsePanels([
      {
        kind: 'wall',
        id: 'front',
        name: 'front wall',
        sectionId: 1,
        length: 2400,
        height: 1900,
        centres: 400,
      },
      { kind: 'wall', id: 'back', name: 'back wall', sectionId: 1, length: 2400, height: 2200, centres: 400 },
      {
        kind: 'sloped_wall',
        id: 'side',
        name: 'side',
        sectionId: 1,
        length: 1500,
        lowHeight: 1900,
        highHeight: 2200,
        centres: 400,
        topPlate: 'single',
        startWallId: 'front',
        endWallId: 'back',
      },
    ]);
    const { items } = generateFrameItems(panels, { sections });
    expect(one(items, 'side bottom plate').length).toBe(1300); // 1500 − 100 − 100
    // The slope 300 in 1500 holds: framed ends at 1900 + 100 × 0.2 = 1920 and 1900 + 1400 × 0.2 = 2180.
    const rise = 2180 - 1920;
    const angle = Math.atan(300 / 1500);
    // Trigonometry: edge length √(1300² + 260²) plus depth 47 × tan(angle) for the parallel plumb cuts.
    const blank = Math.hypot(1300, rise) + 47 * Math.tan(angle);
    expect(one(items, 'side top plate').length).toBe(Math.round(blank)); // 1335
    const layout = layoutPanel(panels[2], { sections, panels });
    expect(layout.dimensions[0].value).toBe(1300);
    expect(layout.dimensions[1].value).toBe(1920);
    expect(layout.dimensions[2].value).toBe(2180);
  });

  it('refuses an end wall that is missing, not a wall, or the wall itself', () => {
    const panels = (
      [
        {
          kind: 'wall',
          id: 'a',
          name: 'a',
          sectionId: 1,
          length: 2400,
          height: 2000,
          centres: 400,
          startWallId: 'a',
          endWallId: 'nope',
        },
        { kind: 'free', id: 'f', name: 'f', sectionId: 1, label: 'x', length: 500, quantity: 1 },
        {
          kind: 'wall',
          id: 'b',
          name: 'b',
          sectionId: 1,
          length: 2400,
          height: 2000,
          centres: 400,
          startWallId: 'f',
        },
      ] satisfies FrameSchedulePanelInput[]
    ).map((p) => frameSchedulePanelSchema.parse(p));
    const paths = findGeometryIssues(panels).map((i) => i.path.join('.'));
    expect(paths).toEqual(['panels.0.startWallId', 'panels.0.endWallId', 'panels.2.startWallId']);
  });
});

describe('cladding', () => {
  it('rips the two edge boards evenly instead of leaving a thin strip on one side', () => {
    // 2000 / 110 → 19 courses (common practice); 17 full, and (2000 − 17 × 110) / 2 = 65 mm at each edge.
    const bands = getCourseBands(2000, 110);
    expect(bands).toHaveLength(19);
    expect(bands[0]).toEqual([0, 65]);
    expect(bands[18]).toEqual([1935, 2000]);
    expect(bands.slice(1, 18).every(([a, b]) => b - a === 110)).toBe(true);
    expect(getCourseBands(2200, 110)).toHaveLength(20); // divides exactly: no rip
    expect(getCourseBands(2200, 110).every(([a, b]) => b - a === 110)).toBe(true);
    expect(getCourseBands(90, 110)).toEqual([[0, 90]]);
  });

  const wallWithWindow = (direction: 'horizontal' | 'vertical') =>
    parsePanels([
      { kind: 'wall', id: 'w', name: 'wall', sectionId: 1, length: 2400, height: 2000, centres: 400 },
      {
        kind: 'opening',
        id: 'win',
        name: 'window',
        wallId: 'w',
        position: 800,
        width: 600,
        height: 900,
        sillHeight: 900,
      },
      { kind: 'cladding', name: 'clad', sectionId: 2, wallId: 'w', cover: 110, direction, wastePercent: 0 },
    ]);
  const coverWidth = (i: FrameItem) => Number(/rip to (\d+) mm cover/.exec(i.note ?? '')?.[1] ?? 110);

  for (const direction of ['horizontal', 'vertical'] as const)
    it(`deducts a window opening from its wall (${direction} boards): area covered = wall − opening`, () => {
      const { items } = generateFrameItems(wallWithWindow(direction), { sections });
      const boards = items.filter((i) => i.label.startsWith('clad board'));
      const area = boards.reduce((n, i) => n + i.quantity * i.length * coverWidth(i), 0);
      expect(area).toBe(2400 * 2000 - 600 * 900);
    });

  it('stops boards at the window and cuts the boards above and below it to its width', () => {
    const { items } = generateFrameItems(wallWithWindow('horizontal'), { sections });
    const boards = items.filter((i) => i.label.startsWith('clad board'));
    const count = (length: number) =>
      boards.filter((b) => b.length === length).reduce((n, b) => n + b.quantity, 0);
    // Courses 65, then 110 each: [835, 945] up to [1715, 1825] cross the window (900–1800), 9 of 19.
    expect(count(2400)).toBe(19 - 9);
    expect(count(800)).toBe(9); // wall start to the window
    expect(count(2400 - 1400)).toBe(9); // window to the wall end
    expect(boards.find((b) => b.note === 'rip to 65 mm cover; below window')).toMatchObject({
      length: 600,
      quantity: 1,
    });
    expect(boards.find((b) => b.note === 'rip to 25 mm cover; above window')).toMatchObject({
      length: 600,
      quantity: 1,
    });
  });
});
