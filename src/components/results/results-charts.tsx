import { lazy, Suspense } from 'react';
import type { ResultViewProps } from './results-table';
import { paybackText } from './results-table';
import { formatMoney } from '../../lib/format';
import { LoadingState } from '../ui/states';

const CostBreakdownChart = lazy(() => import('./charts/cost-breakdown-chart'));
const CumulativeChart = lazy(() => import('./charts/cumulative-chart'));

/**
 * The two charts with their text equivalents: the cost breakdown as a table, the cumulative cost as
 * sentences naming each payback year. The chart code loads only when this is first shown.
 */
export function ResultsCharts(props: ResultViewProps) {
  const { scenario, result } = props;
  const label = (id: string) => scenario.options.find((o) => o.id === id)?.label ?? id;
  const c = scenario.currency;
  const baseline = label(scenario.baseline);
  return (
    <div className="grid gap-4 xl:grid-cols-2">
      <figure>
        <figcaption className="mb-1 font-semibold">What each option costs over {scenario.horizonYears} years, by part</figcaption>
        <Suspense fallback={<LoadingState what="Drawing the chart" />}>
          <CostBreakdownChart {...props} />
        </Suspense>
        <details className="mt-1 text-sm">
          <summary className="cursor-pointer text-spruce-700">The same figures as a table</summary>
          <table className="mt-1 w-full border-collapse">
            <thead>
              <tr className="border-b border-line-strong text-right text-ink-soft">
                <th scope="col" className="text-left font-medium">Option</th>
                <th scope="col" className="font-medium">Fixtures</th>
                <th scope="col" className="font-medium">Electricity</th>
                <th scope="col" className="font-medium">Cooling</th>
                <th scope="col" className="font-medium">Demand</th>
                <th scope="col" className="font-medium">Lamps</th>
              </tr>
            </thead>
            <tbody>
              {result.options.map((o) => (
                <tr key={o.id} className="border-b border-line text-right">
                  <th scope="row" className="text-left font-normal">{label(o.id)}</th>
                  <td className="figure">{formatMoney(o.capex, c)}</td>
                  <td className="figure">{formatMoney(o.energyCost, c)}</td>
                  <td className="figure">{formatMoney(o.coolingCost, c)}</td>
                  <td className="figure">{formatMoney(o.demandCost, c)}</td>
                  <td className="figure">{formatMoney(o.lampCost, c)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      </figure>
      <figure>
        <figcaption className="mb-1 font-semibold">Running total of cost, year by year (a ring marks where an option pays back)</figcaption>
        <Suspense fallback={<LoadingState what="Drawing the chart" />}>
          <CumulativeChart {...props} />
        </Suspense>
        <ul className="mt-1 list-disc pl-5 text-sm" aria-label="Payback against the baseline">
          {result.options
            .filter((o) => o.id !== scenario.baseline)
            .map((o) => (
              <li key={o.id}>
                {label(o.id)}: pays back against {baseline} {o.paybackYears === null ? 'not within the horizon' : paybackText(o.paybackYears, false) === 'at once' ? 'at once' : `after ${paybackText(o.paybackYears, false)}`}; running total after {scenario.horizonYears} years{' '}
                {formatMoney(o.totalNominal, c)}.
              </li>
            ))}
        </ul>
      </figure>
    </div>
  );
}
