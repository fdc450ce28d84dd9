'use client';

import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit } from '@/db/enums';
import { ApiError, fetchJson } from '@/lib/queries/fetch-json';

export type SettingsValues = {
  yardName: string;
  kerfMm: number;
  trimMm: number;
  minOffcutMm: number;
  displayUnit: DisplayUnit;
  perCutChargePence: number;
  clearOffcutsAfterDays: number;
};

const NUMBERS: [keyof SettingsValues, string, string][] = [
  ['kerfMm', 'Kerf (mm)', 'Width of the saw cut; about 3 mm for a typical blade.'],
  ['trimMm', 'End trim (mm)', 'Squared off new stock before the first piece; 0 for none.'],
  ['minOffcutMm', 'Shortest offcut kept (mm)', 'Shorter remainders are scrap; longer ones go on the rack.'],
  ['perCutChargePence', 'Charge per cut (pence)', 'Added to quotes for each saw cut.'],
  [
    'clearOffcutsAfterDays',
    'Suggest clearing offcuts after (days)',
    'Older offcuts are flagged on the rack and in the reports.',
  ],
];

/** The yard's cutting and display settings; new plans use them. */
export function SettingsForm({ initial }: { initial: SettingsValues }) {
  const [values, setValues] = useState<Record<keyof SettingsValues, string>>(
    () =>
      Object.fromEntries(Object.entries(initial).map(([k, v]) => [k, String(v)])) as Record<
        keyof SettingsValues,
        string
      >,
  );
  const save = useMutation({
    mutationFn: () =>
      fetchJson('/api/settings', {
        method: 'PATCH',
        body: JSON.stringify({
          ...Object.fromEntries(NUMBERS.map(([k]) => [k, values[k] === '' ? null : Number(values[k])])),
          yardName: values.yardName,
          displayUnit: values.displayUnit,
        }),
      }),
  });
  const issues =
    save.error instanceof ApiError
      ? ((save.error.body as { issues?: { path: string; message: string }[] })?.issues ?? [])
      : [];
  const issue = (k: string) => issues.find((i) => i.path === k)?.message;
  const set = (k: keyof SettingsValues, v: string) => setValues({ ...values, [k]: v });

  return (
    <form
      className="max-w-2xl space-y-4"
      data-testid="settings-form"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      <Field label="Yard name" error={issue('yardName')}>
        {(p) => <input {...p} value={values.yardName} onChange={(e) => set('yardName', e.target.value)} />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        {NUMBERS.map(([k, label, hint]) => (
          <Field key={k} label={label} hint={hint} error={issue(k)}>
            {(p) => (
              <input
                {...p}
                type="number"
                inputMode="numeric"
                value={values[k]}
                onChange={(e) => set(k, e.target.value)}
              />
            )}
          </Field>
        ))}
        <Field label="Lengths shown in" error={issue('displayUnit')}>
          {(p) => (
            <select {...p} value={values.displayUnit} onChange={(e) => set('displayUnit', e.target.value)}>
              <option value="mm">Millimetres</option>
              <option value="imperial">Feet and inches</option>
            </select>
          )}
        </Field>
      </div>
      <Button type="submit" disabled={save.isPending}>
        Save settings
      </Button>
      {save.isSuccess && (
        <Notice data-testid="settings-saved">
          Settings saved. New plans use them; plans already made keep theirs.
        </Notice>
      )}
      {save.error && <Notice tone="error">{save.error.message}</Notice>}
    </form>
  );
}
