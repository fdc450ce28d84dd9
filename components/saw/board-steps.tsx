// What to fetch, the trim, each cut as a mark from the squared end, and what is left.
import { sawLength } from './format-saw-length';
import type { SawBoard } from '@/lib/queries/saw';
import { cn } from '@/lib/cn';

type Unit = 'mm' | 'imperial';

export function FetchLine({ board, unit }: { board: SawBoard; unit: Unit }) {
  const len = (mm: number) => sawLength(mm, unit);
  return (
    <p className="text-2xl font-bold text-bark" data-testid="fetch-line">
      {board.source === 'offcut' && board.offcut ? (
        <>
          Fetch offcut <span className="rounded bg-amber px-2 text-white">{board.offcut.tag}</span> from{' '}
          {board.offcut.location || 'the rack'}
          <span className="block text-lg font-semibold text-bark-soft">
            {board.section.name} · {len(board.lengthMm)} · no trim
          </span>
        </>
      ) : (
        <>
          Fetch new stock: {len(board.lengthMm)}
          <span className="block text-lg font-semibold text-bark-soft">{board.section.name}</span>
        </>
      )}
    </p>
  );
}

export function CutList({ board, unit, nextCut }: { board: SawBoard; unit: Unit; nextCut: number }) {
  const len = (mm: number) => sawLength(mm, unit);
  const totals = board.pieces.map((_, i) => board.pieces.slice(0, i + 1).reduce((n, p) => n + p.lengthMm, 0));
  return (
    <ol className="space-y-2" data-testid="cut-list">
      {board.trimMm > 0 && (
        <li className="flex min-h-12 items-center gap-3 rounded-lg border-2 border-grain bg-white px-3 text-lg">
          <span className="w-8 font-bold">0</span>
          <span className="flex-1 font-semibold">Square the end: trim {len(board.trimMm)}</span>
          <span className="text-sm text-bark-soft">measure every mark from the squared end</span>
        </li>
      )}
      {board.pieces.map((p, i) => {
        const state = board.status !== 'pending' || i < nextCut ? 'done' : i === nextCut ? 'next' : 'todo';
        return (
          <li
            key={i}
            data-testid={`cut-${i + 1}`}
            data-state={state}
            className={cn(
              'grid min-h-14 grid-cols-[2rem_1fr_auto] items-center gap-x-3 rounded-lg border-2 px-3 py-1',
              state === 'next' && 'border-spruce bg-spruce-light ring-4 ring-spruce/30',
              state === 'done' && 'border-grain bg-shaving text-bark-soft line-through decoration-2',
              state === 'todo' && 'border-grain bg-white',
            )}
          >
            <span className="text-lg font-bold">{i + 1}</span>
            <span>
              <span className="block text-sm font-semibold uppercase tracking-wide text-bark-soft">
                Mark at
              </span>
              <span className="font-mono text-4xl font-bold text-bark">{len(p.markMm)}</span>
            </span>
            <span className="text-right">
              <span className="block text-xl font-bold">
                {p.label || 'piece'} · {len(p.lengthMm)}
              </span>
              <span className="block text-sm text-bark-soft">running total of pieces {len(totals[i])}</span>
            </span>
          </li>
        );
      })}
    </ol>
  );
}

export function LeftOver({ board, unit }: { board: SawBoard; unit: Unit }) {
  if (board.remainderMm <= 0) return <p className="text-lg font-semibold">Nothing left over.</p>;
  const len = sawLength(board.remainderMm, unit);
  return board.keepRemainder ? (
    <p className="rounded-lg bg-amber px-4 py-3 text-xl font-bold text-white" data-testid="left-over">
      Keep {len}: it gets a tag when you confirm — label it and rack it.
    </p>
  ) : (
    <p className="rounded-lg bg-brick px-4 py-3 text-xl font-bold text-white" data-testid="left-over">
      Scrap {len}
      {board.section.treated ? ' — treated: never burn it' : ''}.
    </p>
  );
}
