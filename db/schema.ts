// Kerfwise database schema. Every length is a whole number of millimetres; every price is whole pence.
import { sql } from 'drizzle-orm';
import {
  boolean,
  date,
  index,
  integer,
  jsonb,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';

import {
  BOARD_STATUSES,
  DISPLAY_UNITS,
  JOB_STATUSES,
  MOVEMENT_KINDS,
  OFFCUT_STATUSES,
  PLAN_RUN_STATUSES,
  PLAN_STATUSES,
  ROLES,
} from './enums';

export * from './enums';

const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow();

export const users = pgTable('users', {
  id: serial('id').primaryKey(),
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  role: text('role', { enum: ROLES }).notNull(),
  passwordHash: text('password_hash').notNull(),
  disabled: boolean('disabled').notNull().default(false),
  createdAt: createdAt(),
});
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

// One row (id = 1): the yard's cutting and display settings.
export const yardSettings = pgTable('yard_settings', {
  id: integer('id').primaryKey().default(1),
  yardName: text('yard_name').notNull(),
  kerfMm: integer('kerf_mm').notNull().default(3),
  trimMm: integer('trim_mm').notNull().default(5),
  minOffcutMm: integer('min_offcut_mm').notNull().default(300),
  displayUnit: text('display_unit', { enum: DISPLAY_UNITS }).notNull().default('mm'),
  perCutChargePence: integer('per_cut_charge_pence').notNull().default(25),
  clearOffcutsAfterDays: integer('clear_offcuts_after_days').notNull().default(90),
  lengthToleranceMm: integer('length_tolerance_mm').notNull().default(2),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
export type YardSettings = typeof yardSettings.$inferSelect;

export const sections = pgTable('sections', {
  id: serial('id').primaryKey(),
  code: text('code').notNull().unique(),
  name: text('name').notNull(),
  thicknessMm: integer('thickness_mm').notNull(),
  widthMm: integer('width_mm').notNull(),
  species: text('species').notNull().default(''),
  grade: text('grade').notNull().default(''),
  treatment: text('treatment').notNull().default(''),
  finish: text('finish', { enum: ['sawn', 'planed'] })
    .notNull()
    .default('sawn'),
  active: boolean('active').notNull().default(true),
  createdAt: createdAt(),
});
export type Section = typeof sections.$inferSelect;
export type NewSection = typeof sections.$inferInsert;

export const stockLengths = pgTable(
  'stock_lengths',
  {
    id: serial('id').primaryKey(),
    sectionId: integer('section_id')
      .notNull()
      .references(() => sections.id),
    lengthMm: integer('length_mm').notNull(),
    pricePence: integer('price_pence').notNull(),
    // null: the yard treats this length as always available.
    onHand: integer('on_hand'),
    active: boolean('active').notNull().default(true),
  },
  (t) => [uniqueIndex('stock_lengths_section_length').on(t.sectionId, t.lengthMm)],
);
export type StockLength = typeof stockLengths.$inferSelect;
export type NewStockLength = typeof stockLengths.$inferInsert;

export const offcuts = pgTable(
  'offcuts',
  {
    id: serial('id').primaryKey(),
    tag: text('tag').notNull().unique(),
    sectionId: integer('section_id')
      .notNull()
      .references(() => sections.id),
    lengthMm: integer('length_mm').notNull(),
    location: text('location').notNull().default(''),
    status: text('status', { enum: OFFCUT_STATUSES }).notNull().default('available'),
    origin: text('origin').notNull().default(''),
    originPlanId: integer('origin_plan_id'),
    reservedByPlanId: integer('reserved_by_plan_id'),
    scrapReason: text('scrap_reason'),
    createdAt: createdAt(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('offcuts_section_status').on(t.sectionId, t.status)],
);
export type Offcut = typeof offcuts.$inferSelect;
export type NewOffcut = typeof offcuts.$inferInsert;

export const frameSchedules = pgTable('frame_schedules', {
  id: serial('id').primaryKey(),
  name: text('name').notNull(),
  customerName: text('customer_name').notNull().default(''),
  unit: text('unit', { enum: DISPLAY_UNITS }).notNull().default('mm'),
  panels: jsonb('panels')
    .notNull()
    .default(sql`'[]'::jsonb`),
  createdBy: integer('created_by').references(() => users.id),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
export type FrameSchedule = typeof frameSchedules.$inferSelect;
export type NewFrameSchedule = typeof frameSchedules.$inferInsert;

export const jobs = pgTable('jobs', {
  id: serial('id').primaryKey(),
  reference: text('reference').notNull().unique(),
  customerName: text('customer_name').notNull(),
  customerEmail: text('customer_email').notNull().default(''),
  customerPhone: text('customer_phone').notNull().default(''),
  dueDate: date('due_date', { mode: 'string' }),
  status: text('status', { enum: JOB_STATUSES }).notNull().default('draft'),
  notes: text('notes').notNull().default(''),
  // Set when the saw could not complete the job from what the yard holds.
  officeFlag: text('office_flag'),
  frameScheduleId: integer('frame_schedule_id').references(() => frameSchedules.id),
  createdBy: integer('created_by').references(() => users.id),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
export type Job = typeof jobs.$inferSelect;
export type NewJob = typeof jobs.$inferInsert;

export const jobItems = pgTable('job_items', {
  id: serial('id').primaryKey(),
  jobId: integer('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' }),
  sectionId: integer('section_id')
    .notNull()
    .references(() => sections.id),
  lengthMm: integer('length_mm').notNull(),
  quantity: integer('quantity').notNull(),
  label: text('label').notNull().default(''),
  note: text('note').notNull().default(''),
  // Angle of an angled cut in tenths of a degree (frame schedules), null for square cuts.
  angleTenths: integer('angle_tenths'),
  position: integer('position').notNull().default(0),
});
export type JobItem = typeof jobItems.$inferSelect;
export type NewJobItem = typeof jobItems.$inferInsert;

// One solver run for a job. `sections` holds, per section, exactly what the solver was given and returned.
export const plans = pgTable('plans', {
  id: serial('id').primaryKey(),
  jobId: integer('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' }),
  status: text('status', { enum: PLAN_STATUSES }).notNull().default('planned'),
  settings: jsonb('settings').notNull(),
  sections: jsonb('sections').notNull(),
  totals: jsonb('totals').notNull(),
  pricePence: integer('price_pence').notNull().default(0),
  // The quote: { lines, materials, cutting, total } in pounds (lib/pricing).
  price: jsonb('price'),
  createdBy: integer('created_by').references(() => users.id),
  createdAt: createdAt(),
  releasedAt: timestamp('released_at', { withTimezone: true }),
});
export type Plan = typeof plans.$inferSelect;
export type NewPlan = typeof plans.$inferInsert;

// A planning request handed to the solver workers (server mode). The worker stores the plan and
// sets plan_id in one transaction, so a retried run never stores a second plan.
export const planRuns = pgTable(
  'plan_runs',
  {
    id: serial('id').primaryKey(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    status: text('status', { enum: PLAN_RUN_STATUSES }).notNull().default('queued'),
    overrides: jsonb('overrides').notNull(),
    sectionsTotal: integer('sections_total').notNull().default(0),
    sectionsDone: integer('sections_done').notNull().default(0),
    attempts: integer('attempts').notNull().default(0),
    planId: integer('plan_id').references(() => plans.id, { onDelete: 'set null' }),
    error: text('error'),
    createdBy: integer('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('plan_runs_job_idx').on(t.jobId)],
);
export type PlanRun = typeof planRuns.$inferSelect;

// The boards of a plan in saw order: what the operator fetches, cuts and confirms.
export const planBoards = pgTable(
  'plan_boards',
  {
    id: serial('id').primaryKey(),
    planId: integer('plan_id')
      .notNull()
      .references(() => plans.id, { onDelete: 'cascade' }),
    boardNo: integer('board_no').notNull(),
    sectionId: integer('section_id')
      .notNull()
      .references(() => sections.id),
    source: text('source', { enum: ['stock', 'offcut'] }).notNull(),
    stockLengthId: integer('stock_length_id').references(() => stockLengths.id),
    offcutId: integer('offcut_id').references(() => offcuts.id),
    lengthMm: integer('length_mm').notNull(),
    trimMm: integer('trim_mm').notNull().default(0),
    // [{ pieceId, label, lengthMm, markMm }] in cut order.
    pieces: jsonb('pieces').notNull(),
    remainderMm: integer('remainder_mm').notNull(),
    keepRemainder: boolean('keep_remainder').notNull(),
    status: text('status', { enum: BOARD_STATUSES }).notNull().default('pending'),
    doneAt: timestamp('done_at', { withTimezone: true }),
    doneBy: integer('done_by').references(() => users.id),
    newOffcutId: integer('new_offcut_id').references(() => offcuts.id),
    defectReason: text('defect_reason'),
  },
  (t) => [uniqueIndex('plan_boards_plan_board').on(t.planId, t.boardNo)],
);
export type PlanBoard = typeof planBoards.$inferSelect;
export type NewPlanBoard = typeof planBoards.$inferInsert;

// The audit trail: every change to on-hand stock or to an offcut is one row.
export const stockMovements = pgTable(
  'stock_movements',
  {
    id: serial('id').primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    kind: text('kind', { enum: MOVEMENT_KINDS }).notNull(),
    userId: integer('user_id').references(() => users.id),
    sectionId: integer('section_id')
      .notNull()
      .references(() => sections.id),
    stockLengthId: integer('stock_length_id').references(() => stockLengths.id),
    offcutId: integer('offcut_id').references(() => offcuts.id),
    // Change in on-hand count of a stock length (receipts +, cuts −); 0 for offcut rows.
    quantityDelta: integer('quantity_delta').notNull().default(0),
    lengthMm: integer('length_mm').notNull(),
    valuePence: integer('value_pence').notNull().default(0),
    planId: integer('plan_id').references(() => plans.id, { onDelete: 'set null' }),
    jobId: integer('job_id').references(() => jobs.id, { onDelete: 'set null' }),
    reason: text('reason').notNull().default(''),
  },
  (t) => [index('stock_movements_at').on(t.at), index('stock_movements_section').on(t.sectionId)],
);
export type StockMovement = typeof stockMovements.$inferSelect;
export type NewStockMovement = typeof stockMovements.$inferInsert;

// Mail the product sent (cut sheets, quotes): the outbox the owner reads.
export const sentMail = pgTable('sent_mail', {
  id: serial('id').primaryKey(),
  jobId: integer('job_id').references(() => jobs.id, { onDelete: 'set null' }),
  to: text('to').notNull(),
  subject: text('subject').notNull(),
  status: text('status', { enum: ['sent', 'failed'] }).notNull(),
  error: text('error'),
  createdAt: createdAt(),
});
export type SentMail = typeof sentMail.$inferSelect;
