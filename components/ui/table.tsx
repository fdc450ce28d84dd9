// Plain data tables in the house style: a sand header row, a rule between rows. Cells take their
// padding from the table's density, so a report's compact table and a page's roomy one share code.
import { cn } from '@/lib/cn';

type Density = 'roomy' | 'snug' | 'compact';
const PAD: Record<Density, string> = { roomy: 'p-3', snug: 'p-2', compact: 'p-1.5' };

/** A header column: figures sit on the right, over their numbers. */
export type Column = string | { label: string; numeric: true };

export function Table({ className, ...props }: React.TableHTMLAttributes<HTMLTableElement>) {
  return <table className={cn('w-full text-left', className)} {...props} />;
}

/** The header row: one cell a column, in order; header cells that hold controls come as children. */
export function TableHead({
  columns = [],
  density = 'roomy',
  className,
  children,
}: {
  columns?: Column[];
  density?: Density;
  className?: string;
  children?: React.ReactNode;
}) {
  return (
    <thead className={cn('bg-shaving text-sm', className)}>
      <tr>
        {columns.map((c, i) =>
          typeof c === 'string' ? (
            <HeadCell key={i} density={density}>
              {c}
            </HeadCell>
          ) : (
            <HeadCell key={i} density={density} numeric>
              {c.label}
            </HeadCell>
          ),
        )}
        {children}
      </tr>
    </thead>
  );
}

export function HeadCell({
  density = 'roomy',
  numeric = false,
  className,
  ...props
}: React.ThHTMLAttributes<HTMLTableCellElement> & { density?: Density; numeric?: boolean }) {
  return <th className={cn(PAD[density], numeric && 'text-right', className)} {...props} />;
}

export function TableRow({ className, ...props }: React.HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cn('border-t border-shaving', className)} {...props} />;
}

/** A body cell; a numeric one lines its figures up on the right. */
export function Cell({
  density = 'roomy',
  numeric = false,
  className,
  ...props
}: React.TdHTMLAttributes<HTMLTableCellElement> & { density?: Density; numeric?: boolean }) {
  return <td className={cn(PAD[density], numeric && 'text-right tabular-nums', className)} {...props} />;
}
