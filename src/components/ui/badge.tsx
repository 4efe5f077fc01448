import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

const tones = {
  neutral: 'bg-paper text-ink-soft border-line-strong',
  spruce: 'bg-spruce-50 text-spruce-800 border-spruce-600/40',
  gold: 'bg-gold-100 text-gold-800 border-gold-800/30',
  ok: 'bg-ok-50 text-ok-700 border-ok-700/30',
  danger: 'bg-danger-50 text-danger-700 border-danger-700/30',
} as const;

/** A small label in a rounded box. */
export function Badge({ tone = 'neutral', children, title, className }: { tone?: keyof typeof tones; children: ReactNode; title?: string; className?: string }) {
  return (
    <span title={title} className={cn('inline-flex items-center rounded border px-1.5 text-xs font-medium whitespace-nowrap', tones[tone], className)}>
      {children}
    </span>
  );
}
