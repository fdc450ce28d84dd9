import { queryOptions } from '@tanstack/react-query';
import type { createCustomer } from '@/lib/customers/create-customer';
import type { importCustomers } from '@/lib/customers/import-customers';
import type { listCustomers } from '@/lib/customers/list-customers';
import type { CreateCustomerBodyInput } from '@/lib/validations/customers';
import { fetchJson } from './fetch-json';
import { customerKeys } from './query-keys';
import type { WireOf } from './wire';

export type CustomerRow = WireOf<typeof listCustomers>[number];

export const customersQuery = (q: string) =>
  queryOptions({
    queryKey: customerKeys.search(q),
    queryFn: () =>
      fetchJson<{ customers: CustomerRow[] }>(`/api/customers?q=${encodeURIComponent(q)}`).then(
        (r) => r.customers,
      ),
  });

export const createCustomerRequest = (body: CreateCustomerBodyInput) =>
  fetchJson<WireOf<typeof createCustomer>>('/api/customers', { method: 'POST', body: JSON.stringify(body) });

export const importCustomersRequest = (csvText: string) =>
  fetchJson<WireOf<typeof importCustomers>>('/api/customers/import', {
    method: 'POST',
    headers: { 'content-type': 'text/csv' },
    body: csvText,
  });
