// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959), i.e. 254/10 mm.
export const TENTHS_OF_MM_PER_INCH = 254n;
export const INCHES_PER_FOOT = 12n;
export const MM_PER_METRE = 1000n;

/** Imperial lengths are shown to the nearest 1/16 in, the finest mark the trade writes (TRADE.md). */
export const IMPERIAL_DENOMINATOR = 16;

/** Anything longer than a kilometre is a typing slip, and keeps arithmetic well inside safe integers. */
export const LONGEST_LENGTH_MM = 1_000_000;
