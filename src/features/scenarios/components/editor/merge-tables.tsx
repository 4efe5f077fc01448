import { changedFieldLabel } from '../../../../lib/scenario-labels';
import { displayValue } from '../../lib/document-paths';
import type { Clash, Side } from '../../merge/three-way-merge';
import type { SideChange } from '../../merge/side-changes';

const SHOWN = 40;
const cell = 'figure break-all py-1 pr-3 align-top';

type Named = Parameters<typeof changedFieldLabel>[0];

/** The field in words, with its path below in small type for anyone who reads the file. */
function FieldName({ doc, where }: { doc: Named; where: string }) {
  const words = changedFieldLabel(doc, where);
  return (
    <th scope="row" className="py-1 pr-3 text-left align-top font-normal">
      {words}
      {words === where ? null : <span className="figure block text-xs break-all text-ink-soft">{where}</span>}
    </th>
  );
}

/** The fields one side changed since the common revision, with before and after values. */
export function ChangeList({ title, changes, empty, doc }: { title: string; changes: SideChange[]; empty: string; doc: Named }) {
  if (changes.length === 0) return <p className="text-sm"><span className="font-semibold">{title}:</span> {empty}</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label={title}>
        <caption className="pb-1 text-left font-semibold">{title}</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-normal">Field</th>
            <th scope="col" className="py-1 pr-3 font-normal">Before</th>
            <th scope="col" className="py-1 font-normal">After</th>
          </tr>
        </thead>
        <tbody>
          {changes.slice(0, SHOWN).map((c) => (
            <tr key={c.where} data-path={c.where} className="border-b border-line">
              <FieldName doc={doc} where={c.where} />
              <td className={`${cell} text-ink-soft`}>{displayValue(c.before)}</td>
              <td className={cell}>{displayValue(c.after)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {changes.length > SHOWN ? <p className="mt-1 text-sm text-ink-soft">and {changes.length - SHOWN} more fields.</p> : null}
    </div>
  );
}

function Choice({ clash, side, chosen, onChoose, name }: { clash: Clash; side: Side; chosen: Side | undefined; onChoose: (where: string, side: Side) => void; name: string }) {
  const verb = side === 'mine' ? 'Keep mine' : 'Take theirs';
  return (
    <label className="flex items-start gap-1.5">
      <input
        type="radio"
        name={`clash-${clash.where}`}
        value={side}
        checked={chosen === side}
        onChange={() => onChoose(clash.where, side)}
        aria-label={`${verb} for ${name}`}
        className="mt-1"
      />
      <span>
        <span className="block text-xs text-ink-soft">{verb}</span>
        {displayValue(clash[side])}
      </span>
    </label>
  );
}

/** Each field both sides changed differently, with a choice of which value the merged version keeps. */
export function ClashTable({ clashes, choices, onChoose, theirRevision, doc }: {
  doc: Named;
  clashes: Clash[];
  choices: Readonly<Record<string, Side>>;
  onChoose: (where: string, side: Side) => void;
  theirRevision: number;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Fields you both changed">
        <caption className="pb-1 text-left font-semibold">Fields you both changed: choose one value for each</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-normal">Field</th>
            <th scope="col" className="py-1 pr-3 font-normal">Theirs (revision {theirRevision})</th>
            <th scope="col" className="py-1 font-normal">Yours</th>
          </tr>
        </thead>
        <tbody>
          {clashes.map((c) => (
            <tr key={c.where} data-path={c.where} className="border-b border-line">
              <FieldName doc={doc} where={c.where} />
              <td className={cell}><Choice clash={c} side="theirs" chosen={choices[c.where]} onChoose={onChoose} name={changedFieldLabel(doc, c.where)} /></td>
              <td className={cell}><Choice clash={c} side="mine" chosen={choices[c.where]} onChoose={onChoose} name={changedFieldLabel(doc, c.where)} /></td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
