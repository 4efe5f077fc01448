import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

/** A titled section on a white ground; the title is a heading at the given level. */
export function Panel({ title, level = 2, actions, children, className }: { title?: ReactNode; level?: 2 | 3; actions?: ReactNode; children: ReactNode; className?: string }) {
  const H = level === 2 ? 'h2' : 'h3';
  return (
    <section className={cn('rounded-lg border border-line bg-panel p-4', className)}>
      {title || actions ? (
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          {title ? <H className={level === 2 ? 'text-lg font-semibold' : 'font-semibold'}>{title}</H> : <span />}
          {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
        </div>
      ) : null}
      {children}
    </section>
  );
}
