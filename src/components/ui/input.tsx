import type { InputHTMLAttributes, Ref, SelectHTMLAttributes, TextareaHTMLAttributes } from 'react';
import { cn } from '../../lib/cn';

const base =
  'block rounded-md border bg-panel px-2 py-1 text-ink placeholder:text-ink-soft/70 disabled:bg-paper disabled:text-ink-soft aria-[invalid=true]:border-danger-700 aria-[invalid=true]:bg-danger-50';

/** Full width unless the caller sets a width of its own. */
const width = (className?: string) => (/(^|\s)w-/.test(className ?? '') ? '' : 'w-full');

/** A text or number input with the product's look; `invalid` marks it for assistive technology. */
export function Input({ className, invalid, ref, ...rest }: InputHTMLAttributes<HTMLInputElement> & { invalid?: boolean; ref?: Ref<HTMLInputElement> }) {
  return <input ref={ref} aria-invalid={invalid || undefined} className={cn(base, width(className), 'border-line-strong', className)} {...rest} />;
}

/** A native select with the product's look. */
export function Select({ className, invalid, ref, ...rest }: SelectHTMLAttributes<HTMLSelectElement> & { invalid?: boolean; ref?: Ref<HTMLSelectElement> }) {
  return <select ref={ref} aria-invalid={invalid || undefined} className={cn(base, width(className), 'border-line-strong pr-7', className)} {...rest} />;
}

/** A multi-line text input. */
export function Textarea({ className, invalid, ref, ...rest }: TextareaHTMLAttributes<HTMLTextAreaElement> & { invalid?: boolean; ref?: Ref<HTMLTextAreaElement> }) {
  return <textarea ref={ref} aria-invalid={invalid || undefined} className={cn(base, width(className), 'border-line-strong', className)} {...rest} />;
}
