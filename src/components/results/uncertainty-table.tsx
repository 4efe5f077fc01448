import type { ReactNode } from 'react';
import type { Scenario } from '../../contracts/scenario';
import type { UncertaintySummary } from '../../engine/sensitivity/uncertainty';
import { formatMoney, formatNumber } from '../../lib/format';
import { optionLabel } from '../../lib/scenario-labels';

/**
 * An uncertainty run's numbers by option: chance of being cheapest, P10, P50, P90 (and the mean).
 * Used by the sensitivity page and by the shared page's rerun, which also marks each row with the
 * unrounded figures so that they can be compared exactly.
 */
export function UncertaintyTable({ result, scenario, label, withMean = true, exact = false, className = '', children }: {
  result: UncertaintySummary;
  scenario: Scenario;
  label: string;
  withMean?: boolean;
  exact?: boolean;
  className?: string;
  /** The note under the table. */
  children: ReactNode;
}) {
  const money = (v: number) => formatMoney(String(v), scenario.currency);
  return (
    <div className="overflow-x-auto">
      <table className={`w-full border-collapse ${className}`} aria-label={label}>
        <thead>
          <tr className="border-b border-line-strong text-right text-ink-soft">
            <th scope="col" className="text-left font-medium">Option</th>
            <th scope="col" className="px-2 font-medium">Chance of being cheapest</th>
            <th scope="col" className="px-2 font-medium">P10</th>
            <th scope="col" className="px-2 font-medium">P50</th>
            <th scope="col" className="px-2 font-medium">P90</th>
            {withMean ? <th scope="col" className="px-2 font-medium">Mean</th> : null}
          </tr>
        </thead>
        <tbody>
          {result.options.map((o) => (
            <tr
              key={o.id}
              className="border-b border-line text-right"
              data-option={o.id}
              data-exact={exact ? JSON.stringify({ chanceCheapest: o.chanceCheapest, p10: o.p10, p50: o.p50, p90: o.p90 }) : undefined}
            >
              <th scope="row" className="text-left font-normal">{optionLabel(scenario, o.id)}</th>
              <td className="figure px-2">{formatNumber(100 * o.chanceCheapest, 1)} %</td>
              <td className="figure px-2">{money(o.p10)}</td>
              <td className="figure px-2">{money(o.p50)}</td>
              <td className="figure px-2">{money(o.p90)}</td>
              {withMean ? <td className="figure px-2">{money(o.mean)}</td> : null}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-soft">{children}</p>
    </div>
  );
}
