import { z } from 'zod';
import { ACCOUNT_KINDS } from '@/db/enums';

const email = z.union([
  z.literal(''),
  z.string().trim().toLowerCase().email('Enter a valid e-mail address.'),
]);

const customerFields = z.object({
  name: z.string().trim().min(1, 'Enter the customer’s name.').max(120),
  contact: z.string().trim().max(120).default(''),
  email: email.default(''),
  phone: z.string().trim().max(40).default(''),
  address: z.string().trim().max(500).default(''),
  account: z.enum(ACCOUNT_KINDS, { message: 'The account is "retail" or "trade".' }),
  creditDays: z.number().int('Credit terms are whole days.').min(0).max(120).nullable().optional(),
  discountPercent: z.number().int('The discount is a whole percent.').min(0).max(50).default(0),
});

const tradeTermsOnlyForTrade = (v: {
  account?: string;
  creditDays?: number | null;
  discountPercent?: number;
}) => v.account !== 'retail' || ((v.creditDays ?? null) === null && (v.discountPercent ?? 0) === 0);
const tradeTermsMessage = {
  message: 'Credit terms and discounts are for trade accounts only.',
  path: ['account'],
};

/** POST /api/customers, and a customer made inline with a new job */
export const createCustomerBodySchema = customerFields.refine(tradeTermsOnlyForTrade, tradeTermsMessage);
export type CreateCustomerBody = z.infer<typeof createCustomerBodySchema>;
export type CreateCustomerBodyInput = z.input<typeof createCustomerBodySchema>;

/** Who a new job is for: an existing customer record, or a new one made together with the job. */
export type CustomerChoice = { customerId: number } | { newCustomer: CreateCustomerBodyInput };

/** PATCH /api/customers/[customerId] */
export const updateCustomerBodySchema = customerFields
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change.');
export type UpdateCustomerBody = z.infer<typeof updateCustomerBodySchema>;
export type UpdateCustomerBodyInput = z.input<typeof updateCustomerBodySchema>;

/** GET /api/customers?q= */
export const listCustomersQuerySchema = z.object({ q: z.string().trim().max(100).optional() });

/** One CSV row of the customer import, as form fields; then the same rules as the form. */
export function customerFromCsvRow(row: Record<string, string | undefined>) {
  const number = (text?: string) => (text?.trim() ? Number(text) : undefined);
  return createCustomerBodySchema.safeParse({
    name: row.name ?? '',
    contact: row.contact,
    email: row.email,
    phone: row.phone,
    address: row.address,
    account: row.account?.trim().toLowerCase() || 'retail',
    creditDays: number(row.creditDays) ?? null,
    discountPercent: number(row.discountPercent),
  });
}

/** Largest customer CSV the import accepts, in bytes. */
export const MAX_CUSTOMER_CSV_BYTES = 1024 * 1024;
