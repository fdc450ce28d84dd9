'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { createCustomerRequest } from '@/lib/queries/customers';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

const input = 'mt-1 block w-full rounded border border-bark-soft px-3 py-2 font-normal';

/** Adds a retail customer or a trade account. */
export function CustomerForm() {
  const router = useRouter();
  const [account, setAccount] = useState<'retail' | 'trade'>('retail');
  const create = useApiMutation({
    mutationFn: ({ data }: { data: FormData; form: HTMLFormElement }) => {
      const text = (k: string) => String(data.get(k) ?? '');
      return createCustomerRequest({
        name: text('name'),
        contact: text('contact'),
        phone: text('phone'),
        email: text('email'),
        address: text('address'),
        account,
        ...(account === 'trade' && {
          creditDays: Number(text('creditDays') || 30),
          discountPercent: Number(text('discountPercent') || 0),
        }),
      });
    },
    onSuccess: (_, { form }) => {
      form.reset();
      setAccount('retail');
      router.refresh();
    },
  });
  const message = create.error
    ? { tone: 'error' as const, text: create.error.message }
    : create.data
      ? { tone: 'info' as const, text: `${create.data.name} added.` }
      : null;

  function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    create.mutate({ data: new FormData(e.currentTarget), form: e.currentTarget });
  }

  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" data-testid="customer-form">
      {[
        ['name', 'Name', true],
        ['contact', 'Contact', false],
        ['phone', 'Phone', false],
        ['email', 'E-mail', false],
      ].map(([name, label, required]) => (
        <label key={String(name)} className="font-semibold">
          {label}
          <input
            name={String(name)}
            required={Boolean(required)}
            className={input}
            type={name === 'email' ? 'email' : 'text'}
          />
        </label>
      ))}
      <label className="font-semibold sm:col-span-2">
        Delivery address
        <textarea name="address" rows={2} className={input} />
      </label>
      <label className="font-semibold">
        Account
        <select
          value={account}
          onChange={(e) => setAccount(e.target.value as 'retail' | 'trade')}
          className={input}
        >
          <option value="retail">Retail (prices include VAT)</option>
          <option value="trade">Trade account (ex VAT, credit terms)</option>
        </select>
      </label>
      {account === 'trade' && (
        <div className="grid grid-cols-2 gap-3">
          <label className="font-semibold">
            Credit days
            <input name="creditDays" type="number" min={0} max={120} defaultValue={30} className={input} />
          </label>
          <label className="font-semibold">
            Discount %
            <input name="discountPercent" type="number" min={0} max={50} defaultValue={0} className={input} />
          </label>
        </div>
      )}
      <div className="sm:col-span-2">
        <Button type="submit">Add customer</Button>
      </div>
      {message && (
        <Notice tone={message.tone} className="sm:col-span-2">
          {message.text}
        </Notice>
      )}
    </form>
  );
}
