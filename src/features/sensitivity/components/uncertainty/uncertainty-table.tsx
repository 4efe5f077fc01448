import type { Scenario } from '../../../../contracts/scenario';
import type { UncertaintySummary } from '../../../../engine/sensitivity/uncertainty';
import { formatMoney, formatNumber } from '../../../../lib/format';
import { optionLabel } from '../../lib/labels';

/** The uncertainty run's numbers: chance of being cheapest, P10, P50, P90 and mean of each present value. */
export function UncertaintyTable({ result, scenario }: { result: UncertaintySummary; scenario: Scenario }) {
  const money = (v: number) => formatMoney(String(v), scenario.currency);
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" aria-label="Uncertainty results by option">
        <thead>
          <tr className="border-b border-line-strong text-right text-ink-soft">
            <th scope="col" className="text-left font-medium">Option</th>
            <th scope="col" className="px-2 font-medium">Chance of being cheapest</th>
            <th scope="col" className="px-2 font-medium">P10</th>
            <th scope="col" className="px-2 font-medium">P50</th>
            <th scope="col" className="px-2 font-medium">P90</th>
            <th scope="col" className="px-2 font-medium">Mean</th>
          </tr>
        </thead>
        <tbody>
          {result.options.map((o) => (
            <tr key={o.id} className="border-b border-line text-right" data-option={o.id}>
              <th scope="row" className="text-left font-normal">{optionLabel(scenario, o.id)}</th>
              <td className="figure px-2">{formatNumber(100 * o.chanceCheapest, 1)} %</td>
              <td className="figure px-2">{money(o.p10)}</td>
              <td className="figure px-2">{money(o.p50)}</td>
              <td className="figure px-2">{money(o.p90)}</td>
              <td className="figure px-2">{money(o.mean)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-soft">
        P10, P50 and P90: the present value that 10 %, 50 % and 90 % of the draws stay at or below (sample quantiles by linear
        interpolation, definition 7 of Hyndman and Fan, 1996). Ties for cheapest go to the option listed first.
      </p>
    </div>
  );
}
