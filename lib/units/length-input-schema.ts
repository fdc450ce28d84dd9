import { z } from 'zod';
import { LONGEST_LENGTH_MM } from './length-constants';
import { parseLength } from './parse-length';

/**
 * A length from a form or an API body: a number of whole millimetres, or text in any notation
 * parseLength reads ("2400", "2.4 m", "7'-8 5/8\""). Outputs whole millimetres, always more than 0.
 */
export const lengthInputSchema = z.union([z.number(), z.string()]).transform((value, ctx): number => {
  let mm: number;
  if (typeof value === 'number') {
    if (!Number.isInteger(value)) {
      ctx.addIssue({ code: 'custom', message: 'Length must be whole millimetres.' });
      return z.NEVER;
    }
    mm = value;
  } else {
    const parsed = parseLength(value);
    if (!parsed.ok) {
      ctx.addIssue({ code: 'custom', message: parsed.message });
      return z.NEVER;
    }
    mm = parsed.mm;
  }
  if (mm <= 0) {
    ctx.addIssue({ code: 'custom', message: 'Length must be more than 0.' });
    return z.NEVER;
  }
  if (mm > LONGEST_LENGTH_MM) {
    ctx.addIssue({ code: 'custom', message: 'Length is longer than 1 km; check the units.' });
    return z.NEVER;
  }
  return mm;
});
