// Ids and counts from clients end up in Postgres `integer` columns: anything past 2^31 - 1 would
// fail in the database (a 500), so it is refused here with a field message instead.
import { z } from 'zod';

export const MAX_DB_INT = 2_147_483_647;

/** A row id in a JSON body. */
export const dbIdSchema = (message = 'Choose one from the list.') =>
  z.number().int().positive(message).max(MAX_DB_INT, message);

/** An optional whole number ≥ 0 in a query string ('' counts as missing). */
export const optionalQueryInt = z.preprocess(
  (v) => (v === '' || v === null ? undefined : v),
  z.coerce.number().int().min(0).max(MAX_DB_INT, 'That number is too large.').optional(),
);
