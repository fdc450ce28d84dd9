import { z } from 'zod';
import { toleranceMmSchema } from './jobs';
import { MOISTURE_STATES } from '@/db/enums';
import { dbIdSchema } from './db-id';

const wholeMm = (what: string, max = 12_000) =>
  z
    .number({ message: `Enter the ${what} in whole millimetres.` })
    .int(`Enter the ${what} in whole millimetres.`)
    .min(1, `The ${what} must be more than 0.`)
    .max(max, `The ${what} may be at most ${max} mm.`);
const pence = z
  .number({ message: 'Enter a price.' })
  .int('Prices are whole pence.')
  .min(0, 'A price cannot be negative.')
  .max(10_000_000);
const text = (max: number) => z.string().trim().max(max, `At most ${max} characters.`);

export const stockLengthInputSchema = z.object({
  /** Present for an existing stock length, absent for a new one. */
  id: dbIdSchema().optional(),
  lengthMm: wholeMm('stock length'),
  pricePence: pence,
  /** What the yard paid for one length (reports value waste and margin at cost); null: not entered. */
  costPence: pence.nullable().optional(),
  /** Unlimited lengths have no on-hand count; a counted length's count changes only through movements. */
  unlimited: z.boolean(),
  active: z.boolean().default(true),
});
export type StockLengthInput = z.infer<typeof stockLengthInputSchema>;

export const sectionBodySchema = z
  .object({
    code: text(20)
      .min(1, 'Enter a short code.')
      .regex(/^[A-Za-z0-9_-]+$/, 'Codes use letters, digits, dashes and underscores.'),
    name: text(80).min(1, 'Enter a name.'),
    thicknessMm: wholeMm('thickness', 500),
    widthMm: wholeMm('width', 1000),
    species: text(60).default(''),
    grade: text(40).default(''),
    treatment: text(60).default(''),
    // Left out: unchanged (or the database default for a new section).
    finish: z.enum(['sawn', 'planed'], { message: 'A section is sawn or planed.' }).optional(),
    finishedThicknessMm: wholeMm('finished thickness', 500).nullable().optional(),
    finishedWidthMm: wholeMm('finished width', 1000).nullable().optional(),
    moisture: z.enum(MOISTURE_STATES, { message: 'Moisture is kiln dried, air dried or green.' }).optional(),
    /** Shortest remainder worth keeping of this section; null: the yard's minimum kept offcut. */
    minKeepMm: wholeMm('minimum keep length', 6000).nullable().optional(),
    /** How short a nominal piece of this section may be cut; null: the yard's length tolerance. */
    nominalToleranceMm: toleranceMmSchema.nullable().optional(),
    active: z.boolean().default(true),
    lengths: z
      .array(stockLengthInputSchema)
      .max(30)
      .refine(
        (ls) => new Set(ls.map((l) => l.lengthMm)).size === ls.length,
        'Each stock length may appear once.',
      ),
  })
  // Planing takes wood off: a finished size above the nominal one is a typing slip.
  .refine((s) => (s.finishedThicknessMm ?? 0) <= s.thicknessMm, {
    message: 'The finished thickness cannot be more than the nominal thickness.',
    path: ['finishedThicknessMm'],
  })
  .refine((s) => (s.finishedWidthMm ?? 0) <= s.widthMm, {
    message: 'The finished width cannot be more than the nominal width.',
    path: ['finishedWidthMm'],
  });
export type SectionBody = z.infer<typeof sectionBodySchema>;
export type SectionBodyInput = z.input<typeof sectionBodySchema>;

export const receiptBodySchema = z.object({
  reference: text(80).min(1, 'Enter the delivery note or supplier reference.'),
  lines: z
    .array(
      z.object({
        stockLengthId: dbIdSchema(),
        quantity: z.number().int('Count whole boards.').min(1, 'Receive at least one board.').max(10_000),
      }),
    )
    .min(1, 'Add at least one line.')
    .max(100),
});
export type ReceiptBody = z.infer<typeof receiptBodySchema>;
export type ReceiptBodyInput = z.input<typeof receiptBodySchema>;

export const stocktakeBodySchema = z.object({
  reason: text(200).min(1, 'Say why the count changed (e.g. monthly count, damaged boards).'),
  counts: z
    .array(
      z.object({
        stockLengthId: dbIdSchema(),
        counted: z.number().int('Count whole boards.').min(0, 'A count cannot be negative.').max(100_000),
      }),
    )
    .min(1, 'Count at least one stock length.')
    .max(500),
});
export type StocktakeBody = z.infer<typeof stocktakeBodySchema>;
export type StocktakeBodyInput = z.input<typeof stocktakeBodySchema>;
