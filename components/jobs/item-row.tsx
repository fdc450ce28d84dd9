'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { useDisplayUnit } from '@/components/units/display-unit';
import type { JobItemRow } from '@/lib/queries/jobs';
import type { SectionOption } from '@/lib/queries/sections';
import type { JobItemBodyInput } from '@/lib/validations/jobs';
import { describeTolerance } from '@/lib/nominal/tolerance';
import { fitBody, FitFields, useFit } from './fit-fields';

type Props = {
  item?: JobItemRow;
  sections: SectionOption[];
  editable: boolean;
  onSave: (body: JobItemBodyInput) => Promise<unknown>;
  onDelete?: () => Promise<unknown>;
  /** Section a new row starts with: the last row's, so a list of one section is quick to type. */
  defaultSectionId?: number;
};

/** One line item: read-only text, or inputs while editing. Without an item it is the "add a row" form. */
export function ItemRow({ item, sections, editable, onSave, onDelete, defaultSectionId }: Props) {
  const { format, suffix } = useDisplayUnit();
  const [editing, setEditing] = useState(!item);
  const [busy, setBusy] = useState(false);
  const name = item ? `row ${item.position + 1}` : 'new row';
  const [sectionId, setSectionId] = useState(item?.sectionId ?? defaultSectionId ?? sections[0]?.id);
  const [fit, setFit] = useFit(item?.toleranceMm ?? 0);

  if (item && !editing) {
    return (
      // Keyed apart from the editing row: otherwise React reuses the Edit button as the Save button
      // while the click is still being handled, and the browser submits the form at once.
      <tr key="view" className="border-t border-shaving" data-testid="item-row">
        <td className="p-2">{item.sectionName}</td>
        <td className="p-2 text-right tabular-nums">
          {format(item.lengthMm)}
          {suffix}
        </td>
        <td className="p-2 text-right tabular-nums">{item.quantity}</td>
        <td className="p-2 text-sm" data-testid="item-fit">
          {describeTolerance(item.toleranceMm)}
        </td>
        <td className="p-2">{item.label}</td>
        <td className="p-2 text-sm text-bark-soft">{item.note}</td>
        <td className="no-print p-2 text-right whitespace-nowrap">
          {editable && (
            <>
              <Button variant="quiet" onClick={() => setEditing(true)} aria-label={`Edit ${name}`}>
                Edit
              </Button>
              <Button
                variant="quiet"
                className="text-brick"
                disabled={busy}
                aria-label={`Delete ${name}`}
                onClick={async () => {
                  setBusy(true);
                  await onDelete?.().finally(() => setBusy(false));
                }}
              >
                Delete
              </Button>
            </>
          )}
        </td>
      </tr>
    );
  }

  async function save(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    setBusy(true);
    try {
      await onSave({
        sectionId: Number(data.get('sectionId')),
        length: String(data.get('length')),
        quantity: Number(data.get('quantity')),
        label: String(data.get('label') ?? ''),
        note: String(data.get('note') ?? ''),
        ...fitBody(fit),
      });
      if (item) setEditing(false);
      else form.reset();
    } catch {
      // The table shows the server's message.
    } finally {
      setBusy(false);
    }
  }

  const formId = `item-form-${item?.id ?? 'new'}`;
  return (
    <tr
      key="edit"
      className="border-t border-shaving bg-sawdust"
      data-testid={item ? 'item-row-editing' : 'new-item-row'}
    >
      <td className="p-2">
        <form id={formId} onSubmit={save} />
        <select
          form={formId}
          name="sectionId"
          aria-label={`Section, ${name}`}
          className={inputClass}
          value={sectionId}
          onChange={(e) => setSectionId(Number(e.target.value))}
        >
          {sections.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </td>
      <td className="p-2">
        <input
          form={formId}
          name="length"
          aria-label={`Length, ${name}`}
          required
          className={`${inputClass} text-right`}
          defaultValue={item ? format(item.lengthMm) : ''}
          placeholder="2400 or 7'-8 5/8&quot;"
        />
      </td>
      <td className="p-2">
        <input
          form={formId}
          name="quantity"
          aria-label={`Quantity, ${name}`}
          required
          type="number"
          min={1}
          max={10000}
          className={`${inputClass} w-24 text-right`}
          defaultValue={item?.quantity ?? 1}
        />
      </td>
      <td className="p-2">
        <FitFields
          name={name}
          fit={fit}
          onChange={setFit}
          nominalDefaultMm={sections.find((s) => s.id === sectionId)?.nominalDefaultMm ?? 0}
        />
      </td>
      <td className="p-2">
        <input
          form={formId}
          name="label"
          aria-label={`Label, ${name}`}
          className={inputClass}
          defaultValue={item?.label ?? ''}
        />
      </td>
      <td className="p-2">
        <input
          form={formId}
          name="note"
          aria-label={`Note, ${name}`}
          className={inputClass}
          defaultValue={item?.note ?? ''}
        />
      </td>
      <td className="p-2 text-right whitespace-nowrap">
        <Button form={formId} type="submit" disabled={busy}>
          {item ? 'Save' : 'Add row'}
        </Button>
        {item && (
          <Button variant="quiet" onClick={() => setEditing(false)}>
            Cancel
          </Button>
        )}
      </td>
    </tr>
  );
}
