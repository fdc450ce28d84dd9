import { describe, expect, it } from 'vitest';
import { generateFrameItems } from '@/lib/frames';
import { toFrameJobLines } from '@/lib/frames-data/frame-line-items';
import { parsePanels, sections } from './helpers';

const shed = () =>
  parsePanels([
    {
      kind: 'wall',
      id: 'w',
      name: 'side',
      sectionId: 1,
      length: 2400,
      height: 2100,
      centres: 600,
      topPlate: 'single',
    },
    {
      kind: 'opening',
      name: 'door',
      wallId: 'w',
      position: 600,
      width: 800,
      height: 1900,
      sillHeight: 0,
    },
  ]);

describe('piece names by region', () => {
  // UK words: head plate, sole plate, lintel, full-height and opening studs — common practice, no published source.
  it('a UK yard gets head and sole plates, a lintel and opening studs', () => {
    const labels = generateFrameItems(shed(), { sections, region: 'uk' }).items.map((i) => i.label);
    expect(labels).toEqual(
      expect.arrayContaining([
        'side head plate',
        expect.stringMatching(/^side sole plate/),
        'door lintel',
        'door opening stud',
        'door full-height stud',
      ]),
    );
    expect(labels.some((l) => /top plate|bottom plate|trimmer|king stud/.test(l))).toBe(false);
  });

  it('a North American yard keeps top and bottom plates, a head and trimmers', () => {
    const labels = generateFrameItems(shed(), { sections, region: 'na' }).items.map((i) => i.label);
    expect(labels).toEqual(
      expect.arrayContaining(['side top plate', expect.stringMatching(/^side bottom plate/), 'door head']),
    );
  });
});

describe('tiny pieces', () => {
  it('warns about a short stud above the lintel with the usual fix, naming its mark', () => {
    // Wall 2100 high less a 47 mm head plate; door 1900 high with a 100 mm lintel on top leaves
    // 2100 − 47 − 2000 = 53 mm for the short studs above the lintel.
    const { items, warnings } = generateFrameItems(shed(), { sections, region: 'uk', minPieceMm: 150 });
    const short = items.find((i) => i.label.startsWith('door short stud above lintel'));
    expect(short?.length).toBe(53);
    expect(warnings).toEqual(
      expect.arrayContaining([
        expect.stringMatching(
          new RegExp(
            `^${short!.mark.replace('.', '\\.')} door short stud above lintel.*53 mm.*deeper lintel.*packers`,
          ),
        ),
      ]),
    );
  });

  it('says nothing when no minimum is given', () => {
    expect(generateFrameItems(shed(), { sections }).warnings).toEqual([]);
  });
});

describe('schedule lines for a job', () => {
  it('keep the piece marks of every item summed into a line', () => {
    const items = generateFrameItems(shed(), { sections, region: 'uk' }).items;
    const lines = toFrameJobLines(items);
    const studs = lines.find((l) => l.label === 'side stud');
    expect(studs?.marks).toMatch(/^1\.\d+$/);
    for (const line of lines) expect(line.marks).toMatch(/^\d+\.\d+(, \d+\.\d+)*$/);
    const allMarks = lines.flatMap((l) => l.marks.split(', '));
    expect(new Set(allMarks)).toEqual(new Set(items.map((i) => i.mark)));
  });
});
