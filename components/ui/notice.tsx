import { cn } from '@/lib/cn';

const tones = {
  info: 'border-spruce bg-spruce-light text-spruce-dark',
  warning: 'border-amber bg-amber-light text-bark',
  error: 'border-brick bg-brick-light text-brick',
};

/** A boxed message. Errors are announced to screen readers. */
export function Notice({
  tone = 'info',
  children,
  className,
  ...props
}: { tone?: keyof typeof tones } & React.HTMLAttributes<HTMLDivElement>) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cn('rounded-lg border-l-4 px-4 py-3', tones[tone], className)}
      {...props}
    >
      {children}
    </div>
  );
}
