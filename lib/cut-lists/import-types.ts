/** One problem in an imported file; line is the 1-based file line (the header is line 1). */
export type ImportError = { line: number; column: string | null; message: string };

/** Imports are all or nothing: either every row is good, or every bad row is listed. */
export type ImportResult<T> = { ok: true; items: T[] } | { ok: false; errors: ImportError[] };

export type SectionRef = { id: string; name: string; code?: string | null };

export type ImportOptions = {
  sections: SectionRef[];
  /** Longest stock length or offcut for the section, in mm; null means no limit is checked. */
  maxLengthMm: (sectionId: string) => number | null;
  /** The yard's minimum safe piece length in mm: shorter pieces are refused. */
  minPieceMm?: number;
};

export type FieldError = { column: string; message: string };

export type RowResult<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };
