'use client';

import { Field } from '@/components/ui/field';
import type { FrameSectionOption } from '@/lib/frames-data/frame-section-option';
import type { DisplayUnit } from '@/lib/units';
import type { PanelDraft } from './panel-draft';
import { PANEL_FIELDS, type FieldSpec } from './panel-fields';

type Props = {
  draft: PanelDraft;
  drafts: PanelDraft[];
  sections: FrameSectionOption[];
  unit: DisplayUnit;
  errors: Record<string, string>;
  onChange: (draft: PanelDraft) => void;
};

/** The fields of one panel, by kind; lengths take mm or feet-inches text. */
export function PanelForm({ draft, drafts, sections, unit, errors, onChange }: Props) {
  const set = (key: string, text: string) => {
    const exact = { ...draft.exact };
    delete exact[key];
    onChange({ ...draft, values: { ...draft.values, [key]: text }, exact });
  };
  const control = (field: FieldSpec, props: { id: string; className: string }) => {
    const value = draft.values[field.key] ?? '';
    const onSelect = (e: React.ChangeEvent<HTMLSelectElement>) => set(field.key, e.target.value);
    const blank = field.optional ? (
      <option value="">—</option>
    ) : (
      <option value="" disabled>
        Choose…
      </option>
    );
    switch (field.type) {
      case 'section':
        return (
          <select {...props} value={value} onChange={onSelect}>
            {blank}
            {sections.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        );
      case 'panel':
        return (
          <select {...props} value={value} onChange={onSelect}>
            {blank}
            {drafts
              .filter((d) => field.of?.includes(d.kind))
              .map((d) => (
                <option key={d.key} value={d.id}>
                  {d.name || d.id}
                </option>
              ))}
          </select>
        );
      case 'choice':
      case 'yesno':
        return (
          <select {...props} value={value} onChange={onSelect}>
            {(
              field.options ?? [
                ['yes', 'Yes'],
                ['no', 'No'],
              ]
            ).map(([v, label]) => (
              <option key={v} value={v}>
                {label}
              </option>
            ))}
          </select>
        );
      default:
        return (
          <input
            {...props}
            value={value}
            inputMode={field.type === 'number' ? 'decimal' : 'text'}
            placeholder={
              field.type === 'length' ? (unit === 'imperial' ? `e.g. 7'-10 1/2"` : 'e.g. 2400') : undefined
            }
            onChange={(e) => set(field.key, e.target.value)}
            autoComplete="off"
          />
        );
    }
  };
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
      <div className="col-span-2 sm:col-span-3">
        <Field label="Panel name" error={errors.name} hint="Names its pieces: “back wall stud 4”">
          {(p) => (
            <input
              {...p}
              value={draft.name}
              onChange={(e) => onChange({ ...draft, name: e.target.value })}
              autoComplete="off"
            />
          )}
        </Field>
      </div>
      {PANEL_FIELDS[draft.kind].map((field) => (
        <Field key={field.key} label={field.label} error={errors[field.key]} hint={field.hint}>
          {(p) => control(field, p)}
        </Field>
      ))}
    </div>
  );
}
