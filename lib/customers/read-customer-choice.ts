import type { CustomerChoice } from '@/lib/validations/customers';

/** The customer chosen in a form holding the customer picker: a record's id, or a new customer's fields. */
export function readCustomerChoice(form: FormData): CustomerChoice | Record<string, never> {
  const chosen = String(form.get('customerId') ?? '');
  if (chosen === 'new') {
    const text = (name: string) => String(form.get(name) ?? '').trim();
    return {
      newCustomer: {
        name: text('newCustomerName'),
        phone: text('newCustomerPhone'),
        account: text('newCustomerAccount') === 'trade' ? 'trade' : 'retail',
      },
    };
  }
  const id = Number(chosen);
  return Number.isInteger(id) && id > 0 ? { customerId: id } : {};
}
