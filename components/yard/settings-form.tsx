'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import type { DisplayUnit, Region } from '@/db/enums';
import { saveYardSettingsRequest } from '@/lib/queries/yard';
import { useApiMutation } from '@/lib/queries/use-api-mutation';
import type { YardSettingsBodyInput } from '@/lib/validations/yard-settings';

export type SettingsValues = {
  yardName: string;
  kerfMm: number;
  trimMm: number;
  minOffcutMm: number;
  displayUnit: DisplayUnit;
  region: Region;
  minSafePieceMm: number;
  lengthToleranceMm: number;
  perCutChargePence: number;
  clearOffcutsAfterDays: number;
  vatRateBasisPoints: number;
  quoteValidityDays: number;
  minimumChargePence: number;
  offcutRatePercent: number;
  depositPercent: number;
  yardAddress: string;
  vatNumber: string;
  remaindersGoTo: 'yard' | 'customer';
};

const NUMBERS: [keyof SettingsValues, string, string][] = [
  ['kerfMm', 'Kerf (mm)', 'Width of the saw cut; about 3 mm for a typical blade.'],
  [
    'trimMm',
    'End trim (mm)',
    'Cut off the end of each new stock length before the first piece, to clear split or out-of-square ends (yards trim 5–25 mm). 15 mm or more: a thinner sliver does not clear a split and can be thrown by the blade.',
  ],
  [
    'minOffcutMm',
    'Shortest kept offcut (mm)',
    'Shorter remainders are scrap; longer ones go on the rack. Each section may set its own.',
  ],
  [
    'minSafePieceMm',
    'Minimum safe piece length (mm)',
    'Cut lists and forms refuse shorter pieces: the saw cannot hold them safely. Check it against your own risk assessment.',
  ],
  [
    'lengthToleranceMm',
    'Nominal pieces: up to (mm) short',
    'Lines marked nominal (cladding, studs sold by nominal length) may be cut this much short, so two fit a board that is exactly twice as long, and a piece as long as a stock length is sold whole, uncut. Lines are exact unless marked nominal; a section may set its own figure. 0: nominal lines are cut exact too.',
  ],
  ['perCutChargePence', 'Charge per cut (pence)', 'Added to quotes for each saw cut.'],
  [
    'vatRateBasisPoints',
    'VAT rate (hundredths of a percent)',
    'UK standard rate 20 % is 2000 (GOV.UK, "VAT rates"). Check the current rate with HMRC.',
  ],
  ['quoteValidityDays', 'Quotes valid for (days)', 'Printed on each quote; its link lasts at least as long.'],
  ['minimumChargePence', 'Minimum order charge (pence)', 'Smaller orders are topped up to this, before VAT.'],
  [
    'offcutRatePercent',
    'Offcut rate (% of price per metre)',
    'Rack offcuts in a plan are charged at this share of the section’s cheapest price per metre.',
  ],
  ['depositPercent', 'Deposit (% of the total)', 'What a customer pays to have the job cut.'],
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
  const save = useApiMutation({
    mutationFn: () =>
      saveYardSettingsRequest({
        // An empty box is sent as null: the server answers with that field's own message.
        ...(Object.fromEntries(
          NUMBERS.map(([k]) => [k, values[k] === '' ? null : Number(values[k])]),
        ) as Pick<
          YardSettingsBodyInput,
          'kerfMm' | 'trimMm' | 'minOffcutMm' | 'perCutChargePence' | 'clearOffcutsAfterDays'
        >),
        yardName: values.yardName,
        displayUnit: values.displayUnit as YardSettingsBodyInput['displayUnit'],
        region: values.region as YardSettingsBodyInput['region'],
        yardAddress: values.yardAddress,
        vatNumber: values.vatNumber,
        remaindersGoTo: values.remaindersGoTo as YardSettingsBodyInput['remaindersGoTo'],
      }),
  });
  const issue = (k: string) => save.fieldErrors[k];
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
        <Field
          label="Region"
          hint="Picks frame piece names and defaults: UK head and sole plates, lintels; North American top and bottom plates, headers."
          error={issue('region')}
        >
          {(p) => (
            <select {...p} value={values.region} onChange={(e) => set('region', e.target.value)}>
              <option value="uk">United Kingdom</option>
              <option value="na">North America</option>
            </select>
          )}
        </Field>
        <Field label="Yard address (on quotes)" error={issue('yardAddress')}>
          {(p) => (
            <input {...p} value={values.yardAddress} onChange={(e) => set('yardAddress', e.target.value)} />
          )}
        </Field>
        <Field label="VAT number (on quotes)" error={issue('vatNumber')}>
          {(p) => (
            <input {...p} value={values.vatNumber} onChange={(e) => set('vatNumber', e.target.value)} />
          )}
        </Field>
        <Field
          label="Remainders of boards a customer pays for"
          hint="Given to the customer (listed on their cut sheet as theirs to take), or kept by the yard for the rack."
          error={issue('remaindersGoTo')}
        >
          {(p) => (
            <select
              {...p}
              value={values.remaindersGoTo}
              onChange={(e) => set('remaindersGoTo', e.target.value)}
            >
              <option value="yard">Stay with the yard</option>
              <option value="customer">Go to the customer</option>
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
