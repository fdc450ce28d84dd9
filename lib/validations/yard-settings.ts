import { z } from 'zod';
import { DISPLAY_UNITS, REGIONS } from '@/db/enums';
import { MAX_TOLERANCE_MM } from '@/lib/nominal/tolerance';

const mm = (what: string, max: number, min = 0) =>
  z
    .number({ message: `Enter the ${what} in whole millimetres.` })
    .int(`Enter the ${what} in whole millimetres.`)
    .min(min, `The ${what} must be at least ${min} mm.`)
    .max(max, `The ${what} may be at most ${max} mm.`);

export const yardSettingsBodySchema = z.object({
  yardName: z.string().trim().min(1, 'Enter the yard name.').max(80),
  kerfMm: mm('kerf', 20),
  trimMm: mm('end trim', 100),
  minOffcutMm: mm('shortest kept offcut', 3000, 50),
  minSafePieceMm: mm('minimum safe piece length', 1000, 50).optional(),
  // How short a line marked nominal may be cut, unless its section says otherwise.
  lengthToleranceMm: mm('nominal length tolerance', MAX_TOLERANCE_MM).optional(),
  displayUnit: z.enum(DISPLAY_UNITS, { message: 'Choose millimetres or feet and inches.' }),
  region: z.enum(REGIONS, { message: 'Choose the United Kingdom or North America.' }).optional(),
  perCutChargePence: z.number().int('Whole pence.').min(0, 'A charge cannot be negative.').max(10_000),
  clearOffcutsAfterDays: z.number().int('Whole days.').min(7, 'At least a week.').max(3650),
  // Quotes and payment (optional, so older clients that do not send them keep working).
  vatRateBasisPoints: z.number().int('Hundredths of a percent: 2000 is 20 %.').min(0).max(5000).optional(),
  yardAddress: z.string().trim().max(300).optional(),
  vatNumber: z.string().trim().max(30).optional(),
  quoteValidityDays: z.number().int('Whole days.').min(1).max(365).optional(),
  minimumChargePence: z.number().int('Whole pence.').min(0).max(1_000_000).optional(),
  offcutRatePercent: z.number().int('A whole percent.').min(0).max(100).optional(),
  remaindersGoTo: z.enum(['yard', 'customer']).optional(),
  depositPercent: z.number().int('A whole percent.').min(0).max(100).optional(),
});
export type YardSettingsBody = z.infer<typeof yardSettingsBodySchema>;
export type YardSettingsBodyInput = z.input<typeof yardSettingsBodySchema>;
