// A demo frame schedule: an invented customer's lean-to, the kind of sketch yard hands are given.
import type { Db } from '@/db/types';
import { frameSchedulePanelSchema, type FrameSchedulePanelInput } from '@/lib/frames';
import * as schema from '@/db/schema';

type SeedTx = Pick<Db, 'insert'>;

/** Panels by section code; ids let the opening, door and cladding find their wall. */
export function leanToPanels(section: (code: string) => number): FrameSchedulePanelInput[] {
  const stud = section('T47100');
  return [
    {
      kind: 'wall',
      id: 'back',
      name: 'back wall',
      sectionId: stud,
      length: 2400,
      height: 2200,
      centres: 400,
      nogginRows: 1,
    },
    {
      kind: 'wall',
      id: 'front',
      name: 'front wall',
      sectionId: stud,
      length: 2400,
      height: 1900,
      centres: 400,
      nogginRows: 1,
    },
    {
      kind: 'sloped_wall',
      id: 'left',
      name: 'left side',
      sectionId: stud,
      // Outside depth of the lean-to; the side is framed between the front and back walls.
      length: 1500,
      lowHeight: 1900,
      highHeight: 2200,
      centres: 400,
      startWallId: 'front',
      endWallId: 'back',
    },
    {
      kind: 'sloped_wall',
      id: 'right',
      name: 'right side',
      sectionId: stud,
      // Outside depth of the lean-to; the side is framed between the front and back walls.
      length: 1500,
      lowHeight: 1900,
      highHeight: 2200,
      centres: 400,
      startWallId: 'front',
      endWallId: 'back',
    },
    {
      kind: 'opening',
      id: 'door',
      name: 'side door',
      wallId: 'right',
      position: 450,
      width: 700,
      height: 1650,
    },
    {
      kind: 'door_leaf',
      id: 'leaf',
      name: 'door',
      sectionId: section('P18094'),
      boardSectionId: section('TG19125'),
      openingId: 'door',
      boardCover: 110,
    },
    {
      kind: 'roof',
      id: 'roof',
      name: 'roof',
      sectionId: section('T47150'),
      span: 1500,
      rise: 300,
      centres: 400,
      length: 2400,
      eavesOverhang: 150,
    },
    {
      kind: 'cladding',
      id: 'clad-front',
      name: 'front cladding',
      sectionId: section('SHP19125'),
      wallId: 'front',
      cover: 110,
    },
    {
      kind: 'cladding',
      id: 'clad-right',
      name: 'right side cladding',
      sectionId: section('SHP19125'),
      wallId: 'right',
      cover: 110,
    },
  ];
}

export async function seedDemoFrameSchedules(
  tx: SeedTx,
  { sectionIds, userId }: { sectionIds: Map<string, number>; userId: number },
) {
  const section = (code: string) => sectionIds.get(code)!;
  const panels = leanToPanels(section).map((p) => frameSchedulePanelSchema.parse(p));
  await tx.insert(schema.frameSchedules).values({
    name: 'Lean-to for Ines Marwood',
    customerName: 'Ines Marwood',
    unit: 'mm',
    panels,
    createdBy: userId,
  });
}
