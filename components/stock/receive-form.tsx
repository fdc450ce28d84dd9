'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { Region } from '@/db/enums';
import { sectionKeys, stockKeys } from '@/lib/queries/query-keys';
import { receiveStockRequest, type SectionRow } from '@/lib/queries/stock';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { stockLengthChoices } from './stock-length-label';

type Line = { stockLengthId: string; quantity: string };
const emptyLine: Line = { stockLengthId: '', quantity: '' };

/** A delivery: a reference and one line per stock length received. */
export function ReceiveForm({ sections, region }: { sections: SectionRow[]; region: Region }) {
  const [reference, setReference] = useState('');
  const [lines, setLines] = useState<Line[]>([emptyLine]);
  const [done, setDone] = useState<string | null>(null);
  const choices = stockLengthChoices(sections, region);
  const receive = useApiMutation({
    invalidates: [sectionKeys.all, stockKeys.movements],
    mutationFn: () =>
      receiveStockRequest({
        reference,
        lines: lines.map((l) => ({ stockLengthId: Number(l.stockLengthId), quantity: Number(l.quantity) })),
      }),
    onSuccess: () => {
      const boards = lines.reduce((n, l) => n + Number(l.quantity), 0);
      setDone(`Received ${boards} boards on ${reference}.`);
      setReference('');
      setLines([emptyLine]);
    },
  });
  const setLine = (i: number, change: Partial<Line>) =>
    setLines(lines.map((l, k) => (k === i ? { ...l, ...change } : l)));

  return (
    <form
      className="space-y-4"
      data-testid="receive-form"
      onSubmit={(e) => {
        e.preventDefault();
        setDone(null);
        receive.mutate();
      }}
    >
      <Field label="Delivery note or reference">
        {(p) => (
          <input
            {...p}
            value={reference}
            onChange={(e) => setReference(e.target.value)}
            placeholder="DN-4410, Northwood Timber"
          />
        )}
      </Field>
      {lines.map((line, i) => (
        <div key={i} className="grid gap-2 sm:grid-cols-[1fr_8rem_auto]">
          <select
            aria-label={`Stock length, line ${i + 1}`}
            className={inputClass}
            value={line.stockLengthId}
            onChange={(e) => setLine(i, { stockLengthId: e.target.value })}
          >
            <option value="">Choose a stock length…</option>
            {choices.map((c) => (
              <option key={c.id} value={c.id}>
                {c.label}
              </option>
            ))}
          </select>
          <input
            aria-label={`Boards received, line ${i + 1}`}
            className={inputClass}
            type="number"
            min={1}
            inputMode="numeric"
            value={line.quantity}
            onChange={(e) => setLine(i, { quantity: e.target.value })}
            placeholder="Boards"
          />
          {lines.length > 1 && (
            <Button type="button" variant="quiet" onClick={() => setLines(lines.filter((_, k) => k !== i))}>
              Remove
            </Button>
          )}
        </div>
      ))}
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => setLines([...lines, emptyLine])}>
          Add a line
        </Button>
        <Button
          type="submit"
          disabled={receive.isPending || lines.some((l) => !l.stockLengthId || !l.quantity)}
        >
          Receive delivery
        </Button>
      </div>
      {receive.error && <Notice tone="error">{receive.error.message}</Notice>}
      {done && <Notice data-testid="receive-done">{done}</Notice>}
    </form>
  );
}
