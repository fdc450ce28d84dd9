// GET /api/customers?q= – customers by name, search; POST /api/customers – add a customer
import { NextResponse } from 'next/server';
import { parseJsonBody, route } from '@/lib/api/route';
import { createCustomer } from '@/lib/customers/create-customer';
import { listCustomers } from '@/lib/customers/list-customers';
import { createCustomerBodySchema, listCustomersQuerySchema } from '@/lib/validations/customers';

export const GET = route('customers:read', async ({ req }) => {
  const query = listCustomersQuerySchema.parse({ q: req.nextUrl.searchParams.get('q') ?? undefined });
  return NextResponse.json({ customers: await listCustomers(query) });
});

export const POST = route('customers:edit', async ({ req }) => {
  const body = await parseJsonBody(req, createCustomerBodySchema);
  return NextResponse.json(await createCustomer({ body }), { status: 201 });
});
