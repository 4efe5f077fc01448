import type { FieldChange } from '../lib/document-paths';

const SHOWN = 40;

/** A table of the fields one revision changed, with the value before and after. */
export function RevisionChanges({ changes, from }: { changes: FieldChange[]; from: number }) {
  if (changes.length === 0) return <p className="text-sm text-ink-soft">The inputs are the same as in revision {from}.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label={`Changes from revision ${from}`}>
        <caption className="pb-1 text-left font-semibold">Changed from revision {from}</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-normal">Field</th>
            <th scope="col" className="py-1 pr-3 font-normal">Before</th>
            <th scope="col" className="py-1 font-normal">After</th>
          </tr>
        </thead>
        <tbody>
          {changes.slice(0, SHOWN).map((c) => (
            <tr key={c.path} data-path={c.path} className="border-b border-line align-top">
              <th scope="row" className="figure py-1 pr-3 text-left font-normal">{c.path}</th>
              <td className="figure break-all py-1 pr-3 text-ink-soft">{c.before}</td>
              <td className="figure break-all py-1">{c.after}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {changes.length > SHOWN ? <p className="mt-1 text-sm text-ink-soft">and {changes.length - SHOWN} more fields.</p> : null}
    </div>
  );
}
