// A to-scale side view of one board: trim, pieces, kerfs and what is left, with the next cut marked.
import type { SawBoard } from '@/lib/queries/saw';

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
  const W = board.lengthMm;
  const start = board.trimMm > 0 ? board.trimMm + kerfMm : 0; // the squared end
  const lastEnd = board.pieces.length ? start + board.pieces[board.pieces.length - 1].markMm : start;
  const remainderStart = Math.min(W, lastEnd + (board.remainderMm > 0 ? kerfMm : 0));
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      preserveAspectRatio="none"
      className="h-16 w-full rounded border-2 border-bark"
      role="img"
      aria-label={`Board ${board.lengthMm} mm with ${board.pieces.length} pieces`}
      data-testid="board-drawing"
    >
      <rect x={0} y={0} width={W} height={H} fill="#efe4d0" />
      {board.trimMm > 0 && (
        <rect x={0} y={0} width={Math.max(board.trimMm, W / 150)} height={H} fill="#a3271f" />
      )}
      {board.pieces.map((p, i) => {
        const x = start + p.markMm - p.lengthMm;
        const isNext = nextCut === i;
        return (
          <g key={i}>
            <rect
              x={x}
              y={0}
              width={p.lengthMm}
              height={H}
              fill={isNext ? '#d7e8e1' : i < (nextCut ?? board.pieces.length) ? '#d9c6a5' : '#f8f3ea'}
              stroke="#231a12"
              strokeWidth={W / 400}
            />
            {isNext && (
              <rect x={start + p.markMm - W / 250} y={0} width={W / 125} height={H} fill="#1d5545" />
            )}
          </g>
        );
      })}
      {board.remainderMm > 0 && (
        <rect
          x={remainderStart}
          y={0}
          width={W - remainderStart}
          height={H}
          fill={board.keepRemainder ? '#b86a12' : '#a3271f'}
          opacity={0.85}
        />
      )}
    </svg>
  );
}
