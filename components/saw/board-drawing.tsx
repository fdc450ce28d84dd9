// A to-scale side view of one board: trim, pieces, kerfs and what is left, with the next cut marked.
// Same code as the plan and the cut sheet: pieces in green, a kept remainder dotted, scrap hatched.
import { BoardPatterns, INK, PIECE_FILLS } from '@/components/plans/board-patterns';
import { actualCutMm } from '@/lib/plans/cut-words';
import type { SawBoard } from '@/lib/queries/saw';

const W = 1000;
const H = 56;

export function BoardDrawing({
  board,
  kerfMm,
  nextCut,
}: {
  board: SawBoard;
  kerfMm: number;
  nextCut: number | null;
}) {
  const x = (mm: number) => (mm / board.lengthMm) * W;
  const start = board.trimMm > 0 ? board.trimMm + kerfMm : 0; // the squared end
  const lastEnd = board.pieces.length ? start + board.pieces[board.pieces.length - 1].markMm : start;
  const remainderStart = Math.min(board.lengthMm, lastEnd + (board.remainderMm > 0 ? kerfMm : 0));
  const done = nextCut ?? board.pieces.length;
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      preserveAspectRatio="none"
      className="h-16 w-full rounded border-2 border-bark"
      role="img"
      aria-label={`Board ${board.lengthMm} mm with ${board.pieces.length} pieces`}
      data-testid="board-drawing"
    >
      <BoardPatterns prefix="saw" />
      <rect x={0} y={0} width={W} height={H} fill="white" />
      {board.trimMm > 0 && (
        <rect x={0} y={0} width={Math.max(x(board.trimMm), 6)} height={H} fill="url(#saw-scrap)" />
      )}
      {board.pieces.map((p, i) => (
        <g key={i}>
          <rect
            x={x(start + p.markMm - actualCutMm(p))}
            y={0}
            width={x(actualCutMm(p))}
            height={H}
            fill={PIECE_FILLS[i % 2]}
            opacity={i < done ? 0.45 : 1}
            stroke={INK}
            strokeWidth={2}
          />
          {nextCut === i && <rect x={x(start + p.markMm) - 4} y={0} width={8} height={H} fill="#1d5545" />}
        </g>
      ))}
      {board.remainderMm > 0 && (
        <rect
          x={x(remainderStart)}
          y={0}
          width={W - x(remainderStart)}
          height={H}
          fill={`url(#saw-${board.keepRemainder ? 'kept' : 'scrap'})`}
          stroke={INK}
          strokeWidth={2}
          data-testid={board.keepRemainder ? 'drawing-kept' : 'drawing-scrap'}
        />
      )}
    </svg>
  );
}
