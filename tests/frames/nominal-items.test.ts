import { describe, expect, it } from 'vitest';
import { generateFrameItems } from '@/lib/frames';
import { toFrameJobLines } from '@/lib/frames-data/frame-line-items';
import { parsePanels, sections } from './helpers';

// Cladding boards and common studs are sold by nominal length (factory ends, a few mm short is
// fine); plates, opening pieces and joinery are cut exact: common practice, no published source.
describe('frame schedules: nominal and exact pieces', () => {
  const panels = parsePanels([
    { kind: 'wall', id: 'w', name: 'back wall', sectionId: 1, length: 3000, height: 2100, centres: 600 },
    { kind: 'opening', id: 'o', name: 'door', wallId: 'w', position: 1000, width: 760, height: 1850 },
    { kind: 'door_leaf', name: 'leaf', sectionId: 3, boardSectionId: 2, openingId: 'o', boardCover: 115 },
    { kind: 'cladding', name: 'clad', sectionId: 2, width: 2400, height: 1000, cover: 110, wastePercent: 10 },
  ]);
  const lines = toFrameJobLines(generateFrameItems(panels, { sections }).items);
  const nominalOf = (pattern: RegExp) => lines.filter((l) => pattern.test(l.label)).map((l) => l.nominal);

  it('sends cladding boards, spares included, and common studs as nominal', () => {
    expect(nominalOf(/^clad (spare )?board/).length).toBeGreaterThan(1);
    expect(nominalOf(/^clad (spare )?board/).every(Boolean)).toBe(true);
    expect(nominalOf(/^back wall stud/)).toEqual([true]);
  });

  it('sends plates, opening pieces and the door leaf exact', () => {
    const exact = lines.filter((l) => !/^(clad (spare )?board|back wall stud)/.test(l.label));
    expect(exact.length).toBeGreaterThan(3);
    expect(exact.filter((l) => l.nominal)).toEqual([]);
    expect(nominalOf(/^leaf /).every((n) => n === false)).toBe(true);
  });

  it('keeps studs with an angled top exact', () => {
    const sloped = parsePanels([
      {
        kind: 'sloped_wall',
        name: 'lean-to',
        sectionId: 1,
        length: 2400,
        lowHeight: 2000,
        highHeight: 2300,
        centres: 600,
      },
    ]);
    const studs = toFrameJobLines(generateFrameItems(sloped, { sections }).items).filter((l) =>
      /stud/.test(l.label),
    );
    expect(studs.length).toBeGreaterThan(1);
    expect(studs.every((l) => !l.nominal && l.angleTenths)).toBe(true);
  });
});
