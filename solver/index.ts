export { solve } from './solve';
export { prepareSolver } from './prepare';
export { solveInputSchema, stockInputSchema, offcutInputSchema, pieceInputSchema } from './input-schema';
export type { SolveInputRaw } from './input-schema';
export type {
  SolveInput,
  SolvePlan,
  PlanBoard,
  PlanBound,
  PlanTotals,
  StockInput,
  OffcutInput,
  PieceInput,
  UnplacedPiece,
  UnplacedReason,
  StockUsage,
  BoardSource,
} from './types';
