import type { ButtonHTMLAttributes } from 'react';
import { cn } from '../../lib/cn';

const tones = {
  primary: 'bg-spruce-700 text-white hover:bg-spruce-800 border-spruce-700',
  secondary: 'bg-panel text-ink hover:bg-spruce-50 border-line-strong',
  quiet: 'bg-transparent text-spruce-700 hover:bg-spruce-50 border-transparent',
  danger: 'bg-panel text-danger-700 hover:bg-danger-50 border-danger-700',
} as const;

/** Props of Button: a native button with a tone and a compact size. */
export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  tone?: keyof typeof tones;
  size?: 'sm' | 'md';
  busy?: boolean;
}

/** A button; `busy` disables it and says so to assistive technology. */
export function Button({ tone = 'secondary', size = 'md', busy = false, className, disabled, children, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={cn(
        'inline-flex items-center justify-center gap-1.5 rounded-md border font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-55',
        size === 'sm' ? 'px-2 py-0.5 text-sm' : 'px-3 py-1.5',
        tones[tone],
        className,
      )}
      {...rest}
    >
      {children}
    </button>
  );
}
