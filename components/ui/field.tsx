import { useId } from 'react';
import { cn } from '@/lib/cn';

const control =
  'block w-full rounded-lg border-2 border-grain bg-white px-3 py-2 text-base text-bark min-h-11 focus:border-spruce aria-invalid:border-brick';

type FieldProps = {
  label: string;
  error?: string;
  hint?: string;
  children: (props: ControlProps) => React.ReactNode;
};
type ControlProps = { id: string; className: string; 'aria-describedby'?: string; 'aria-invalid'?: boolean };

/** A labelled form control with its hint and error wired up for screen readers. */
export function Field({ label, error, hint, children }: FieldProps) {
  const id = useId();
  const describedBy = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-bark">
        {label}
      </label>
      {children({
        id,
        className: control,
        'aria-describedby': describedBy,
        'aria-invalid': error ? true : undefined,
      })}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-sm text-bark-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-brick">
          {error}
        </p>
      )}
    </div>
  );
}

export const inputClass = control;

export const cardClass = 'rounded-xl border-2 border-shaving bg-white p-5 shadow-sm';

export function Card({ className, ...props }: React.HTMLAttributes<HTMLDivElement>) {
  return <div className={cn(cardClass, className)} {...props} />;
}
