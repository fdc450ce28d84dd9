// Every amount here is whole pence.
export type PricedBoard = {
  source: 'stock' | 'offcut';
  /** Whole millimetres. */
  length: number;
  /** Yard price of this stock length; ignored for offcuts, which are priced per metre. */
  costPence: number;
  /** Pieces cut off this board, each one saw cut. */
  cuts: number;
};

export type PriceCuttingPlanInput = {
  sections: Array<{ sectionName: string; boards: PricedBoard[] }>;
  /** Charge per saw cut. */
  perCutPence: number;
  /** Price per metre of offcut used; omitted or null means offcuts are free. */
  offcutPencePerMetre?: number | null;
};

export type PriceLine = {
  description: string;
  quantity: number;
  unit: 'board' | 'metre' | 'cut';
  unitPence: number;
  amountPence: number;
};

/** A plan's price before tax (plans.price). Plans stored before pence held pounds: see drizzle/*_plan-json-words.sql. */
export type CuttingPlanPrice = {
  lines: PriceLine[];
  materialsPence: number;
  cuttingPence: number;
  totalPence: number;
};
