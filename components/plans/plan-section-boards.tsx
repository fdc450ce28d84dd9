'use client';

import { useDisplayUnit, useFormatLength } from '@/components/units/display-unit';
import { cutLengthText, FULL_LENGTH_WORDS } from '@/lib/plans/cut-words';
import type { PlanBoardView } from '@/lib/queries/plans';
import { BoardDiagram } from './board-diagram';
import { groupIdenticalBoards } from '@/lib/plans/group-boards';
import { BoardCutNotes } from './board-cut-notes';

/** One section's boards in saw order, identical boards drawn once with their count. */
export function PlanSectionBoards({
  name,
  boards,
  kerfMm,
  offcutTags,
}: {
  name: string;
  boards: PlanBoardView[];
  kerfMm: number;
  offcutTags: Record<number, string>;
}) {
  const fmt = useFormatLength();
  const { format } = useDisplayUnit();
  const groups = groupIdenticalBoards(boards);
  return (
    <section className="break-inside-avoid-page space-y-3" data-testid="plan-section">
      <h3 className="text-lg font-bold">
        {name}{' '}
        <span className="font-normal text-bark-soft">
          · {boards.length} board{boards.length === 1 ? '' : 's'}
        </span>
      </h3>
      <ol className="space-y-4">
        {groups.map(({ key, boards: same, first }) => {
          const source =
            first.source === 'offcut'
              ? `Offcut ${first.offcutId ? (offcutTags[first.offcutId] ?? `#${first.offcutId}`) : ''}`
              : 'New stock';
          const boardNos = same.map((b) => b.boardNo).join(', ');
          const heading = `${same.length} × ${source} ${fmt(first.lengthMm)}`;
          return (
            <li key={key} className="break-inside-avoid">
              <p className="mb-1 flex flex-wrap justify-between gap-2 text-sm">
                <span className="font-semibold" data-testid="board-group-heading">
                  {heading}
                </span>
                {first.fullLength && (
                  <span
                    className="rounded bg-spruce-light px-2 font-semibold text-spruce"
                    data-testid="full-length"
                  >
                    {FULL_LENGTH_WORDS}
                  </span>
                )}
                <span className="text-bark-soft">
                  board{same.length > 1 ? 's' : ''} {boardNos}
                </span>
              </p>
              <BoardDiagram
                board={{
                  lengthMm: first.lengthMm,
                  trimMm: first.trimMm,
                  kerfMm,
                  pieces: first.pieces,
                  remainderMm: first.remainderMm,
                  keepRemainder: first.keepRemainder,
                }}
                format={format}
                title={`${heading}${first.fullLength ? `, ${FULL_LENGTH_WORDS}` : ''}: ${first.pieces.map((p) => `${p.label || 'piece'} ${cutLengthText(p, fmt)}`).join(', ')}; ${first.keepRemainder ? 'kept' : 'scrap'} ${fmt(first.remainderMm)}`}
              />
              <BoardCutNotes pieces={first.pieces} format={fmt} />
            </li>
          );
        })}
      </ol>
    </section>
  );
}
