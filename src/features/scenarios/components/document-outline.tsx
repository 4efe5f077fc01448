import { displayValue } from '../lib/document-paths';

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** What names an entry of a list in its heading: its name, title or id, when it has one. */
function label(item: unknown): string {
  if (!isRecord(item)) return '';
  const named = item.name ?? item.title ?? item.id;
  return typeof named === 'string' ? ` ${named}` : '';
}

/**
 * A scenario document laid out as nested lists of its field names (as the scenario format spells
 * them, the same names problems and changes use) and values, for reading a revision.
 */
export function DocumentOutline({ value }: { value: unknown }) {
  if (!isRecord(value)) return <span className="figure">{displayValue(value)}</span>;
  return (
    <dl className="grid grid-cols-[minmax(7rem,auto)_1fr] gap-x-3 gap-y-0.5 text-sm">
      {Object.entries(value).map(([key, v]) => (
        <Entry key={key} name={key} value={v} />
      ))}
    </dl>
  );
}

function Entry({ name, value }: { name: string; value: unknown }) {
  const nested = isRecord(value) || (Array.isArray(value) && value.some((x) => typeof x === 'object' && x !== null));
  if (!nested) {
    return (
      <>
        <dt className="figure text-ink-soft">{name}</dt>
        <dd className="figure [overflow-wrap:anywhere]">{Array.isArray(value) ? value.map((x) => displayValue(x)).join(', ') || '(none)' : displayValue(value)}</dd>
      </>
    );
  }
  return (
    <>
      <dt className="figure col-span-2 mt-1 text-ink-soft">{name}</dt>
      <dd className="col-span-2 border-l border-line pl-3">
        {Array.isArray(value) ? (
          value.map((item, i) => (
            <div key={i} className="mt-1">
              <div className="figure text-ink-soft">[{i}]{label(item)}</div>
              <div className="border-l border-line pl-3"><DocumentOutline value={item} /></div>
            </div>
          ))
        ) : (
          <DocumentOutline value={value} />
        )}
      </dd>
    </>
  );
}
