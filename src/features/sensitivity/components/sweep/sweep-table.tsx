import type { Scenario } from '../../../../contracts/scenario';
import type { SweepResult } from '../../../../engine/sensitivity/sweep';
import { Button } from '../../../../components/ui/button';
import { formatMoney, formatNumber } from '../../../../lib/format';
import { shortName } from '../../lib/labels';
import { spreadIndices, sweepCsv } from './sweep-csv';

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** The grid in words: a coarser table of winners and one option's present value, and the full grid as CSV. */
export function SweepTable({ result, scenario, showValueOf }: { result: SweepResult; scenario: Scenario; showValueOf: string }) {
  const rows = spreadIndices(result.tariffs.length, 9);
  const cols = spreadIndices(result.efficacyFactors.length, 5);
  const c = scenario.currency;
  const values = result.presentValue[showValueOf];
  return (
    <details className="mt-2 text-sm">
      <summary className="cursor-pointer text-spruce-700">The grid as a table</summary>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full border-collapse" aria-label="Cheapest option by price and efficacy multiplier">
          <caption className="mb-1 text-left text-ink-soft">
            Rows: year-1 price. Columns: efficacy multiplier on {shortName(scenario, result.vary)}. Every cell names the cheapest option;
            below it, the present value of {shortName(scenario, showValueOf)}. A sample of{' '}
            {rows.length} of {result.tariffs.length} prices and {cols.length} of {result.efficacyFactors.length} multipliers.
          </caption>
          <thead>
            <tr className="border-b border-line-strong text-ink-soft">
              <th scope="col" className="text-left font-medium">Price ({c}/kWh)</th>
              {cols.map((e) => (
                <th key={e} scope="col" className="px-2 text-right font-medium">×{formatNumber(result.efficacyFactors[e]!, 2)}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((t) => (
              <tr key={t} className="border-b border-line align-top">
                <th scope="row" className="figure text-left font-normal">{formatNumber(result.tariffs[t]!, 4)}</th>
                {cols.map((e) => (
                  <td key={e} className="px-2 text-right">
                    <span className="block">{shortName(scenario, result.winner[t]![e]!)}</span>
                    <span className="figure block text-ink-soft">{values ? formatMoney(String(values[t]![e]!), c) : '—'}</span>
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Button size="sm" className="mt-2" onClick={() => download(`sweep-${result.vary}.csv`, sweepCsv(result))}>
        Download every cell as CSV ({formatNumber(result.tariffs.length * result.efficacyFactors.length)} lines)
      </Button>
    </details>
  );
}
