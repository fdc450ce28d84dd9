import { Field } from '@/components/ui/field';

/** Name, account kind and phone of a customer made inline with a job; the rest is edited under Customers. */
export function NewCustomerFields({
  defaultName,
  error,
}: {
  defaultName: string;
  error: (path: string) => string | undefined;
}) {
  return (
    <fieldset
      className="grid gap-4 rounded-lg border-2 border-shaving p-4 sm:col-span-2 sm:grid-cols-2"
      data-testid="new-customer-fields"
    >
      <legend className="px-1 text-sm font-semibold">New customer</legend>
      <Field label="Customer name" error={error('newCustomer.name')}>
        {(p) => <input {...p} name="newCustomerName" defaultValue={defaultName} autoComplete="off" />}
      </Field>
      <Field label="Customer phone" error={error('newCustomer.phone')}>
        {(p) => <input {...p} name="newCustomerPhone" type="tel" autoComplete="off" />}
      </Field>
      <Field
        label="Account"
        hint="Trade accounts get 30 days' credit; change terms under Customers."
        error={error('newCustomer.account')}
      >
        {(p) => (
          <select {...p} name="newCustomerAccount" defaultValue="retail">
            <option value="retail">Retail (prices include VAT)</option>
            <option value="trade">Trade account (prices ex VAT)</option>
          </select>
        )}
      </Field>
    </fieldset>
  );
}
