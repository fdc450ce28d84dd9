import type { PlanBoardView } from '@/lib/queries/plans';

export type BoardGroup = { key: string; boards: PlanBoardView[]; first: PlanBoardView };

/** Boards cut the same way (same source length, same pieces in the same order, same end) shown once with a count. */
export function groupIdenticalBoards(boards: PlanBoardView[]): BoardGroup[] {
  const groups = new Map<string, BoardGroup>();
  for (const board of boards) {
    const key = JSON.stringify([
      board.sectionId,
      board.source,
      board.source === 'offcut' ? board.offcutId : board.lengthMm,
      board.trimMm,
      board.pieces.map((p) => [p.lengthMm, p.cutMm, p.label]),
      board.fullLength,
      board.remainderMm,
      board.keepRemainder,
    ]);
    const group = groups.get(key);
    if (group) group.boards.push(board);
    else groups.set(key, { key, boards: [board], first: board });
  }
  return [...groups.values()];
}

/** New stock boards per length, and offcuts, for one section. */
export function countBoardsByLength(boards: PlanBoardView[]) {
  const counts = new Map<string, { source: 'stock' | 'offcut'; lengthMm: number; count: number }>();
  for (const b of boards) {
    const key = b.source === 'offcut' ? 'offcut' : `s${b.lengthMm}`;
    const entry = counts.get(key) ?? {
      source: b.source,
      lengthMm: b.source === 'offcut' ? 0 : b.lengthMm,
      count: 0,
    };
    entry.count += 1;
    counts.set(key, entry);
  }
  return [...counts.values()].sort(
    (a, b) => Number(a.source === 'offcut') - Number(b.source === 'offcut') || b.lengthMm - a.lengthMm,
  );
}
