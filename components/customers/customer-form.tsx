'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { fetchJson } from '@/lib/queries/fetch-json';

const input = 'mt-1 block w-full rounded border border-bark-soft px-3 py-2 font-normal';

/** Adds a retail customer or a trade account. */
export function CustomerForm() {
  const router = useRouter();
  const [account, setAccount] = useState<'retail' | 'trade'>('retail');
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const f = new FormData(form);
    const text = (k: string) => String(f.get(k) ?? '');
    try {
      const created = await fetchJson<{ name: string }>('/api/customers', {
        method: 'POST',
        body: JSON.stringify({
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
        }),
      });
      form.reset();
      setAccount('retail');
      setMessage({ tone: 'info', text: `${created.name} added.` });
      router.refresh();
    } catch (err) {
      setMessage({ tone: 'error', text: (err as Error).message });
    }
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
