// Plain data tables in the house style: a sand header row, a rule between rows. Cells take their
// padding from the table's density, so a report's compact table and a page's roomy one share code.
import { cn } from '@/lib/cn';

type Density = 'roomy' | 'compact';
const PAD: Record<Density, string> = { roomy: 'p-3', compact: 'p-1.5' };

export function Table({ className, ...props }: React.TableHTMLAttributes<HTMLTableElement>) {
  return <table className={cn('w-full text-left', className)} {...props} />;
}

/** The header row: one cell a column, in order. */
export function TableHead({ columns, density = 'roomy' }: { columns: React.ReactNode[]; density?: Density }) {
  return (
    <thead className="bg-shaving text-sm">
      <tr>
        {columns.map((c, i) => (
          <th key={i} className={PAD[density]}>
            {c}
          </th>
        ))}
      </tr>
    </thead>
  );
}

export function TableRow({ className, ...props }: React.HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cn('border-t border-shaving', className)} {...props} />;
}

export function Cell({
  density = 'roomy',
  className,
  ...props
}: React.TdHTMLAttributes<HTMLTableCellElement> & { density?: Density }) {
  return <td className={cn(PAD[density], className)} {...props} />;
}
