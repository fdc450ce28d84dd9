// The shapes a plan is stored in (plans.settings, plans.sections, plans.totals, plan_boards.pieces).
// Reports, the plan page and the saw station read these; change them only with all three in mind.
import type { SolveInput, SolvePlan } from '@/solver';

/** Settings the plan was made with: the yard's, with the yard hand's overrides applied. */
export type PlanSettings = {
  kerfMm: number;
  trimMm: number;
  minOffcutMm: number;
  useOffcuts: boolean;
  /** Stock length ids the yard hand allowed; null means every active length. */
  stockLengthIds: number[] | null;
  timeLimitMs: number;
};

/** One section of a plan: exactly what the solver was given and what it returned. */
export type PlanSection = {
  sectionId: number;
  sectionName: string;
  input: SolveInput;
  output: SolvePlan;
};

/** Figures over the whole plan, in mm and pence. */
export type PlanTotals = {
  boards: number;
  stockBoards: number;
  offcutsUsed: number;
  materialMm: number;
  pieceMm: number;
  /** Length lost to saw cuts over the plan (the blade's width is PlanSettings.kerfMm). */
  kerfLossMm: number;
  scrapMm: number;
  keptMm: number;
  keptOffcuts: number;
  yieldPercent: number;
  /** New stock at yard prices. */
  stockCostPence: number;
  cuts: number;
  lowerBoundBoards: number;
  gapBoards: number;
  /** No plan for the same pieces can buy its new stock for less (whole pence); absent on older plans. */
  lowerBoundPence?: number;
  unplacedPieces: number;
  /** What a plain longest-first plan (first-fit decreasing, new stock only) would have used. */
  baseline: { boards: number; stockCostPence: number; scrapMm: number };
};

/** One piece of a board in cut order; markMm is where the cut falls, from the squared end. */
export type BoardPiece = {
  pieceId: string;
  jobItemId: number;
  label: string;
  lengthMm: number;
  /** Length actually cut: a nominal piece may be up to its tolerance short (plans before this: lengthMm). */
  cutMm?: number;
  /** How far short the line may be cut (nominal pieces); absent: exact. Kept so a re-plan keeps it. */
  toleranceMm?: number;
  markMm: number;
  /** An angled cut, from a frame schedule: degrees off square in tenths; the length is the long point. */
  angleTenths?: number;
  /** Which end and how, e.g. "plumb cut both ends". */
  cutNote?: string;
  /** Frame piece marks, e.g. "1.1, 2.3". */
  marks?: string;
};

/** What the saw needs to know about a line item besides its length. */
export type PieceDetails = { label: string; angleTenths?: number | null; note?: string; marks?: string };

/** Solver source ids: stock lengths and offcuts are told apart by prefix. */
export const stockSourceId = (stockLengthId: number) => `S${stockLengthId}`;
export const offcutSourceId = (offcutId: number) => `O${offcutId}`;
export const pieceIdFor = (jobItemId: number) => `I${jobItemId}`;

export function parseSourceId(sourceId: string): { kind: 'stock' | 'offcut'; id: number } {
  const id = Number(sourceId.slice(1));
  return { kind: sourceId.startsWith('O') ? 'offcut' : 'stock', id };
}

export const parsePieceId = (pieceId: string) => Number(pieceId.slice(1));
