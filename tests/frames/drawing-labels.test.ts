import { describe, expect, it } from 'vitest';
import { leanToPanels } from '@/lib/demo-yard/frames';
import { demoSections } from '@/lib/demo-yard/demo-yard';
import { frameSchedulePanelSchema, layoutPanel, type SectionDimensions } from '@/lib/frames';
import { boxesOverlap, labelSizes, placeDrawingLabels, type PlacedLabel } from '@/lib/frames/place-labels';
import { parsePanels, sections as testSections } from './helpers';

// The demo lean-to with the demo yard's sections, numbered by their place in the list.
const ids = new Map(demoSections.map((s, k) => [s.code, k + 1]));
const demoSectionSizes = new Map<number, SectionDimensions>(
  demoSections.map((s, k) => [k + 1, { thickness: s.thicknessMm, width: s.widthMm }]),
);
const demoPanels = leanToPanels((code) => ids.get(code)!).map((p) => frameSchedulePanelSchema.parse(p));

function overlaps(labels: PlacedLabel[]) {
  const pairs: string[] = [];
  labels.forEach((a, i) =>
    labels.slice(i + 1).forEach((b) => {
      if (boxesOverlap(a, b)) pairs.push(`${a.text} × ${b.text}`);
    }),
  );
  return pairs;
}

describe('drawing labels', () => {
  it('on every panel of the demo lean-to, no mark or dimension overlaps another', () => {
    for (const panel of demoPanels) {
      const layout = layoutPanel(panel, { sections: demoSectionSizes, panels: demoPanels });
      const { marks, dimensions } = placeDrawingLabels(layout, labelSizes(layout.bounds));
      expect(marks.length, panel.name).toBe(layout.shapes.filter((s) => s.mark).length);
      expect(overlaps([...marks, ...dimensions]), panel.name).toEqual([]);
    }
  });

  it('keeps apart the marks of a crowded wall: studs, full-height studs and opening studs side by side', () => {
    const panels = parsePanels([
      {
        kind: 'wall',
        id: 'w',
        name: 'wall',
        sectionId: 1,
        length: 1800,
        height: 2000,
        centres: 300,
        nogginRows: 2,
      },
      {
        kind: 'opening',
        name: 'hatch',
        wallId: 'w',
        position: 350,
        width: 500,
        height: 500,
        sillHeight: 900,
      },
    ]);
    const layout = layoutPanel(panels[0], { sections: testSections, panels });
    const { marks, dimensions } = placeDrawingLabels(layout, labelSizes(layout.bounds));
    expect(marks.length).toBeGreaterThan(15);
    expect(overlaps([...marks, ...dimensions])).toEqual([]);
  });
});
