import { cloneElement, isValidElement, useId } from 'react';
import type { ReactElement, ReactNode } from 'react';
import { cn } from '../../lib/cn';

/** Props of Field: one labelled control with an optional unit, hint and error shown beside it. */
export interface FieldProps {
  label: ReactNode;
  /** the control; it receives id, aria-describedby and aria-invalid */
  children: ReactElement<Record<string, unknown>>;
  unit?: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string;
}

/** Labels a control and ties its hint and error to it (aria-describedby), so the error is read with it. */
export function Field({ label, children, unit, hint, error, className }: FieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;
  const control = isValidElement(children)
    ? cloneElement(children, { id, 'aria-describedby': describedBy, invalid: Boolean(error) })
    : children;
  return (
    <div className={cn('flex flex-col gap-0.5', className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink-soft">
        {label}
      </label>
      <div className="flex items-center gap-1.5">
        <div className="min-w-0 flex-1">{control}</div>
        {unit ? <span className="shrink-0 text-sm text-ink-soft">{unit}</span> : null}
      </div>
      {hint ? (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} role="alert" className="text-sm text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
