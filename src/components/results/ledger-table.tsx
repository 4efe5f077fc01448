import { useState } from 'react';
import type { ResultViewProps } from './results-table';
import { formatMoney } from '../../lib/format';
import { Select } from '../ui/input';

/** The yearly ledger of one chosen option: year 0 holds the capital outlay, later years the running costs. */
export function LedgerTable({ scenario, result }: ResultViewProps) {
  const [chosen, setChosen] = useState(result.cheapest);
  const option = result.options.find((o) => o.id === chosen) ?? result.options[0];
  const label = (id: string) => scenario.options.find((o) => o.id === id)?.label ?? id;
  const c = scenario.currency;
  if (!option) return null;
  return (
    <div>
      <label className="mb-2 flex max-w-md items-center gap-2 text-sm">
        <span className="shrink-0 text-ink-soft">Yearly ledger of</span>
        <Select value={option.id} onChange={(e) => setChosen(e.target.value)}>
          {result.options.map((o) => (
            <option key={o.id} value={o.id}>
              {label(o.id)}
            </option>
          ))}
        </Select>
      </label>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[44rem] border-collapse text-sm">
          <caption className="sr-only">Yearly ledger of {label(option.id)}</caption>
          <thead>
            <tr className="border-b border-line-strong text-right text-ink-soft">
              <th scope="col" className="py-1 pr-2 text-left font-medium">Year</th>
              <th scope="col" className="px-2 font-medium">Fixtures</th>
              <th scope="col" className="px-2 font-medium">Electricity</th>
              <th scope="col" className="px-2 font-medium">Cooling</th>
              <th scope="col" className="px-2 font-medium">Demand</th>
              <th scope="col" className="px-2 font-medium">Lamps</th>
              <th scope="col" className="px-2 font-medium">Year total</th>
              <th scope="col" className="pl-2 font-medium">Running total</th>
            </tr>
          </thead>
          <tbody>
            {option.years.map((y) => (
              <tr key={y.year} className="border-b border-line text-right">
                <th scope="row" className="figure py-1 pr-2 text-left font-normal">{y.year}</th>
                <td className="figure px-2">{formatMoney(y.capex, c)}</td>
                <td className="figure px-2">{formatMoney(y.energy, c)}</td>
                <td className="figure px-2">{formatMoney(y.cooling, c)}</td>
                <td className="figure px-2">{formatMoney(y.demand, c)}</td>
                <td className="figure px-2">{formatMoney(y.lamps, c)}</td>
                <td className="figure px-2">{formatMoney(y.total, c)}</td>
                <td className="figure pl-2 font-medium">{formatMoney(y.cumulative, c)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
