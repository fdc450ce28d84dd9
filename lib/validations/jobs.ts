import { z } from 'zod';
import { JOB_LIST_SHOWS, JOB_STATUSES } from '@/db/enums';
import { MAX_TOLERANCE_MM } from '@/lib/nominal/tolerance';
import { lengthInputSchema } from '@/lib/units/length-input-schema';
import { createCustomerBodySchema } from './customers';
import { dbIdSchema } from './db-id';

const dueDate = z.string().refine(isCalendarDate, 'Use a real date like 2026-12-24.');

/** "2026-02-30" is refused: the date must exist, not only look right. */
function isCalendarDate(text: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(text)) return false;
  const time = Date.parse(`${text}T00:00:00Z`);
  return !Number.isNaN(time) && new Date(time).toISOString().startsWith(text);
}
const email = z.union([
  z.literal(''),
  z.string().trim().toLowerCase().email('Enter a valid e-mail address.'),
]);

const deliveryChargePence = z.number().int('The delivery charge is in whole pence.').min(0).max(100_000_00);

/**
 * POST /api/jobs. The reference is generated (next J-number) when left out. The customer is a
 * record (`customerId`), a new record made with the job (`newCustomer`), or a name, which finds
 * that customer or makes a new retail one.
 */
export const createJobBodySchema = z
  .object({
    customerId: z.number().int().positive().optional(),
    newCustomer: createCustomerBodySchema.optional(),
    customerName: z.string().trim().min(1, 'Enter the customer.').max(120).optional(),
    deliveryChargePence: deliveryChargePence.optional(),
    reference: z
      .string()
      .trim()
      .max(40)
      .optional()
      .transform((v) => v || undefined),
    dueDate: dueDate.nullable().optional(),
    customerEmail: email.optional(),
    notes: z.string().max(2000).optional(),
  })
  .refine((v) => [v.customerId, v.newCustomer, v.customerName].filter((x) => x !== undefined).length === 1, {
    message: 'Choose a customer or enter a new one.',
    path: ['customerId'],
  });
export type CreateJobBody = z.infer<typeof createJobBodySchema>;
export type CreateJobBodyInput = z.input<typeof createJobBodySchema>;

/** PATCH /api/jobs/[jobId]: edit details, cancel (status "cancelled") or reopen a cancelled job (status "draft"). */
export const updateJobBodySchema = z
  .object({
    customerName: z.string().trim().min(1, 'Enter the customer.').max(120),
    reference: z.string().trim().min(1, 'Enter a reference.').max(40),
    dueDate: dueDate.nullable(),
    customerEmail: email,
    customerId: z.number().int().positive(),
    newCustomer: createCustomerBodySchema,
    deliveryChargePence,
    notes: z.string().max(2000),
    status: z.enum(['cancelled', 'draft'], { message: 'A job can only be cancelled or reopened here.' }),
  })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change.');
export type UpdateJobBody = z.infer<typeof updateJobBodySchema>;
export type UpdateJobBodyInput = z.input<typeof updateJobBodySchema>;

/** GET /api/jobs query: search text (reference or customer), status, due date range. */
export const listJobsQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  customer: z.string().trim().max(120).optional(),
  status: z.enum(JOB_STATUSES).optional(),
  /** Open jobs unless asked otherwise; a chosen status overrides it. */
  show: z.enum(JOB_LIST_SHOWS).optional(),
  dueFrom: dueDate.optional(),
  dueTo: dueDate.optional(),
});
export type ListJobsQuery = z.infer<typeof listJobsQuerySchema>;

const quantity = z
  .number({ message: 'Quantity must be a number.' })
  .int('Quantity must be a whole number.')
  .min(1, 'Quantity must be at least 1.')
  .max(10_000, 'Quantity must be at most 10 000.');

/** Millimetres a nominal piece may be cut short; 0 = exact. */
export const toleranceMmSchema = z
  .number({ message: 'Enter how far short it may be, in whole millimetres.' })
  .int('Enter how far short it may be, in whole millimetres.')
  .min(0, 'A tolerance cannot be negative; 0 means exact.')
  .max(MAX_TOLERANCE_MM, `A nominal piece may be at most ${MAX_TOLERANCE_MM} mm short.`);

const itemFields = {
  sectionId: dbIdSchema('Choose a section.'),
  length: lengthInputSchema,
  // The length as typed, kept so a too-short bare number can be answered with "did you mean 2.4 m?".
  lengthText: z.string().max(40).optional(),
  quantity,
  label: z.string().trim().max(100),
  note: z.string().trim().max(500),
  // Nominal without a figure takes the section's tolerance, then the yard's; a figure wins (0 = exact).
  nominal: z.boolean(),
  toleranceMm: toleranceMmSchema.nullable(),
};

/** A tolerance must leave some of the piece: 2400 may be 5 mm short, 40 may not be 40 mm short. */
const toleranceShorterThanPiece = (v: { length?: number; toleranceMm?: number | null }) =>
  v.length === undefined || v.toleranceMm === undefined || v.toleranceMm === null || v.toleranceMm < v.length;
const toleranceIssue = { message: 'The tolerance must be shorter than the piece.', path: ['toleranceMm'] };
const jobItemFields = z
  .object({
    ...itemFields,
    label: itemFields.label.default(''),
    note: itemFields.note.default(''),
    nominal: itemFields.nominal.default(false),
    toleranceMm: itemFields.toleranceMm.optional(),
  })
  .refine(toleranceShorterThanPiece, toleranceIssue);

/** Copies a typed length into `lengthText` before it is read as millimetres. */
const keepTypedLength = (body: unknown) =>
  body && typeof body === 'object' && typeof (body as { length?: unknown }).length === 'string'
    ? { ...body, lengthText: (body as { length: string }).length }
    : body;

/** One line item from the editable table; length in mm or any notation lib/units reads. */
export const jobItemBodySchema = z.preprocess(keepTypedLength, jobItemFields);
export type JobItemBodyInput = z.input<typeof jobItemFields>;
export type JobItemFields = z.output<typeof jobItemFields>;

/** A partial change: fields left out keep their values (no defaults here, or they would wipe them). */
const updateJobItemFields = z
  .object(itemFields)
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change.')
  .refine(toleranceShorterThanPiece, toleranceIssue);
export const updateJobItemBodySchema = z.preprocess(keepTypedLength, updateJobItemFields);
export type UpdateJobItemBodyInput = z.input<typeof updateJobItemFields>;

/** Largest cut list the import accepts, in bytes. */
export const MAX_IMPORT_BYTES = 5 * 1024 * 1024;
