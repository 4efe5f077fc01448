/** The lines of a refused file that have problems, each with its number, its text and the reasons beside it. */
export function FileLines({ text, byLine }: { text: string; byLine: Map<number, string[]> }) {
  if (byLine.size === 0) return null;
  const lines = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n').split('\n');
  const numbers = [...byLine.keys()].sort((a, b) => a - b);
  return (
    <ol className="figure max-h-96 overflow-auto rounded border border-line bg-panel text-xs" aria-label="Lines of the file with their problems">
      {numbers.map((n) => (
        <li key={n} className="grid grid-cols-[4rem_1fr] gap-2 border-b border-line bg-danger-50 px-2 py-1 last:border-b-0">
          <span className="text-right text-ink-soft">line {n}</span>
          <span>
            <span className="break-all">{lines[n - 1] || ' '}</span>
            {byLine.get(n)!.map((m) => (
              <span key={m} className="block font-sans text-sm text-danger-700">↳ {m}</span>
            ))}
          </span>
        </li>
      ))}
    </ol>
  );
}
