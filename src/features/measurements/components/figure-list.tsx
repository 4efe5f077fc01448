import type { ReactNode } from 'react';

/** One figure: its name, its value with a unit, and a short note on what it means. */
export interface FigureItem {
  name: ReactNode;
  value: ReactNode;
  note?: ReactNode;
}

/** Figures as a definition list: name, value, note. */
export function FigureList({ items, label }: { items: FigureItem[]; label: string }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2 xl:grid-cols-3" aria-label={label}>
      {items.map((f, i) => (
        <div key={i} className="rounded-md border border-line bg-paper px-3 py-2">
          <dt className="text-sm text-ink-soft">{f.name}</dt>
          <dd className="figure text-lg font-semibold">{f.value}</dd>
          {f.note ? <dd className="text-xs text-ink-soft">{f.note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}
