// Every board of the plan with its state; tap one to cut it out of order.
import { formatLength, type DisplayUnit } from '@/lib/units';
import type { SawBoard } from '@/lib/queries/saw';
import { cn } from '@/lib/cn';
import { TagCode } from './tag-code';

const STATE = { pending: 'to cut', done: 'cut', defective: 'bad, not cut' } as const;

export function BoardList({
  boards,
  current,
  unit,
  onPick,
}: {
  boards: SawBoard[];
  current: number | null;
  unit: DisplayUnit;
  onPick: (boardNo: number) => void;
}) {
  return (
    <ol className="grid gap-2" aria-label="Boards" data-testid="board-list">
      {boards.map((b) => (
        <li key={b.boardNo}>
          <button
            type="button"
            onClick={() => onPick(b.boardNo)}
            data-testid={`board-${b.boardNo}`}
            data-status={b.status}
            aria-current={b.boardNo === current ? 'step' : undefined}
            className={cn(
              'flex min-h-12 w-full items-center gap-3 rounded-lg border-2 px-3 text-left text-base',
              b.boardNo === current ? 'border-spruce bg-spruce-light font-bold' : 'border-grain bg-white',
              b.status === 'done' && 'text-bark-soft',
              b.status === 'defective' && 'border-brick text-brick',
            )}
          >
            <span className="w-7 font-bold">{b.boardNo}</span>
            <span className="flex-1 leading-tight">
              <span className="block">
                {b.source === 'offcut' && b.offcut ? (
                  <>
                    Offcut <TagCode tag={b.offcut.tag} />
                  </>
                ) : (
                  'New stock'
                )}
              </span>
              <span className="block text-sm">
                {formatLength(b.lengthMm, unit, { withUnit: true })} · {b.pieces.length}{' '}
                {b.pieces.length === 1 ? 'piece' : 'pieces'}
              </span>
            </span>
            <span className="text-right text-sm font-semibold uppercase">{STATE[b.status]}</span>
          </button>
        </li>
      ))}
    </ol>
  );
}
