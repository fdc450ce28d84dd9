// A board already dealt with, opened from the list: cut, or set aside as bad (never shown as cut).
import { Button } from '@/components/ui/button';
import type { SawBoard } from '@/lib/queries/saw';
import { CutList } from './board-steps';
import type { DisplayUnit } from '@/lib/units';

export function PastBoard({
  board,
  unit,
  onNext,
}: {
  board: SawBoard;
  unit: DisplayUnit;
  onNext: () => void;
}) {
  const bad = board.status === 'defective';
  return (
    <section
      className="space-y-4 rounded-xl border-2 border-bark bg-white p-4"
      aria-label={`Board ${board.boardNo}`}
      data-testid="past-board"
    >
      <h2 className="text-2xl font-bold">
        {bad
          ? `Board ${board.boardNo} was reported bad${board.defectReason ? ` (${board.defectReason})` : ''}: not cut`
          : `Board ${board.boardNo} is cut`}
      </h2>
      {bad && <p className="text-lg">Its pieces were planned again on other boards.</p>}
      <CutList board={board} unit={unit} nextCut={0} />
      <Button size="lg" onClick={onNext}>
        Go to the next board to cut
      </Button>
    </section>
  );
}
