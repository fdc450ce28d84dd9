// Value lists shared by the schema, validation and client components (no database imports here).
export const ROLES = ['owner', 'yard_hand', 'saw_operator'] as const;
export type Role = (typeof ROLES)[number];

export const JOB_STATUSES = ['draft', 'planned', 'released', 'cutting', 'done', 'cancelled'] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];
/** Jobs the yard still has to do something about; done and cancelled ones are closed. */
export const OPEN_JOB_STATUSES = ['draft', 'planned', 'released', 'cutting'] as const satisfies JobStatus[];
/** Which jobs the job list shows when no single status is chosen. */
export const JOB_LIST_SHOWS = ['open', 'closed', 'all'] as const;
export type JobListShow = (typeof JOB_LIST_SHOWS)[number];

export const OFFCUT_STATUSES = ['available', 'reserved', 'used', 'scrapped'] as const;
export type OffcutStatus = (typeof OFFCUT_STATUSES)[number];

export const PLAN_STATUSES = ['planned', 'released', 'superseded', 'done'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

/** A queued planning request: waiting for a worker, being solved, stored, given up on, or called off. */
export const PLAN_RUN_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type PlanRunStatus = (typeof PLAN_RUN_STATUSES)[number];

export const BOARD_STATUSES = ['pending', 'done', 'defective'] as const;
export type BoardStatus = (typeof BOARD_STATUSES)[number];

export const DISPLAY_UNITS = ['mm', 'imperial'] as const;
export type DisplayUnit = (typeof DISPLAY_UNITS)[number];

export const MOVEMENT_KINDS = [
  'receipt', // a delivery of stock lengths
  'stocktake', // a counted correction of on-hand stock
  'stock_cut', // a stock length taken to the saw for a plan
  'counted_short', // a board cut that the count said was not there: +1 so on hand stays 0; the owner recounts
  'offcut_made', // a kept remainder tagged and put on the rack
  'offcut_imported', // an existing rack piece entered from a CSV
  'offcut_reserved',
  'offcut_unreserved',
  'offcut_used',
  'offcut_scrapped',
  'offcut_moved',
  'defect', // a board found bad at the saw
  'board_undone', // a board confirmation taken back: reverses its cut, offcut use and new offcut
] as const;
export type MovementKind = (typeof MOVEMENT_KINDS)[number];

export const REGIONS = ['uk', 'na'] as const;
export type Region = (typeof REGIONS)[number];

export const MOISTURE_STATES = ['kiln_dried', 'air_dried', 'green'] as const;
export type MoistureState = (typeof MOISTURE_STATES)[number];

export const ACCOUNT_KINDS = ['retail', 'trade'] as const;
export type AccountKind = (typeof ACCOUNT_KINDS)[number];

export const PAYMENT_KINDS = ['deposit', 'full', 'balance', 'refund', 'on_account'] as const;
export type PaymentKind = (typeof PAYMENT_KINDS)[number];
