// PATCH /api/customers/[customerId] – edit a customer (their jobs follow the new name and phone)
import { NextResponse } from 'next/server';
import { parseId, parseJsonBody, route } from '@/lib/api/route';
import { updateCustomer } from '@/lib/customers/update-customer';
import { updateCustomerBodySchema } from '@/lib/validations/customers';

export const PATCH = route<{ customerId: string }>('customers:edit', async ({ req, params }) => {
  const customerId = parseId(params.customerId, 'That customer');
  const body = await parseJsonBody(req, updateCustomerBodySchema);
  return NextResponse.json(await updateCustomer({ customerId, body }));
});
