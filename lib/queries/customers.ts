import { queryOptions } from '@tanstack/react-query';
import type { Customer } from '@/db/schema';
import { fetchJson } from './fetch-json';
import { customerKeys } from './query-keys';

export type NewCustomerBody = {
  name: string;
  account: 'retail' | 'trade';
  phone?: string;
  email?: string;
};

/** Who a new job is for: an existing customer record, or a new one made together with the job. */
export type CustomerChoice = { customerId: number } | { newCustomer: NewCustomerBody };

export const customersQuery = (q: string) =>
  queryOptions({
    queryKey: customerKeys.search(q),
    queryFn: () =>
      fetchJson<{ customers: Customer[] }>(`/api/customers?q=${encodeURIComponent(q)}`).then(
        (r) => r.customers,
      ),
  });
