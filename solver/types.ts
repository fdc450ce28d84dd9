// Public data shapes of the cutting engine. All lengths are whole millimetres.

export interface StockInput {
  id: string;
  length: number;
  /** Price of one board; missing means the board's length in metres. */
  cost?: number | null;
  /** How many boards of this length may be used; null means unlimited. */
  available?: number | null;
}

export interface OffcutInput {
  id: string;
  length: number;
}

export interface PieceInput {
  id: string;
  length: number;
  quantity: number;
  /** Millimetres the piece may be delivered short (a nominal piece); 0 or missing = exact. */
  tolerance?: number;
}

export interface SolveInput {
  kerf: number;
  trim: number;
  minOffcut: number;
  timeLimitMs: number;
  stock: StockInput[];
  offcuts: OffcutInput[];
  pieces: PieceInput[];
}

export type BoardSource = 'stock' | 'offcut';

export interface PlanBoard {
  sourceId: string;
  source: BoardSource;
  length: number;
  /** End trim cut off first (new stock with an exact piece only); one kerf follows it when trim > 0. */
  trim: number;
  /** Piece ids in cut order. */
  pieces: string[];
  /** Ordered lengths, as in the cut list. */
  pieceLengths: number[];
  /** Lengths actually cut: a nominal piece may be up to its tolerance short of its ordered length. */
  cutLengths: number[];
  /** One piece sold at the whole stock length: no trim, no cut, no kerf. */
  fullLength: boolean;
  /** Position of every saw cut's near edge, measured from the board's start after the trim. */
  marks: number[];
  /** Length left after the last cut. */
  remainder: number;
  /** True when the remainder is at least minOffcut and goes back on the rack. */
  keepRemainder: boolean;
  kerfLoss: number;
  /** Trim plus any remainder too short to keep. */
  scrap: number;
  cost: number;
}

export type UnplacedReason = 'longer-than-every-source' | 'not-enough-stock';

export interface UnplacedPiece {
  id: string;
  length: number;
  reason: UnplacedReason;
}

export interface StockUsage {
  sourceId: string;
  length: number;
  boards: number;
}

export interface PlanTotals {
  boards: number;
  stockBoards: StockUsage[];
  offcutsUsed: number;
  materialLength: number;
  pieceLength: number;
  cost: number;
  kerfLoss: number;
  scrap: number;
  keptOffcuts: number;
  keptLength: number;
  /** 100 · piece length / (material length − kept remainder length). */
  yieldPercent: number;
}

export interface PlanBound {
  /** No plan that places the same pieces can use fewer boards. */
  boards: number;
  /** No plan that places the same pieces can cost less. */
  cost: number;
  /** Where the cost bound came from: the length bound, the pattern LP or the integer (arc-flow) model. */
  method: 'length' | 'lp' | 'integer';
}

export interface SolvePlan {
  boards: PlanBoard[];
  unplaced: UnplacedPiece[];
  totals: PlanTotals;
  lowerBound: PlanBound;
  gap: { boards: number; cost: number };
  /** True when the plan meets its lower bound, so no cheaper plan exists. */
  provenOptimal: boolean;
  /** True when the search stopped at timeLimitMs rather than at its own iteration caps. */
  stoppedByTime: boolean;
  timeMs: number;
}
