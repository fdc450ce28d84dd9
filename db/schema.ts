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
  ACCOUNT_KINDS,
  BOARD_STATUSES,
  DISPLAY_UNITS,
  JOB_STATUSES,
  MOISTURE_STATES,
  MOVEMENT_KINDS,
  OFFCUT_STATUSES,
  PAYMENT_KINDS,
  PLAN_RUN_STATUSES,
  PLAN_STATUSES,
  REGIONS,
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
  /** A yard hand the owner lets work the saw screen too (small yards share one saw). */
  canUseSaw: boolean('can_use_saw').notNull().default(false),
  /** Bumped on sign-out, password change and role change: older session tokens stop working. */
  sessionVersion: integer('session_version').notNull().default(0),
  createdAt: createdAt(),
});
export type User = typeof users.$inferSelect;

// Failed sign-ins per e-mail address and per client address, kept in the database so a
// restart does not reset the throttle.
export const signInFailures = pgTable('sign_in_failures', {
  key: text('key').primaryKey(),
  failures: integer('failures').notNull(),
  lastFailureAt: timestamp('last_failure_at', { withTimezone: true }).notNull(),
});
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
  // How far short a nominal piece may be cut (factory ends, sold by nominal length), for sections
  // without their own figure. Lines are exact unless the yard hand or the cut list says nominal.
  lengthToleranceMm: integer('length_tolerance_mm').notNull().default(5),
  // Picks piece names and framing defaults: 'uk' (head/sole plate, lintel) or 'na' (top/bottom plate, header).
  region: text('region', { enum: REGIONS }).notNull().default('uk'),
  // Shorter pieces are refused on forms and imports: the saw cannot hold them safely.
  minSafePieceMm: integer('min_safe_piece_mm').notNull().default(150),
  // Quotes and payment. The VAT rate is in hundredths of a percent (2000 = 20 %).
  vatRateBasisPoints: integer('vat_rate_basis_points').notNull().default(2000),
  yardAddress: text('yard_address').notNull().default(''),
  vatNumber: text('vat_number').notNull().default(''),
  quoteValidityDays: integer('quote_validity_days').notNull().default(30),
  minimumChargePence: integer('minimum_charge_pence').notNull().default(0),
  // Rack offcuts are charged at this share of the section's price per metre of new stock.
  offcutRatePercent: integer('offcut_rate_percent').notNull().default(50),
  // Who keeps the kept remainders of boards a customer pays for.
  remaindersGoTo: text('remainders_go_to', { enum: ['yard', 'customer'] })
    .notNull()
    .default('yard'),
  depositPercent: integer('deposit_percent').notNull().default(50),
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
  // Thickness and width above are nominal (what the trade calls it); finished sizes are what it measures.
  finishedThicknessMm: integer('finished_thickness_mm'),
  finishedWidthMm: integer('finished_width_mm'),
  // Kiln dried, air dried or green: apart from treatment (a treated section may be wet from the tank).
  moisture: text('moisture', { enum: MOISTURE_STATES }).notNull().default('kiln_dried'),
  // Shortest remainder worth keeping for this section; null: the yard's minimum kept offcut.
  minKeepMm: integer('min_keep_mm'),
  // How far short a nominal piece of this section may be cut; null: the yard's length tolerance.
  nominalToleranceMm: integer('nominal_tolerance_mm'),
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
    // What the yard paid for one length; null: not entered. Reports value waste at cost.
    costPence: integer('cost_pence'),
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
  customerEmail: text('customer_email').notNull().default(''),
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

