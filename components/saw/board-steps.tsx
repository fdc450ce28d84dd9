// What to fetch, the trim, each piece by its length (marks as the tape's aid), and what is left.
import { formatLength, type DisplayUnit } from '@/lib/units';
import { angleLine } from '@/lib/plans/angle-line';
import { actualCutMm, cutDiffers, FULL_LENGTH_WORDS } from '@/lib/plans/cut-words';
import type { SawBoard } from '@/lib/queries/saw';
import { cn } from '@/lib/cn';
import { TagCode } from './tag-code';

export function FetchLine({ board, unit }: { board: SawBoard; unit: DisplayUnit }) {
  const len = (mm: number) => formatLength(mm, unit, { withUnit: true });
  return (
    <p className="text-2xl font-bold text-bark" data-testid="fetch-line">
      {board.source === 'offcut' && board.offcut ? (
        <>
          Fetch offcut <TagCode tag={board.offcut.tag} className="rounded bg-amber px-2 text-white" /> from{' '}
          {board.offcut.location || 'the rack'}
          <span className="block text-lg font-semibold text-bark-soft">
            {board.section.name} · {len(board.lengthMm)} · no trim
          </span>
        </>
      ) : (
        <>
          Fetch new stock: {len(board.lengthMm)}
          <span className="block text-lg font-semibold text-bark-soft">
            {board.section.name}
            {board.fullLength ? ` · ${FULL_LENGTH_WORDS}` : ''}
          </span>
        </>
      )}
    </p>
  );
}

export function CutList({ board, unit, nextCut }: { board: SawBoard; unit: DisplayUnit; nextCut: number }) {
  const len = (mm: number) => formatLength(mm, unit, { withUnit: true });
  // New stock of only nominal pieces is not trimmed: its factory end is accepted.
  const from =
    board.source === 'offcut' ? 'the sawn end' : board.trimMm > 0 ? 'the squared end' : 'the factory end';
  if (board.fullLength) return <FullLengthStep board={board} unit={unit} />;
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
        // A bad board's pieces were never cut: they show as not cut, not struck through.
        const state =
          board.status === 'defective'
            ? 'not-cut'
            : board.status === 'done' || i < nextCut
              ? 'done'
              : i === nextCut
                ? 'next'
                : 'todo';
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
              (state === 'todo' || state === 'not-cut') && 'border-grain bg-white',
            )}
          >
            <span className="text-lg font-bold">{i + 1}</span>
            <span>
              <span className="block font-mono text-4xl font-bold text-bark" data-testid="piece-length">
                {len(actualCutMm(p))}
              </span>
              {cutDiffers(p) && (
                <span className="block text-lg font-semibold text-spruce" data-testid="piece-listed">
                  nominal {len(p.lengthMm)}: cut to {len(actualCutMm(p))}
                </span>
              )}
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

/** A board sold whole: no trim and no cut; the operator checks it and hands it over. */
function FullLengthStep({ board, unit }: { board: SawBoard; unit: DisplayUnit }) {
  const piece = board.pieces[0];
  return (
    <ol className="space-y-2" data-testid="cut-list">
      <li
        className="rounded-lg border-2 border-spruce bg-spruce-light px-3 py-2"
        data-testid="full-length-step"
      >
        <span className="block text-3xl font-bold text-bark">
          {FULL_LENGTH_WORDS[0].toUpperCase() + FULL_LENGTH_WORDS.slice(1)}
        </span>
        <span className="block text-xl font-semibold">
          {piece?.label || 'piece'} {formatLength(board.lengthMm, unit, { withUnit: true })}
          {piece?.marks ? ` · ${piece.marks}` : ''}: check the board for splits and shakes, then hand it over
          as it is.
        </span>
      </li>
    </ol>
  );
}

export function LeftOver({ board, unit }: { board: SawBoard; unit: DisplayUnit }) {
  if (board.remainderMm <= 0)
    return (
      <p className="text-lg font-semibold" data-testid="left-over">
        Nothing left over.
      </p>
    );
  const len = formatLength(board.remainderMm, unit, { withUnit: true });
  return board.keepRemainder ? (
    <p className="rounded-lg bg-amber px-4 py-2 text-xl font-bold text-white" data-testid="left-over">
      Keep {len}: it gets a tag when you confirm — label it and rack it.
      {board.section.treated && (
        <span className="block text-base font-semibold">
          Wet treated timber: staple the tag on, or write the tag on the end in timber crayon.
        </span>
      )}
    </p>
  ) : (
    <p className="rounded-lg bg-brick px-4 py-2 text-xl font-bold text-white" data-testid="left-over">
      Scrap {len}
      {board.section.treated
        ? ' — treated: into the treated-waste skip; never burnt, never bedding, mulch or compost'
        : ''}
      .
    </p>
  );
}
