// What to fetch, the trim, each piece by its length (marks as the tape's aid), and what is left.
import { sawLength } from './format-saw-length';
import { angleLine } from '@/lib/plans/angle-line';
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
  const from = board.source === 'offcut' ? 'the sawn end' : 'the squared end';
  return (
    <ol className="space-y-2" data-testid="cut-list">
      <li className="flex min-h-12 flex-wrap items-center gap-x-3 rounded-lg border-2 border-grain bg-white px-3 text-lg">
        {board.trimMm > 0 ? (
          <>
            <span className="w-8 font-bold">0</span>
            <span className="flex-1 font-semibold">Square the end: trim {len(board.trimMm)}</span>
          </>
        ) : (
          <span className="flex-1 font-semibold" data-testid="measure-from">
            Measure from {from}
          </span>
        )}
        <span className="text-base text-bark-soft">Saw on the waste side of each mark.</span>
      </li>
      {board.pieces.map((p, i) => {
        const state = board.status !== 'pending' || i < nextCut ? 'done' : i === nextCut ? 'next' : 'todo';
        const angle = angleLine(p, len);
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
              <span className="block font-mono text-4xl font-bold text-bark" data-testid="piece-length">
                {len(p.lengthMm)}
              </span>
              <span className="block text-xl font-semibold">
                {p.label || 'piece'}
                {p.marks ? ` · ${p.marks}` : ''}
              </span>
              {angle && (
                <span className="block text-lg font-bold text-brick" data-testid="piece-angle">
                  {angle}
                </span>
              )}
            </span>
            <span className="text-right text-sm text-bark-soft">
              with a tape: mark at
              <span className="block font-mono text-lg font-semibold">{len(p.markMm)}</span>
              from {from}
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
      {board.section.treated && (
        <span className="block text-base font-semibold">
          Wet treated timber: staple the tag on, or write the tag on the end in timber crayon.
        </span>
      )}
    </p>
  ) : (
    <p className="rounded-lg bg-brick px-4 py-3 text-xl font-bold text-white" data-testid="left-over">
      Scrap {len}
      {board.section.treated
        ? ' — treated: into the treated-waste skip; never burnt, never bedding, mulch or compost'
        : ''}
      .
    </p>
  );
}