export const customers = pgTable('customers', {
  id: serial('id').primaryKey(),
  name: text('name').notNull(),
  contact: text('contact').notNull().default(''),
  phone: text('phone').notNull().default(''),
  email: text('email').notNull().default(''),
  address: text('address').notNull().default(''),
  account: text('account', { enum: ACCOUNT_KINDS }).notNull().default('retail'),
  // Trade accounts only: days to pay, and a discount off the yard's prices (whole percent).
  creditDays: integer('credit_days'),
  discountPercent: integer('discount_percent').notNull().default(0),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
export type Customer = typeof customers.$inferSelect;
export type NewCustomer = typeof customers.$inferInsert;

export const jobs = pgTable('jobs', {
  id: serial('id').primaryKey(),
  reference: text('reference').notNull().unique(),
  customerId: integer('customer_id').references(() => customers.id),
  deliveryChargePence: integer('delivery_charge_pence').notNull().default(0),
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
  // Frame piece marks ("1.1, 1.2, 2.3"): the numbers the schedule's drawings show.
  marks: text('marks').notNull().default(''),
  // Millimetres the piece may be cut short (a nominal piece); 0: exact.
  toleranceMm: integer('tolerance_mm').notNull().default(0),
  // The frame schedule that sent this line, so sending it again can replace its lines.
  frameScheduleId: integer('frame_schedule_id').references(() => frameSchedules.id, {
    onDelete: 'set null',
  }),
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
  // The price before tax: { lines, materialsPence, cuttingPence, totalPence } in whole pence (lib/pricing).
  price: jsonb('price'),
  createdBy: integer('created_by').references(() => users.id),
  createdAt: createdAt(),
  releasedAt: timestamp('released_at', { withTimezone: true }),
  // Set when the owner sent the plan to the saw without acceptance or payment.
  releaseOverrideReason: text('release_override_reason'),
  releaseOverrideBy: integer('release_override_by').references(() => users.id),
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
    // One piece sold at the whole stock length: no trim and no cut; the saw hands the board over.
    fullLength: boolean('full_length').notNull().default(false),
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

// One quote per plan: priced in whole pence when first shown, frozen once accepted.
export const quotes = pgTable('quotes', {
  id: serial('id').primaryKey(),
  planId: integer('plan_id')
    .notNull()
    .unique()
    .references(() => plans.id, { onDelete: 'cascade' }),
  jobId: integer('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' }),
  number: text('number').notNull().unique(),
  version: integer('version').notNull(),
  account: text('account', { enum: ACCOUNT_KINDS }).notNull(),
  // [{ description, quantity, unit, unitPence, amountPence }] before VAT.
  lines: jsonb('lines').notNull(),
  netPence: integer('net_pence').notNull(),
  vatPence: integer('vat_pence').notNull(),
  grossPence: integer('gross_pence').notNull(),
  vatRateBasisPoints: integer('vat_rate_basis_points').notNull(),
  depositPence: integer('deposit_pence').notNull(),
  validUntil: timestamp('valid_until', { withTimezone: true }).notNull(),
  acceptedAt: timestamp('accepted_at', { withTimezone: true }),
  acceptedName: text('accepted_name'),
  acceptedIp: text('accepted_ip'),
  onAccount: boolean('on_account').notNull().default(false),
  createdAt: createdAt(),
});
export type Quote = typeof quotes.$inferSelect;

// A link to a quote for the customer. Only the SHA-256 of the token is stored.
export const quoteLinks = pgTable('quote_links', {
  id: serial('id').primaryKey(),
  quoteId: integer('quote_id')
    .notNull()
    .references(() => quotes.id, { onDelete: 'cascade' }),
  tokenHash: text('token_hash').notNull().unique(),
  expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  revokedAt: timestamp('revoked_at', { withTimezone: true }),
  createdBy: integer('created_by').references(() => users.id),
  createdAt: createdAt(),
});
export type QuoteLink = typeof quoteLinks.$inferSelect;

// The payments ledger: every payment, failed attempt, refund and on-account acceptance is one row.
export const payments = pgTable(
  'payments',
  {
    id: serial('id').primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    jobId: integer('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    quoteId: integer('quote_id').references(() => quotes.id, { onDelete: 'set null' }),
    kind: text('kind', { enum: PAYMENT_KINDS }).notNull(),
    status: text('status', { enum: ['succeeded', 'failed'] }).notNull(),
    // Refunds are negative.
    amountPence: integer('amount_pence').notNull(),
    // Who: the customer's typed name or the signed-in user.
    byName: text('by_name').notNull().default(''),
    userId: integer('user_id').references(() => users.id),
    // The payment service's ids; eventId makes webhook handling idempotent.
    eventId: text('event_id').unique(),
    checkoutSessionId: text('checkout_session_id'),
    paymentIntentId: text('payment_intent_id'),
    note: text('note').notNull().default(''),
  },
  (t) => [index('payments_job').on(t.jobId)],
);
export type Payment = typeof payments.$inferSelect;
