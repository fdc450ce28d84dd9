export type PricedBoard = {
  source: 'stock' | 'offcut';
  /** Whole millimetres. */
  length: number;
  /** Yard price of this stock length; ignored for offcuts, which are priced per metre. */
  cost: number;
  /** Pieces cut off this board, each one saw cut. */
  cuts: number;
};

export type PriceCuttingPlanInput = {
  sections: Array<{ sectionName: string; boards: PricedBoard[] }>;
  /** Charge per saw cut. */
  perCutCharge: number;
  /** Price per metre of offcut used; omitted or null means offcuts are free. */
  offcutPricePerMetre?: number | null;
};

export type PriceLine = {
  description: string;
  quantity: number;
  unit: 'board' | 'metre' | 'cut';
  unitPrice: number;
  amount: number;
};

export type CuttingPlanPrice = { lines: PriceLine[]; materials: number; cutting: number; total: number };
