'use client';
// Report a bad board: pick a reason, optionally say how much is still sound, and send.
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { parseLength } from '@/lib/units';
import { DEFECT_REASONS, type DefectReason, type ReportDefectBodyInput } from '@/lib/validations/saw';
import { cn } from '@/lib/cn';

export function DefectForm({
  boardNo,
  busy,
  error,
  onSend,
  onCancel,
}: {
  boardNo: number;
  busy: boolean;
  error: string | null;
  onSend: (body: ReportDefectBodyInput) => void;
  onCancel: () => void;
}) {
  const [reason, setReason] = useState<DefectReason | null>(null);
  const [usable, setUsable] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  function send() {
    if (!reason) return setProblem('Choose what is wrong with the board.');
    let usableMm: number | undefined;
    if (usable.trim()) {
      const parsed = parseLength(usable);
      if (!parsed.ok) return setProblem(parsed.message);
      usableMm = parsed.mm;
    }
    setProblem(null);
    onSend({ reason, usableMm });
  }

  return (
    <section
      className="space-y-4 rounded-xl border-4 border-brick bg-white p-4"
      data-testid="defect-form"
      aria-label={`Report board ${boardNo} bad`}
    >
      <h2 className="text-2xl font-bold text-brick">Board {boardNo} is bad. What is wrong?</h2>
      <div className="grid grid-cols-3 gap-2 sm:grid-cols-4" role="radiogroup" aria-label="Reason">
        {DEFECT_REASONS.map((r) => (
          <button
            key={r}
            type="button"
            role="radio"
            aria-checked={reason === r}
            onClick={() => setReason(r)}
            className={cn(
              'min-h-14 rounded-lg border-2 text-lg font-semibold capitalize',
              reason === r ? 'border-brick bg-brick text-white' : 'border-grain bg-white text-bark',
            )}
          >
            {r}
          </button>
        ))}
      </div>
      <label className="block text-lg font-semibold">
        Sound length still usable (optional)
        <input
          value={usable}
          onChange={(e) => setUsable(e.target.value)}
          inputMode="decimal"
          placeholder="e.g. 1800"
          className="mt-1 block min-h-14 w-full rounded-lg border-2 border-grain px-3 text-2xl"
        />
      </label>
      {(problem || error) && <Notice tone="error">{problem ?? error}</Notice>}
      <div className="flex flex-wrap gap-3">
        <Button variant="danger" size="lg" onClick={send} disabled={busy} className="min-h-16 flex-1">
          {busy ? 'Re-planning…' : 'Report and re-plan'}
        </Button>
        <Button variant="secondary" size="lg" onClick={onCancel} className="min-h-16">
          Cancel
        </Button>
      </div>
    </section>
  );
}
