// Nominal pieces: a line item may be cut up to its tolerance short (factory ends, sold by nominal
// length). Pure, so forms, imports, frame schedules and the planner resolve it the same way.

/** Largest tolerance a line, section or yard may set: beyond this a piece is not "nominal" any more. */
export const MAX_TOLERANCE_MM = 50;

/** How short a nominal piece of a section may be: the section's own figure, else the yard's. */
export const nominalToleranceFor = ({
  sectionToleranceMm,
  yardToleranceMm,
}: {
  sectionToleranceMm: number | null | undefined;
  yardToleranceMm: number;
}) => sectionToleranceMm ?? yardToleranceMm;

/**
 * The tolerance a line gets: its own figure when given (0 = exact), else, when it is nominal, the
 * section's or yard's (`nominalDefaultMm`, from nominalToleranceFor); a line that says neither is exact.
 */
export function resolveTolerance({
  toleranceMm,
  nominal,
  nominalDefaultMm,
}: {
  toleranceMm?: number | null;
  nominal?: boolean;
  nominalDefaultMm: number;
}): number {
  if (toleranceMm !== undefined && toleranceMm !== null) return toleranceMm;
  return nominal ? nominalDefaultMm : 0;
}

/** What the solver may use: never the whole piece (a piece is at least 1 mm). */
export const usableTolerance = (toleranceMm: number, lengthMm: number) =>
  Math.max(0, Math.min(toleranceMm, lengthMm - 1));

/** "exact" or "nominal, up to 5 mm short" as the items table and the sheets say it. */
export function describeTolerance(toleranceMm: number): string {
  return toleranceMm > 0 ? `nominal, up to ${toleranceMm} mm short` : 'exact';
}
