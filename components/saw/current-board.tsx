// The board being cut: fetch, drawing, cuts, what is left, and the big buttons.
import { Button } from '@/components/ui/button';
import type { SawBoard } from '@/lib/queries/saw';
import { BoardDrawing } from './board-drawing';
import { CutList, FetchLine, LeftOver } from './board-steps';
import { SectionChange } from './section-change';
import type { DisplayUnit } from '@/lib/units';

type Props = {
  board: SawBoard;
  total: number;
  unit: DisplayUnit;
  kerfMm: number;
  nextCut: number;
  busy: boolean;
  onNextCut: () => void;
  onDone: () => void;
  onDefect: () => void;
  /** The section of the board before this one, when it differs. */
  sectionChangedFrom: string | null;
  /** Shown above the buttons, e.g. the question about a board the count says is gone. */
  question?: React.ReactNode;
};

export function CurrentBoard({
  board,
  total,
  unit,
  kerfMm,
  nextCut,
  busy,
  onNextCut,
  onDone,
  onDefect,
  sectionChangedFrom,
  question,
}: Props) {
  // A board sold full length is handed over whole: there is no cut to confirm.
  const allMarked = board.fullLength || nextCut >= board.pieces.length;
  return (
    <section
      className="space-y-4 rounded-xl border-2 border-bark bg-white p-4"
      aria-label={`Board ${board.boardNo}`}
      data-testid="current-board"
    >
      <h2 className="text-lg font-bold uppercase tracking-wide text-bark-soft">
        Board {board.boardNo} of {total}
      </h2>
      {sectionChangedFrom && <SectionChange from={sectionChangedFrom} to={board.section.name} />}
      <FetchLine board={board} unit={unit} />
      <BoardDrawing board={board} kerfMm={kerfMm} nextCut={allMarked ? null : nextCut} />
      <CutList board={board} unit={unit} nextCut={nextCut} />
      {/* Keep or scrap sits in the sticky bar, so the bar can never cover it. */}
      <div
        className="sticky bottom-0 -mx-4 space-y-3 border-t-2 border-grain bg-white px-4 py-3"
        data-testid="action-bar"
      >
        {question}
        <LeftOver board={board} unit={unit} />
        <div className="grid grid-cols-[1fr_1fr_auto] gap-3">
          <Button
            variant="secondary"
            size="lg"
            className="min-h-16 text-xl"
            onClick={onNextCut}
            disabled={allMarked}
          >
            {board.fullLength ? 'No cut needed' : allMarked ? 'All cuts made' : `Cut ${nextCut + 1} made`}
          </Button>
          <Button
            size="lg"
            className="min-h-16 text-xl"
            onClick={onDone}
            disabled={busy}
            data-testid="board-done"
          >
            Board {board.boardNo} done
          </Button>
          <Button variant="danger" size="lg" className="min-h-16" onClick={onDefect} disabled={busy}>
            Board is bad…
          </Button>
        </div>
      </div>
    </section>
  );
}
