import { useId, type ComponentProps, type ReactNode } from 'react';

/** What a labelled control needs to be tied to its label, hint and error for assistive technology. */
export interface ControlProps {
  id: string;
  'aria-invalid': boolean | undefined;
  'aria-describedby': string | undefined;
}

interface FieldProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  className?: string;
  children: (control: ControlProps) => ReactNode;
}

export function Field({ label, hint, error, className = '', children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} className="text-sm font-semibold text-ember">
          {error}
        </p>
      )}
    </div>
  );
}

const control =
  'w-full rounded-md border border-ink-soft/50 bg-white px-3 py-2 text-base text-ink shadow-inner shadow-ink/5 aria-invalid:border-ember aria-invalid:border-2 disabled:bg-paper';

export function Input({ className = '', ...rest }: ComponentProps<'input'>) {
  return <input className={`${control} min-h-11 ${className}`} {...rest} />;
}

export function TextArea({ className = '', ...rest }: ComponentProps<'textarea'>) {
  return <textarea className={`${control} min-h-24 ${className}`} {...rest} />;
}

export function Select({ className = '', ...rest }: ComponentProps<'select'>) {
  return <select className={`${control} min-h-11 ${className}`} {...rest} />;
}
