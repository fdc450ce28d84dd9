// POST /api/customers/import – add customers from a CSV body, all or nothing (422 lists bad rows)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { importCustomers } from '@/lib/customers/import-customers';
import { MAX_CUSTOMER_CSV_BYTES } from '@/lib/validations/customers';

// The request guard checks the type (text/csv, else 415) and the size (over 1 MB, 413).
export const POST = route(
  'customers:edit',
  async ({ req }) => NextResponse.json(await importCustomers({ csv: await req.text() }), { status: 201 }),
  { body: 'csv', maxBytes: MAX_CUSTOMER_CSV_BYTES },
);
