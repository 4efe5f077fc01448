import { useState } from 'react';
import type { ReactNode } from 'react';

/** A <details> whose body is built only once it is opened, so a table of many thousand rows costs nothing until asked for. */
export function LazyDetails({ summary, children, className }: { summary: ReactNode; children: () => ReactNode; className?: string }) {
  const [open, setOpen] = useState(false);
  return (
    <details className={className} onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary className="cursor-pointer text-spruce-700">{summary}</summary>
      {open ? children() : null}
    </details>
  );
}
