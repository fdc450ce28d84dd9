'use client';
// The saw operator's screen for one plan: one board at a time, confirmed with one tap.
import Link from 'next/link';
import { useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { Notice } from '@/components/ui/notice';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/queries/fetch-json';
import { confirmBoardRequest, reportDefectRequest, sawPlanQuery, undoBoardRequest } from '@/lib/queries/saw';
import type { ReportDefectBodyInput } from '@/lib/validations/saw';
import { BoardCountQuestion } from './board-count-question';
import { BoardList } from './board-list';
import { CurrentBoard } from './current-board';
import { DefectForm } from './defect-form';
import { PastBoard } from './past-board';
import { SafetyLine } from './safety-line';
import { StationMessage, type Message } from './station-message';
import { sawKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

export function SawStation({ planId }: { planId: number }) {
  const client = useQueryClient();
  const { data: plan, error } = useQuery(sawPlanQuery(planId));
  const [picked, setPicked] = useState<number | null>(null);
  const [nextCut, setNextCut] = useState(0);
  const [defectOpen, setDefectOpen] = useState(false);
  const [message, setMessage] = useState<Message | null>(null);
  // The stock count says this board's length is gone: ask before recording the cut.
  const [countQuestion, setCountQuestion] = useState<{ boardNo: number; text: string } | null>(null);
  // Refreshed inside onSuccess, not by `invalidates`: the boards must be fresh before the message shows.
  const refresh = () => client.invalidateQueries({ queryKey: sawKeys.all });
  const moveOn = () => {
    setPicked(null);
    setNextCut(0);
    setDefectOpen(false);
    setCountQuestion(null);
  };

  const done = useApiMutation({
    mutationFn: ({ boardNo, boardThere }: { boardNo: number; boardThere?: true }) =>
      confirmBoardRequest(planId, boardNo, boardThere),
    // Fresh boards first, then the message: the screen never shows a confirmed board as the next one.
    onSuccess: async (r) => {
      await refresh();
      setMessage({
        kind: 'done',
        boardNo: r.boardNo,
        offcut: r.newOffcut,
        finished: r.planStatus === 'done',
      });
      moveOn();
    },
    onError: (e, { boardNo }) => {
      const details = e instanceof ApiError ? (e.body as { details?: { reason?: string } }).details : null;
      if (details?.reason === 'board_not_counted') setCountQuestion({ boardNo, text: e.message });
      else setMessage({ kind: 'error', text: e.message });
    },
  });
  const undo = useApiMutation({
    mutationFn: () => undoBoardRequest(planId),
    onSuccess: async (r) => {
      await refresh();
      setMessage({ kind: 'undone', boardNo: r.boardNo });
      setPicked(r.boardNo);
      setNextCut(0);
    },
    onError: (e) => setMessage({ kind: 'error', text: e.message }),
  });
  const defect = useApiMutation({
    mutationFn: ({ boardNo, body }: { boardNo: number; body: ReportDefectBodyInput }) =>
      reportDefectRequest(planId, boardNo, body),
    onSuccess: async (r) => {
      await refresh();
      setMessage({
        kind: 'defect',
        boardNo: r.boardNo,
        added: r.replan?.boardNos ?? [],
        unplaced: r.replan?.unplaced ?? [],
        offcut: r.newOffcut,
      });
      moveOn();
    },
  });

  if (error) return <Notice tone="error">{error.message}</Notice>;
  if (!plan) return <p className="text-xl">Loading the plan…</p>;
  const pending = plan.boards.filter((b) => b.status === 'pending');
  const board = plan.boards.find((b) => b.boardNo === picked) ?? pending[0] ?? null;
  const treated = plan.boards.some((b) => b.section.treated);
  const before = board ? plan.boards.find((b) => b.boardNo === board.boardNo - 1) : undefined;
  const sectionChangedFrom =
    board && before && before.section.id !== board.section.id ? before.section.name : null;
  const cut = plan.boards.filter((b) => b.status === 'done').length;
  const bad = plan.boards.filter((b) => b.status === 'defective').length;

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-center gap-3">
        <Link
          href="/saw"
          className="inline-flex min-h-12 items-center rounded-lg border-2 border-grain bg-white px-4 font-semibold"
        >
          ‹ Queue
        </Link>
        <h1 className="flex-1 text-2xl font-bold">
          {plan.job.reference} · {plan.job.customerName}
        </h1>
        <p className="text-xl font-bold" data-testid="saw-progress">
          {cut} of {plan.boards.length} boards cut{bad > 0 ? ` · ${bad} bad, not cut` : ''}
        </p>
      </header>
      <SafetyLine treated={treated} />
      {message && <StationMessage message={message} onUndo={() => undo.mutate()} undoBusy={undo.isPending} />}
      {plan.job.officeFlag && <Notice tone="warning">Office told: {plan.job.officeFlag}</Notice>}
      <div className="grid gap-4 lg:grid-cols-[1fr_18rem]">
        <div>
          {board && defectOpen ? (
            <DefectForm
              boardNo={board.boardNo}
              busy={defect.isPending}
              error={defect.error?.message ?? null}
              onSend={(body) => defect.mutate({ boardNo: board.boardNo, body })}
              onCancel={() => setDefectOpen(false)}
            />
          ) : board && board.status === 'pending' ? (
            <CurrentBoard
              board={board}
              total={plan.boards.length}
              unit={plan.displayUnit}
              kerfMm={plan.kerfMm}
              nextCut={nextCut}
              busy={done.isPending}
              onNextCut={() => setNextCut((n) => n + 1)}
              onDone={() => done.mutate({ boardNo: board.boardNo })}
              onDefect={() => setDefectOpen(true)}
              sectionChangedFrom={sectionChangedFrom}
              question={
                countQuestion?.boardNo === board.boardNo && (
                  <BoardCountQuestion
                    text={countQuestion.text}
                    busy={done.isPending}
                    onYes={() => done.mutate({ boardNo: board.boardNo, boardThere: true })}
                    onNo={() => setCountQuestion(null)}
                  />
                )
              }
            />
          ) : board ? (
            <PastBoard board={board} unit={plan.displayUnit} onNext={moveOn} />
          ) : (
            <AllCut
              planId={planId}
              hasBoards={plan.boards.length > 0}
              anyBad={bad > 0}
              onUndo={() => undo.mutate()}
            />
          )}
        </div>
        <BoardList
          boards={plan.boards}
          current={board?.boardNo ?? null}
          unit={plan.displayUnit}
          onPick={(n) => {
            setPicked(n);
            setNextCut(0);
            setDefectOpen(false);
          }}
        />
      </div>
    </div>
  );
}

function AllCut({
  planId,
  hasBoards,
  anyBad,
  onUndo,
}: {
  planId: number;
  hasBoards: boolean;
  anyBad: boolean;
  onUndo: () => void;
}) {
  return (
    <section
      className="space-y-4 rounded-xl border-2 border-spruce bg-spruce-light p-6"
      data-testid="plan-finished"
    >
      <h2 className="text-3xl font-bold text-spruce-dark">
        {!hasBoards
          ? 'This plan has no boards.'
          : anyBad
            ? 'Every sound board is cut.'
            : 'Every board is cut.'}
      </h2>
      <p className="text-lg">Label and rack the kept offcuts, then take the next job from the queue.</p>
      <div className="flex flex-wrap gap-3">
        <Link
          href={`/labels/offcuts?plan=${planId}`}
          className="inline-flex min-h-14 items-center rounded-lg bg-spruce px-6 text-lg font-semibold text-white"
        >
          Labels for this plan
        </Link>
        <Link
          href="/saw"
          className="inline-flex min-h-14 items-center rounded-lg border-2 border-grain bg-white px-6 text-lg font-semibold"
        >
          Back to the queue
        </Link>
        <Button variant="quiet" size="lg" onClick={onUndo}>
          Undo last board
        </Button>
      </div>
    </section>
  );
}
