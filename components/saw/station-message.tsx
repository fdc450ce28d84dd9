// The answer to the operator's last tap: board done (with the new offcut's tag), undone, or re-planned.
import Link from 'next/link';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TagCode } from './tag-code';

export type Message =
  | { kind: 'done'; boardNo: number; offcut: { id: number; tag: string } | null; finished: boolean }
  | { kind: 'undone'; boardNo: number }
  | {
      kind: 'defect';
      boardNo: number;
      added: number[];
      unplaced: { label: string; length: number }[];
      offcut: { id: number; tag: string } | null;
    }
  | { kind: 'error'; text: string };

const labelLink = (offcut: { id: number; tag: string }) => (
  <Link
    href={`/labels/offcuts?ids=${offcut.id}`}
    className="inline-flex min-h-12 items-center rounded-lg bg-amber px-4 font-bold text-white"
    data-testid="print-label"
  >
    Print label&nbsp;
    <TagCode tag={offcut.tag} />
  </Link>
);

export function StationMessage({
  message,
  onUndo,
  undoBusy,
}: {
  message: Message;
  onUndo: () => void;
  undoBusy: boolean;
}) {
  if (message.kind === 'error') return <Notice tone="error">{message.text}</Notice>;
  if (message.kind === 'undone')
    return <Notice data-testid="station-message">Board {message.boardNo} is back to be cut.</Notice>;
  if (message.kind === 'defect') {
    return (
      <Notice tone={message.unplaced.length ? 'error' : 'warning'} data-testid="station-message">
        <p className="text-lg font-semibold">
          Board {message.boardNo} recorded as bad.{' '}
          {message.added.length
            ? `Its pieces are re-planned on board${message.added.length > 1 ? 's' : ''} ${message.added.join(', ')}.`
            : ''}
        </p>
        {message.unplaced.length > 0 && (
          <p className="text-lg">
            Nothing in the yard can hold{' '}
            {message.unplaced.map((u) => `${u.label || 'piece'} ${u.length} mm`).join(', ')}. The office has
            been told.
          </p>
        )}
        {message.offcut && <div className="mt-2">{labelLink(message.offcut)}</div>}
      </Notice>
    );
  }
  return (
    <Notice className="flex flex-wrap items-center gap-3" data-testid="station-message">
      <span className="flex-1 text-lg font-semibold">
        Board {message.boardNo} done.
        {message.offcut && (
          <>
            {' '}
            Kept offcut tagged <TagCode tag={message.offcut.tag} />.
          </>
        )}
      </span>
      {message.offcut && labelLink(message.offcut)}
      <Button variant="secondary" onClick={onUndo} disabled={undoBusy}>
        Undo board {message.boardNo}
      </Button>
    </Notice>
  );
}
