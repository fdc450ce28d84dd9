'use client';

import { stockLengthName } from '@/lib/units/stock-length-name';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { Region } from '@/db/enums';
import { sectionKeys, stockKeys } from '@/lib/queries/query-keys';
import { stocktakeRequest, type SectionRow } from '@/lib/queries/stock';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Counted boards per stock length of one section; only lengths whose count changed are sent. */
export function StocktakeForm({ sections, region }: { sections: SectionRow[]; region: Region }) {
  const [sectionId, setSectionId] = useState('');
  const [counts, setCounts] = useState<Record<number, string>>({});
  const [reason, setReason] = useState('');
  const [done, setDone] = useState<string | null>(null);
  const section = sections.find((s) => String(s.id) === sectionId);
  const changed = (section?.lengths ?? []).filter(
    (l) => counts[l.id] !== undefined && counts[l.id] !== '' && Number(counts[l.id]) !== l.onHand,
  );
  const save = useApiMutation({
    invalidates: [sectionKeys.all, stockKeys.movements],
    mutationFn: () =>
      stocktakeRequest({
        reason,
        counts: changed.map((l) => ({ stockLengthId: l.id, counted: Number(counts[l.id]) })),
      }),
    onSuccess: () => {
      setDone(
        `Stocktake saved for ${section?.name}: ${changed.length} length${changed.length === 1 ? '' : 's'} corrected.`,
      );
      setCounts({});
      setReason('');
    },
  });

  return (
    <form
      className="space-y-4"
      data-testid="stocktake-form"
      onSubmit={(e) => {
        e.preventDefault();
        setDone(null);
        save.mutate();
      }}
    >
      <Field label="Section counted">
        {(p) => (
          <select
            {...p}
            value={sectionId}
            onChange={(e) => {
              setSectionId(e.target.value);
              setCounts({});
            }}
          >
            <option value="">Choose a section…</option>
            {sections.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        )}
      </Field>
      {section && (
        <div className="grid gap-2 sm:grid-cols-2">
          {section.lengths.map((l) => (
            <label
              key={l.id}
              className="flex items-center justify-between gap-3 rounded-lg bg-shaving px-3 py-2"
            >
              <span>
                <span className="font-semibold">{stockLengthName(l.lengthMm, region)}</span>
                <span className="block text-sm text-bark-soft">
                  {l.onHand === null ? 'Unlimited — a count starts counting it' : `Records say ${l.onHand}`}
                </span>
              </span>
              <input
                aria-label={`Counted ${stockLengthName(l.lengthMm, region)}`}
                className={`${inputClass} w-24`}
                type="number"
                min={0}
                inputMode="numeric"
                value={counts[l.id] ?? ''}
                onChange={(e) => setCounts({ ...counts, [l.id]: e.target.value })}
                placeholder={l.onHand === null ? '—' : String(l.onHand)}
              />
            </label>
          ))}
        </div>
      )}
      <Field label="Why the count changed">
        {(p) => (
          <input
            {...p}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            placeholder="Monthly count; two boards split in the rain"
          />
        )}
      </Field>
      <Button type="submit" disabled={save.isPending || changed.length === 0 || !reason.trim()}>
        Save stocktake
      </Button>
      {save.error && <Notice tone="error">{save.error.message}</Notice>}
      {done && <Notice>{done}</Notice>}
    </form>
  );
}
