import { eq } from 'drizzle-orm';
import type { Db } from '@/db';
import { sections } from '@/db/schema';

/** Section ids of the demo yard by code, so tests do not depend on insert order. */
export async function sectionIdOf(db: Db, code: string): Promise<number> {
  const [row] = await db.select({ id: sections.id }).from(sections).where(eq(sections.code, code));
  if (!row) throw new Error(`demo section ${code} missing`);
  return row.id;
}

/** A small lean-to: three walls (back, front and a sloped side), a door in the side, and a roof. */
export function leanToPanels(stud: number, rafter: number) {
  return [
    {
      kind: 'wall',
      id: 'back',
      name: 'back wall',
      sectionId: stud,
      length: 2400,
      height: 2200,
      centres: 400,
    },
    {
      kind: 'wall',
      id: 'front',
      name: 'front wall',
      sectionId: stud,
      length: 2400,
      height: 1900,
      centres: 400,
    },
    {
      kind: 'sloped_wall',
      id: 'side',
      name: 'side wall',
      sectionId: stud,
      length: 1500,
      lowHeight: 1900,
      highHeight: 2200,
      centres: 400,
    },
    {
      kind: 'opening',
      id: 'door',
      name: 'door opening',
      wallId: 'side',
      position: 450,
      width: 700,
      height: 1650,
    },
    {
      kind: 'roof',
      id: 'roof',
      name: 'roof',
      sectionId: rafter,
      span: 1500,
      rise: 300,
      centres: 400,
      length: 2400,
    },
  ];
}
