// Asked when the stock count says a board's length is gone: is the board really in the operator's hands?
import { Button } from '@/components/ui/button';

export function BoardCountQuestion({
  text,
  busy,
  onYes,
  onNo,
}: {
  text: string;
  busy: boolean;
  onYes: () => void;
  onNo: () => void;
}) {
  return (
    <div
      role="alertdialog"
      aria-labelledby="board-count-question"
      className="space-y-3 rounded-lg border-4 border-brick bg-brick-light px-4 py-3"
      data-testid="board-count-question"
    >
      <p id="board-count-question" className="text-xl font-bold text-brick">
        {text}
      </p>
      <p className="text-lg">If it is, the cut is recorded and the owner is asked to recount this length.</p>
      <div className="flex flex-wrap gap-3">
        <Button size="lg" onClick={onYes} disabled={busy}>
          Yes, the board is here
        </Button>
        <Button variant="secondary" size="lg" onClick={onNo}>
          No, leave it
        </Button>
      </div>
    </div>
  );
}
