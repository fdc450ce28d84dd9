import { cn } from '@/lib/cn';

/** An offcut's tag code (K-0042): always on one line, never broken at its hyphen. */
export function TagCode({ tag, className }: { tag: string; className?: string }) {
  return (
    <span className={cn('whitespace-nowrap', className)} data-testid="tag-code">
      {tag}
    </span>
  );
}
