// CSV import of customers, all or nothing: every row is checked first, and one bad row means no
// customer is added and the answer lists each bad row with its reason.
import 'server-only';
import Papa from 'papaparse';
import { getDb } from '@/db';
import { customers } from '@/db/schema';
import { AppError } from '@/lib/errors';
import { customerFromCsvRow, type CreateCustomerBody } from '@/lib/validations/customers';

const HEADERS: Record<string, string> = {
  name: 'name',
  customer: 'name',
  contact: 'contact',
  email: 'email',
  'e-mail': 'email',
  phone: 'phone',
  address: 'address',
  account: 'account',
  'credit days': 'creditDays',
  creditdays: 'creditDays',
  discount: 'discountPercent',
  'discount percent': 'discountPercent',
  discountpercent: 'discountPercent',
};

export async function importCustomers({ csv }: { csv: string }) {
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => HEADERS[h.trim().toLowerCase()] ?? h.trim(),
  });
  if (!parsed.meta.fields?.includes('name')) throw new AppError('invalid', 'The CSV needs a "name" column.');
  const rows: CreateCustomerBody[] = [];
  const errors: { row: number; message: string }[] = [];
  parsed.data.forEach((raw, i) => {
    const result = customerFromCsvRow(raw);
    if (result.success) rows.push(result.data);
    else
      errors.push({
        row: i + 2,
        message: result.error.issues.map((x) => `${x.path.join('.') || 'row'}: ${x.message}`).join('; '),
      });
  });
  if (errors.length)
    throw new AppError(
      'invalid',
      `${errors.length} row${errors.length > 1 ? 's need' : ' needs'} fixing; no customers were added.`,
      { rows: errors },
    );
  if (!rows.length) throw new AppError('invalid', 'The CSV has no customer rows.');
  const db = await getDb();
  const created = await db
    .insert(customers)
    .values(rows.map((r) => ({ ...r, creditDays: r.account === 'trade' ? (r.creditDays ?? 30) : null })))
    .returning({ id: customers.id });
  return { imported: created.length };
}
