// POST /api/customers/import – add customers from a CSV body, all or nothing (422 lists bad rows)
import { NextResponse } from 'next/server';
import { route } from '@/lib/api/route';
import { importCustomers } from '@/lib/customers/import-customers';
import { AppError } from '@/lib/errors';
import { MAX_CUSTOMER_CSV_BYTES } from '@/lib/validations/customers';

export const POST = route('customers:edit', async ({ req }) => {
  if (!(req.headers.get('content-type') ?? '').startsWith('text/csv')) {
    throw new AppError('invalid', 'Send the customers as a CSV file (content-type text/csv).');
  }
  const csv = await req.text();
  if (Buffer.byteLength(csv) > MAX_CUSTOMER_CSV_BYTES) throw new AppError('invalid', 'The CSV is over 1 MB.');
  return NextResponse.json(await importCustomers({ csv }), { status: 201 });
});
