import { Notice } from '@/components/ui/notice';

export type RowError = { line: number; column: string | null; message: string };

const SHOWN = 100;

/** The rows a rejected file must fix, by line and column. Long lists show the first hundred. */
export function ImportErrors({ errors, summary }: { errors: RowError[]; summary: string }) {
  return (
    <Notice tone="error" data-testid="import-errors">
      <p className="font-semibold">{summary} Nothing was saved.</p>
      <ul className="mt-2 max-h-72 list-none space-y-1 overflow-y-auto text-bark">
        {errors.slice(0, SHOWN).map((e, i) => (
          <li key={i} data-testid="import-error">
            <span className="font-semibold">Line {e.line}</span>
            {e.column && <span className="font-semibold">, {e.column}</span>}: {e.message}
          </li>
        ))}
      </ul>
      {errors.length > SHOWN && <p className="mt-2">…and {errors.length - SHOWN} more.</p>}
    </Notice>
  );
}
