import type { Scenario } from '../../contracts/scenario';
import type { ScenarioResult } from '../../engine/result-types';
import { displayArea } from '../../engine/units-convert';
import type { UnitSystem } from '../../engine/units-convert';
import { formatMoney, formatNumber, formatSmallMoney } from '../../lib/format';
import { Badge } from '../ui/badge';
import { TechnologyTag } from '../technology';

/** Props shared by the result views: the scenario as computed, its result, and how to show figures. */
export interface ResultViewProps {
  scenario: Scenario;
  result: ScenarioResult;
  unitSystem: UnitSystem;
}

/** Payback in plain words: "2.4 years", "at once", "never within the horizon", or "—" for the baseline. */
export function paybackText(payback: number | null, isBaseline: boolean): string {
  if (isBaseline) return 'baseline';
  if (payback === null) return 'not within the horizon';
  if (payback === 0) return 'at once';
  return `${formatNumber(payback, 1)} years`;
}

/**
 * The leveled comparison: one row per option with counts, achieved PPFD, money totals, cost per mol
 * and payback; the option with the lowest present value is marked in words, not only by colour.
 */
export function ResultsTable({ scenario, result, unitSystem }: ResultViewProps) {
  const currency = scenario.currency;
  const area = displayArea(result.canopyAreaM2, unitSystem);
  const byId = new Map(scenario.options.map((o) => [o.id, o]));
  const cheapest = byId.get(result.cheapest);
  return (
    <div>
      <p className="mb-2 text-sm text-ink-soft">
        Leveled to <span className="figure text-ink">{formatNumber(result.targetPpfd, 0)}</span> µmol m⁻² s⁻¹ over{' '}
        <span className="figure text-ink">{formatNumber(area.value, 1)}</span> {area.unit}, lit{' '}
        <span className="figure text-ink">{formatNumber(result.litHoursPerYear, 0)}</span> h a year for {scenario.horizonYears} years. Lowest
        present value: <strong className="text-ink">{cheapest?.label ?? result.cheapest}</strong>.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[56rem] border-collapse text-sm">
          <caption className="sr-only">Leveled options and their costs over the horizon</caption>
          <thead>
            <tr className="border-b border-line-strong text-left text-ink-soft">
              <th scope="col" className="min-w-[14rem] py-1.5 pr-2 font-medium">Option</th>
              <th scope="col" className="px-2 text-right font-medium">Fixtures (exact)</th>
              <th scope="col" className="px-2 text-right font-medium">Fixtures (whole)</th>
              <th scope="col" className="px-2 text-right font-medium">Achieved PPFD</th>
              <th scope="col" className="px-2 text-right font-medium">Up-front</th>
              <th scope="col" className="px-2 text-right font-medium">Total, nominal</th>
              <th scope="col" className="px-2 text-right font-medium">Present value</th>
              <th scope="col" className="px-2 text-right font-medium">Per mol</th>
              <th scope="col" className="pl-2 text-right font-medium">Pays back</th>
            </tr>
          </thead>
          <tbody>
            {result.options.map((r) => {
              const o = byId.get(r.id);
              const isCheapest = r.id === result.cheapest;
              return (
                <tr key={r.id} className={`border-b border-line ${isCheapest ? 'bg-ok-50' : ''}`} data-option={r.id}>
                  <th scope="row" className="py-1.5 pr-2 text-left font-normal">
                    <div className="font-medium leading-snug">{o?.label ?? r.id}</div>
                    <div className="mt-0.5 flex flex-wrap items-center gap-1.5">
                      {o ? <TechnologyTag technology={o.technology} /> : null}
                      {isCheapest ? <Badge tone="ok">lowest present value</Badge> : null}
                      {r.id === scenario.baseline ? <Badge tone="spruce">baseline</Badge> : null}
                    </div>
                  </th>
                  <td className="figure px-2 text-right">{formatNumber(r.fixturesExact, 2)}</td>
                  <td className="figure px-2 text-right">{formatNumber(r.fixturesWhole, 0)}</td>
                  <td className="figure px-2 text-right">{formatNumber(r.achievedPpfd, 0)}</td>
                  <td className="figure px-2 text-right">{formatMoney(r.capex, currency)}</td>
                  <td className="figure px-2 text-right">{formatMoney(r.totalNominal, currency)}</td>
                  <td className="figure px-2 text-right font-medium">{formatMoney(r.totalPresentValue, currency)}</td>
                  <td className="figure px-2 text-right">{formatSmallMoney(r.costPerMol, currency, 4)}</td>
                  <td className="pl-2 text-right">{paybackText(r.paybackYears, r.id === scenario.baseline)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-xs text-ink-soft">
        Costs follow the {scenario.fixtureCount === 'whole' ? 'whole (rounded up)' : 'exact (fractional)'} fixture count, leveled at{' '}
        {scenario.levelAt === 'initial' ? 'initial' : 'maintained'} output. Per mol: present value per mol of photons delivered to the
        canopy over the horizon.
      </p>
    </div>
  );
}
