// A kept remainder (or the sound part of a bad board) tagged and put on the rack.
import type { Tx } from '@/db';
import { offcuts } from '@/db/schema';
import { issueOffcutTag } from '@/lib/offcuts/issue-offcut-tags';
import { recordOffcutMovement } from '@/lib/offcuts/record-offcut-movement';

/** Where a new offcut waits until someone racks it; the label screen can change it. */
export const DEFAULT_OFFCUT_LOCATION = 'Rack intake';

export async function makeOffcut(
  tx: Tx,
  o: {
    sectionId: number;
    lengthMm: number;
    location?: string;
    origin: string;
    planId: number;
    jobId: number;
    userId: number;
    at: Date;
  },
) {
  const tag = await issueOffcutTag(tx);
  const [offcut] = await tx
    .insert(offcuts)
    .values({
      tag,
      sectionId: o.sectionId,
      lengthMm: o.lengthMm,
      location: o.location ?? DEFAULT_OFFCUT_LOCATION,
      status: 'available',
      origin: o.origin,
      originPlanId: o.planId,
      createdAt: o.at,
      updatedAt: o.at,
    })
    .returning();
  await recordOffcutMovement(tx, {
    at: o.at,
    kind: 'offcut_made',
    userId: o.userId,
    sectionId: o.sectionId,
    offcutId: offcut.id,
    lengthMm: o.lengthMm,
    planId: o.planId,
    jobId: o.jobId,
    reason: o.origin,
  });
  return offcut;
}
