// The shape of a quote as stored (quotes.lines) and as the API answers it.
import type { AccountKind } from '@/db/enums';

export type QuoteLine = {
  description: string;
  quantity: number;
  unit: 'board' | 'metre' | 'cut' | 'job' | 'percent';
  /** Before VAT. */
  unitPence: number;
  /** Before VAT; a discount is negative. */
  amountPence: number;
  /** Retail quotes: the line's VAT-inclusive amount, to the nearest penny. */
  grossAmountPence?: number;
};

export type QuoteFigures = {
  account: AccountKind;
  lines: QuoteLine[];
  netPence: number;
  vatPence: number;
  grossPence: number;
  vatRateBasisPoints: number;
  depositPence: number;
};
