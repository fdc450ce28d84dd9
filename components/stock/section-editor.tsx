'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { sectionKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import { SectionTradeFields, type TradeDraft } from './section-trade-fields';
import { saveSectionRequest, type SectionRow } from '@/lib/queries/stock';
import type { SectionBodyInput } from '@/lib/validations/stock';

type LengthDraft = {
  id?: number;
  lengthMm: string;
  price: string;
  cost: string;
  unlimited: boolean;
  active: boolean;
};
const poundsText = (pence: number | null) => (pence === null ? '' : (pence / 100).toFixed(2));
const toPence = (pounds: string) => (pounds.trim() === '' ? null : Math.round(Number(pounds) * 100));
const toMm = (text: string) => (text.trim() === '' ? null : Number(text));
const TEXT_FIELDS = [
  ['name', 'Name'],
  ['code', 'Code'],
  ['species', 'Species'],
  ['grade', 'Grade'],
  ['treatment', 'Treatment'],
] as const;

function toDraft(s: SectionRow | null) {
  return {
    fields: {
      name: s?.name ?? '',
      code: s?.code ?? '',
      species: s?.species ?? '',
      grade: s?.grade ?? '',
      treatment: s?.treatment ?? '',
      thicknessMm: String(s?.thicknessMm ?? ''),
      widthMm: String(s?.widthMm ?? ''),
    },
    trade: {
      finish: s?.finish ?? 'sawn',
      finishedThicknessMm: String(s?.finishedThicknessMm ?? ''),
      finishedWidthMm: String(s?.finishedWidthMm ?? ''),
      moisture: s?.moisture ?? 'kiln_dried',
      minKeepMm: String(s?.minKeepMm ?? ''),
      nominalToleranceMm: String(s?.nominalToleranceMm ?? ''),
    } satisfies TradeDraft as TradeDraft,
    active: s?.active ?? true,
    lengths: (s?.lengths ?? []).map((l): LengthDraft => ({
      id: l.id,
      lengthMm: String(l.lengthMm),
      price: (l.pricePence / 100).toFixed(2),
      cost: poundsText(l.costPence),
      unlimited: l.onHand === null,
      active: l.active,
    })),
  };
}

