'use client';

import { useQuery } from '@tanstack/react-query';
import { useDeferredValue, useState } from 'react';
import { Field } from '@/components/ui/field';
import { customersQuery } from '@/lib/queries/customers';
import { NewCustomerFields } from './new-customer-fields';

export const NEW_CUSTOMER = 'new';

type Props = {
  /** The customer already chosen (editing a job). */
  current?: { id: number; name: string } | null;
  /** A name to search for first, e.g. the one written on a frame schedule. */
  suggestedName?: string;
  /** Field errors keyed by API path: customerId, newCustomer.name, … */
  error: (path: string) => string | undefined;
};

/**
 * Chooses a job's customer from the records, searched by name, phone or e-mail, or opens the fields
 * for a new customer made together with the job. Read the choice with `readCustomerChoice`.
 */
export function CustomerPicker({ current, suggestedName = '', error }: Props) {
  const [search, setSearch] = useState(current ? '' : suggestedName);
  const q = useDeferredValue(search.trim());
  const found = useQuery(customersQuery(q));
  const options = found.data ?? [];
  const [chosen, setChosen] = useState<string>(current ? String(current.id) : '');
  const noMatch = found.isSuccess && options.length === 0;
  // One match is taken, none opens a new customer; several wait for the yard hand to choose.
  const guess = noMatch ? NEW_CUSTOMER : options.length === 1 ? String(options[0].id) : '';
  const value = chosen || guess;

  return (
    <div className="grid gap-4 sm:col-span-2 sm:grid-cols-2" data-testid="customer-picker">
      <Field label="Find a customer" hint="Name, phone or e-mail.">
        {(p) => (
          <input
            {...p}
            type="search"
            value={search}
            onChange={(e) => {
              setSearch(e.target.value);
              setChosen('');
            }}
          />
        )}
      </Field>
      <Field label="Customer" error={error('customerId')}>
        {(p) => (
          <select {...p} name="customerId" value={value} onChange={(e) => setChosen(e.target.value)}>
            <option value="" disabled>
              {found.isPending ? 'Looking…' : 'Choose a customer…'}
            </option>
            {current && !options.some((c) => c.id === current.id) && (
              <option value={current.id}>{current.name}</option>
            )}
            {options.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
                {c.account === 'trade' ? ' (trade)' : ''}
                {c.phone ? ` · ${c.phone}` : ''}
              </option>
            ))}
            <option value={NEW_CUSTOMER}>New customer…</option>
          </select>
        )}
      </Field>
      {value === NEW_CUSTOMER && <NewCustomerFields defaultName={search.trim()} error={error} />}
    </div>
  );
}
