import { Field } from '@/components/ui/field';
import type { MoistureState } from '@/db/enums';

export type TradeDraft = {
  finish: 'sawn' | 'planed';
  finishedThicknessMm: string;
  finishedWidthMm: string;
  moisture: MoistureState;
  minKeepMm: string;
  nominalToleranceMm: string;
};

export const MOISTURE_LABEL: Record<MoistureState, string> = {
  kiln_dried: 'Kiln dried (KD)',
  air_dried: 'Air dried',
  green: 'Green (wet)',
};

/** How the section is sold: sawn or planed, the size it really measures, moisture and the shortest keep. */
export function SectionTradeFields({
  draft,
  onChange,
  issue,
}: {
  draft: TradeDraft;
  onChange: (change: Partial<TradeDraft>) => void;
  issue: (path: string) => string | undefined;
}) {
  const mm = (
    key: 'finishedThicknessMm' | 'finishedWidthMm' | 'minKeepMm' | 'nominalToleranceMm',
    label: string,
    hint: string,
    min = 1,
  ) => (
    <Field label={label} hint={hint} error={issue(key)}>
      {(p) => (
        <input
          {...p}
          type="number"
          min={min}
          value={draft[key]}
          onChange={(e) => onChange({ [key]: e.target.value })}
        />
      )}
    </Field>
  );
  return (
    <fieldset className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4" data-testid="section-trade-fields">
      <legend className="mb-1 font-semibold">How it is sold</legend>
      <Field label="Surface" error={issue('finish')}>
        {(p) => (
          <select
            {...p}
            value={draft.finish}
            onChange={(e) => onChange({ finish: e.target.value as TradeDraft['finish'] })}
          >
            <option value="sawn">Sawn</option>
            <option value="planed">Planed all round</option>
          </select>
        )}
      </Field>
      <Field
        label="Moisture"
        hint="Kept apart from treatment: treated timber may be wet from the tank."
        error={issue('moisture')}
      >
        {(p) => (
          <select
            {...p}
            value={draft.moisture}
            onChange={(e) => onChange({ moisture: e.target.value as MoistureState })}
          >
            {Object.entries(MOISTURE_LABEL).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        )}
      </Field>
      {mm('finishedThicknessMm', 'Finished thickness (mm)', 'What it measures; empty: as nominal.')}
      {mm('finishedWidthMm', 'Finished width (mm)', 'Planed 22 × 100 measures about 18 × 94.')}
      {mm('minKeepMm', 'Shortest kept offcut (mm)', "Empty: the yard's setting.")}
      {mm(
        'nominalToleranceMm',
        'Nominal pieces: up to (mm) short',
        "For lines marked nominal, e.g. cladding sold with factory ends. Empty: the yard's setting.",
        0,
      )}
    </fieldset>
  );
}
