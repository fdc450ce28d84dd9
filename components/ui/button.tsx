import { cn } from '@/lib/cn';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<Variant, string> = {
  primary: 'bg-spruce text-white hover:bg-spruce-dark border-spruce',
  secondary: 'bg-white text-bark border-grain hover:bg-shaving',
  danger: 'bg-brick text-white border-brick hover:opacity-90',
  quiet: 'bg-transparent text-spruce border-transparent hover:bg-spruce-light',
};

export type ButtonProps = React.ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: Variant;
  size?: 'md' | 'lg';
};

export function Button({ variant = 'primary', size = 'md', className, ...props }: ButtonProps) {
  return (
    <button
      className={cn(
        'inline-flex items-center justify-center gap-2 rounded-lg border-2 font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-50',
        size === 'lg' ? 'min-h-14 px-6 text-lg' : 'min-h-11 px-4 text-base',
        variants[variant],
        className,
      )}
      {...props}
    />
  );
}
