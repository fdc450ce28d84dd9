'use client';

import { Field } from '@/components/ui/field';
import type { DisplayUnit } from '@/lib/units';

export type ScheduleDetails = {
  name: string;
  customerName: string;
  customerEmail: string;
  unit: DisplayUnit;
};

/** Name, customer and their e-mail, and the unit lengths are shown in. */
export function ScheduleDetailsFields({
  value,
  errors,
  onChange,
}: {
  value: ScheduleDetails;
  errors: Record<string, string>;
  onChange: (v: ScheduleDetails) => void;
}) {
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <Field label="Schedule name" error={errors.name}>
        {(p) => (
          <input
            {...p}
            value={value.name}
            onChange={(e) => onChange({ ...value, name: e.target.value })}
            autoComplete="off"
          />
        )}
      </Field>
      <Field label="Customer" error={errors.customerName}>
        {(p) => (
          <input
            {...p}
            value={value.customerName}
            onChange={(e) => onChange({ ...value, customerName: e.target.value })}
            autoComplete="off"
          />
        )}
      </Field>
      <Field label="Customer e-mail" hint="Goes with the cut list to the job" error={errors.customerEmail}>
        {(p) => (
          <input
            {...p}
            type="email"
            value={value.customerEmail}
            onChange={(e) => onChange({ ...value, customerEmail: e.target.value })}
            autoComplete="off"
          />
        )}
      </Field>
      <Field label="Show lengths in" hint={'Type lengths either way: 2400, 2.4 m or 7\'-10 1/2"'}>
        {(p) => (
          <select
            {...p}
            value={value.unit}
            onChange={(e) => onChange({ ...value, unit: e.target.value as DisplayUnit })}
          >
            <option value="mm">Millimetres</option>
            <option value="imperial">Feet and inches</option>
          </select>
        )}
      </Field>
    </div>
  );
}
