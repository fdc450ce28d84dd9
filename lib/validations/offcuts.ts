import { z } from 'zod';
import { OFFCUT_STATUSES } from '@/db/enums';
import { dbIdSchema, optionalQueryInt } from './db-id';

const optionalInt = optionalQueryInt;

export const OFFCUT_SORTS = ['age', 'length', 'section', 'location', 'tag'] as const;

/** GET /api/offcuts query: every filter optional. */
export const offcutListQuerySchema = z.object({
  q: z.string().trim().max(80).optional(),
  sectionId: optionalInt,
  minLengthMm: optionalInt,
  maxLengthMm: optionalInt,
  location: z.string().trim().max(60).optional(),
  /** Offcuts at least this many days old. */
  minAgeDays: optionalInt,
  status: z.enum([...OFFCUT_STATUSES, 'on_rack', 'all']).default('on_rack'),
  sort: z.enum(OFFCUT_SORTS).default('age'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type OffcutListQuery = z.infer<typeof offcutListQuerySchema>;

/** POST /api/offcuts/move: one offcut or many, to one rack location. */
export const moveOffcutsBodySchema = z
  .object({
    ids: z.array(dbIdSchema()).min(1, 'Choose at least one offcut.').max(1000),
    location: z.string().trim().min(1, 'Enter a rack location.').max(60, 'At most 60 characters.'),
  })
  .strict();
export type MoveOffcutsBodyInput = z.input<typeof moveOffcutsBodySchema>;

export const scrapOffcutsBodySchema = z.object({
  ids: z.array(dbIdSchema()).min(1, 'Choose at least one offcut.').max(1000),
  reason: z.string().trim().min(1, 'Say why these offcuts are scrapped.').max(200),
});
export type ScrapOffcutsBody = z.infer<typeof scrapOffcutsBodySchema>;
export type ScrapOffcutsBodyInput = z.input<typeof scrapOffcutsBodySchema>;

export const importOffcutsBodySchema = z.object({
  csv: z.string().min(1, 'The file is empty.').max(2_000_000, 'The file is too large (2 MB at most).'),
});
export type ImportOffcutsBodyInput = z.input<typeof importOffcutsBodySchema>;
