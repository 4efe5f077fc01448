import type { Scenario } from '../../../../contracts/scenario';
import type { SwingRow } from '../../../../engine/sensitivity/swings';
import { formatMoney, formatNumber } from '../../../../lib/format';
import { inputLabel } from '../../lib/labels';

const figure = (v: number) => (v === 0 ? '0' : formatNumber(v, Math.abs(v) >= 100 ? 0 : Math.abs(v) >= 1 ? 2 : 4));

/** Every swing with its numbers, largest first. */
export function SwingsTable({ rows, scenario, baseMeasure }: { rows: SwingRow[]; scenario: Scenario; baseMeasure: number }) {
  const c = scenario.currency;
  const money = (v: number) => formatMoney(String(v), c);
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" aria-label="Swings, largest first">
        <thead>
          <tr className="border-b border-line-strong text-right text-ink-soft">
            <th scope="col" className="pr-2 text-left font-medium">#</th>
            <th scope="col" className="text-left font-medium">Input</th>
            <th scope="col" className="px-2 font-medium">As entered</th>
            <th scope="col" className="px-2 font-medium">Lowered to</th>
            <th scope="col" className="px-2 font-medium">Raised to</th>
            <th scope="col" className="px-2 font-medium">Result when lowered</th>
            <th scope="col" className="px-2 font-medium">Result when raised</th>
            <th scope="col" className="px-2 font-medium">Swing</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={r.path} className="border-b border-line text-right" data-path={r.path}>
              <td className="figure pr-2 text-left text-ink-soft">{i + 1}</td>
              <th scope="row" className="text-left font-normal">
                {inputLabel(scenario, r.path)}
                {r.clamped ? <span className="text-ink-soft"> (rounded, or held at the edge of its allowed range)</span> : null}
              </th>
              <td className="figure px-2">{figure(r.base)} <span className="text-ink-soft">{r.unit}</span></td>
              <td className="figure px-2">{figure(r.low)}</td>
              <td className="figure px-2">{figure(r.high)}</td>
              <td className="figure px-2">{money(r.measureLow)} <span className="text-ink-soft">({signed(r.measureLow - baseMeasure, money)})</span></td>
              <td className="figure px-2">{money(r.measureHigh)} <span className="text-ink-soft">({signed(r.measureHigh - baseMeasure, money)})</span></td>
              <td className="figure px-2 font-medium">{money(r.size)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function signed(v: number, money: (v: number) => string): string {
  return v > 0 ? `+${money(v)}` : v < 0 ? `−${money(-v)}` : money(0);
}
