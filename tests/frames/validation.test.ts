import { describe, expect, it } from 'vitest';
import { validateFrameSchedule, type FrameSchedulePanelInput } from '@/lib/frames';
import { sections } from './helpers';

const wall = {
  kind: 'wall',
  id: 'w',
  name: 'back wall',
  sectionId: 1,
  length: 2400,
  height: 2200,
  centres: 400,
} as const;
const check = (panels: FrameSchedulePanelInput[] | unknown[]) =>
  validateFrameSchedule({ unit: 'mm', panels }, { sections });
const paths = (panels: unknown[]) => {
  const r = check(panels);
  return r.ok ? [] : r.errors.map((e) => e.path);
};

describe('frame schedule validation', () => {
  it('accepts a good lean-to', () => {
    const r = check([
      wall,
      {
        kind: 'sloped_wall',
        id: 's',
        name: 'side',
        sectionId: 1,
        length: 1800,
        lowHeight: 1900,
        highHeight: 2200,
        centres: 400,
      },
      { kind: 'opening', id: 'd', name: 'door', wallId: 's', position: 400, width: 800, height: 1800 },
      { kind: 'door_leaf', name: 'leaf', sectionId: 3, boardSectionId: 2, openingId: 'd', boardCover: 115 },
    ]);
    expect(r.errors).toEqual([]);
    expect(r.ok).toBe(true);
  });

  it.each([
    [
      'a high side lower than the low side',
      {
        kind: 'sloped_wall',
        name: 's',
        sectionId: 1,
        length: 1800,
        lowHeight: 2200,
        highHeight: 1900,
        centres: 400,
      },
      'panels.1.highHeight',
    ],
    ['centres larger than the wall', { ...wall, id: 'x', length: 300 }, 'panels.1.centres'],
    [
      'an opening wider than its wall',
      { kind: 'opening', name: 'o', wallId: 'w', position: 0, width: 2500, height: 1000 },
      'panels.1.width',
    ],
    [
      'an opening past the wall end',
      { kind: 'opening', name: 'o', wallId: 'w', position: 2000, width: 800, height: 1000 },
      'panels.1.position',
    ],
    [
      'an opening taller than the wall',
      { kind: 'opening', name: 'o', wallId: 'w', position: 400, width: 800, height: 1800, sillHeight: 600 },
      'panels.1.height',
    ],
    [
      'an opening in no wall',
      { kind: 'opening', name: 'o', wallId: 'nope', position: 0, width: 800, height: 1000 },
      'panels.1.wallId',
    ],
    [
      'a roof with pitch and rise',
      { kind: 'roof', name: 'r', sectionId: 1, span: 2000, pitch: 10, rise: 300, centres: 600, length: 2400 },
      'panels.1.rise',
    ],
    [
      'a roof with neither',
      { kind: 'roof', name: 'r', sectionId: 1, span: 2000, centres: 600, length: 2400 },
      'panels.1.pitch',
    ],
    [
      'bearer centres wider than the base',
      {
        kind: 'base',
        name: 'b',
        sectionId: 1,
        length: 2400,
        width: 1200,
        joistCentres: 400,
        bearerCentres: 1500,
      },
      'panels.1.bearerCentres',
    ],
    [
      'clearance bigger than the opening',
      {
        kind: 'door_leaf',
        name: 'l',
        sectionId: 3,
        boardSectionId: 2,
        openingWidth: 150,
        openingHeight: 1900,
        clearanceWidth: 150,
        boardCover: 100,
      },
      'panels.1.clearanceWidth',
    ],
    [
      'a door leaf with no size',
      { kind: 'door_leaf', name: 'l', sectionId: 3, boardSectionId: 2, openingHeight: 1900, boardCover: 100 },
      'panels.1.openingWidth',
    ],
    [
      'cladding with no wall or size',
      { kind: 'cladding', name: 'c', sectionId: 2, cover: 110, height: 1000 },
      'panels.1.width',
    ],
    ['a repeated panel id', { ...wall }, 'panels.1.id'],
    ['a fractional length', { ...wall, id: 'x', length: 2400.5 }, 'panels.1.length'],
    ['a missing name', { ...wall, id: 'x', name: '' }, 'panels.1.name'],
    ['an unknown section', { ...wall, id: 'x', sectionId: 99 }, 'panels.1.sectionId'],
    ['an unknown kind', { kind: 'gazebo', name: 'g' }, 'panels.1.kind'],
  ])('rejects %s at its field', (_what, panel, path) => {
    expect(paths([wall, panel])).toContain(path);
  });

  it('gives clear messages', () => {
    const r = check([
      wall,
      {
        kind: 'sloped_wall',
        name: 's',
        sectionId: 1,
        length: 1800,
        lowHeight: 2200,
        highHeight: 1900,
        centres: 400,
      },
    ]);
    expect(r.ok).toBe(false);
    expect(r.errors).toContainEqual({
      path: 'panels.1.highHeight',
      message: 'High side (1900 mm) is lower than the low side (2200 mm)',
    });
    const frac = check([{ ...wall, length: 2400.5 }]);
    expect(frac.errors[0].message).toBe('Wall length must be whole millimetres');
  });

  it('rejects an empty schedule and a bad unit', () => {
    expect(validateFrameSchedule({ unit: 'mm', panels: [] }).errors.map((e) => e.path)).toEqual(['panels']);
    expect(validateFrameSchedule({ unit: 'cubits', panels: [wall] }).errors.map((e) => e.path)).toEqual([
      'unit',
    ]);
  });
});