/** Adds or edits a section and its stock lengths. Counts on hand change only through deliveries and stocktakes. */
export function SectionEditor({ section, onClose }: { section: SectionRow | null; onClose: () => void }) {
  const [draft, setDraft] = useState(() => toDraft(section));
  const save = useApiMutation({
    invalidates: [sectionKeys.all],
    mutationFn: () => {
      const body: SectionBodyInput = {
        ...draft.fields,
        thicknessMm: Number(draft.fields.thicknessMm),
        widthMm: Number(draft.fields.widthMm),
        finish: draft.trade.finish,
        moisture: draft.trade.moisture,
        finishedThicknessMm: toMm(draft.trade.finishedThicknessMm),
        finishedWidthMm: toMm(draft.trade.finishedWidthMm),
        minKeepMm: toMm(draft.trade.minKeepMm),
        nominalToleranceMm: toMm(draft.trade.nominalToleranceMm),
        active: draft.active,
        lengths: draft.lengths.map((l) => ({
          id: l.id,
          lengthMm: Number(l.lengthMm),
          pricePence: Math.round(Number(l.price) * 100),
          costPence: toPence(l.cost),
          unlimited: l.unlimited,
          active: l.active,
        })),
      };
      return saveSectionRequest(section?.id ?? null, body);
    },
    onSuccess: onClose,
  });
  const issue = (path: string) => save.fieldErrors[path];
  const setField = (key: keyof typeof draft.fields, value: string) =>
    setDraft({ ...draft, fields: { ...draft.fields, [key]: value } });
  const setLength = (i: number, change: Partial<LengthDraft>) =>
    setDraft({ ...draft, lengths: draft.lengths.map((l, k) => (k === i ? { ...l, ...change } : l)) });

  return (
    <form
      className="space-y-4"
      data-testid="section-editor"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      <h3 className="text-lg font-bold">{section ? `Edit ${section.name}` : 'Add a section'}</h3>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {TEXT_FIELDS.map(([key, label]) => (
          <Field key={key} label={label} error={issue(key)}>
            {(p) => (
              <input {...p} value={draft.fields[key]} onChange={(e) => setField(key, e.target.value)} />
            )}
          </Field>
        ))}
        <Field label="Thickness (mm)" error={issue('thicknessMm')}>
          {(p) => (
            <input
              {...p}
              type="number"
              value={draft.fields.thicknessMm}
              onChange={(e) => setField('thicknessMm', e.target.value)}
            />
          )}
        </Field>
        <Field label="Width (mm)" error={issue('widthMm')}>
          {(p) => (
            <input
              {...p}
              type="number"
              value={draft.fields.widthMm}
              onChange={(e) => setField('widthMm', e.target.value)}
            />
          )}
        </Field>
        <label className="flex items-center gap-2 self-end pb-3">
          <input
            type="checkbox"
            checked={draft.active}
            onChange={(e) => setDraft({ ...draft, active: e.target.checked })}
          />{' '}
          Sold (active)
        </label>
      </div>
      <SectionTradeFields
        draft={draft.trade}
        onChange={(change) => setDraft({ ...draft, trade: { ...draft.trade, ...change } })}
        issue={issue}
      />
      <fieldset className="space-y-2">
        <legend className="font-semibold">Stock lengths sold</legend>
        {draft.lengths.map((l, i) => (
          <div key={l.id ?? `new-${i}`} className="flex flex-wrap items-center gap-3">
            <div className="w-28 shrink-0">
              <input
                aria-label={`Length ${i + 1} in mm`}
                className={inputClass}
                type="number"
                value={l.lengthMm}
                onChange={(e) => setLength(i, { lengthMm: e.target.value })}
              />
            </div>
            <span className="text-sm">mm at £</span>
            <div className="w-28 shrink-0">
              <input
                aria-label={`Price of length ${i + 1} in pounds`}
                className={inputClass}
                type="number"
                step="0.01"
                value={l.price}
                onChange={(e) => setLength(i, { price: e.target.value })}
              />
            </div>
            <span className="text-sm">cost £</span>
            <div className="w-28 shrink-0">
              <input
                aria-label={`Cost of length ${i + 1} in pounds`}
                className={inputClass}
                type="number"
                step="0.01"
                placeholder="not entered"
                value={l.cost}
                onChange={(e) => setLength(i, { cost: e.target.value })}
              />
            </div>
            <label className="flex items-center gap-1 text-sm">
              <input
                type="checkbox"
                checked={l.unlimited}
                onChange={(e) => setLength(i, { unlimited: e.target.checked })}
              />{' '}
              Unlimited
            </label>
            <label className="flex items-center gap-1 text-sm">
              <input
                type="checkbox"
                checked={l.active}
                onChange={(e) => setLength(i, { active: e.target.checked })}
              />{' '}
              Active
            </label>
            {issue(`lengths.${i}.lengthMm`) && (
              <span className="text-sm font-semibold text-brick">{issue(`lengths.${i}.lengthMm`)}</span>
            )}
          </div>
        ))}
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            setDraft({
              ...draft,
              lengths: [
                ...draft.lengths,
                { lengthMm: '', price: '', cost: '', unlimited: false, active: true },
              ],
            })
          }
        >
          Add a stock length
        </Button>
        <p className="text-sm text-bark-soft">
          A new counted length starts at 0 on hand; receive a delivery or take stock to set its count.
        </p>
      </fieldset>
      {save.error && (
        <Notice tone="error">
          {save.error.message}
          {issue('lengths') ? ` ${issue('lengths')}` : ''}
        </Notice>
      )}
      <div className="flex gap-2">
        <Button type="submit" disabled={save.isPending}>
          Save section
        </Button>
        <Button type="button" variant="quiet" onClick={onClose}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
