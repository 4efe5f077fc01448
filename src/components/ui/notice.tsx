import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

const tones = {
  info: 'border-spruce-600/40 bg-spruce-50 text-spruce-800',
  caution: 'border-gold-800/40 bg-gold-100 text-gold-800',
  error: 'border-danger-700/40 bg-danger-50 text-danger-700',
  ok: 'border-ok-700/40 bg-ok-50 text-ok-700',
} as const;

/** A boxed message; errors are announced (role="alert"), others politely (role="status"). */
export function Notice({ tone = 'info', title, children, className }: { tone?: keyof typeof tones; title?: ReactNode; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={cn('rounded-md border px-3 py-2 text-sm', tones[tone], className)}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children}
    </div>
  );
}
