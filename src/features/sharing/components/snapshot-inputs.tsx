import type { SnapshotFixture } from '../../../contracts/api/snapshots';
import type { Scenario } from '../../../contracts/scenario';
import { TechnologyTag } from '../../../components/technology';
import { formatMoney, formatNumber } from '../../../lib/format';

const SOURCE: Record<string, string> = { datasheet: "maker's datasheet", measured: 'measured', estimate: 'estimate' };

function provenance(f: SnapshotFixture | undefined): string {
  if (!f?.dataSource) return 'entered in the scenario';
  return `${SOURCE[f.dataSource] ?? f.dataSource}${f.matchesLibrary ? '' : ', changed in the scenario'}`;
}

/** What the figures assume: the room, the target, the schedule and tariff, and each option with where its data came from. */
export function SnapshotInputs({ scenario: s, fixtures }: { scenario: Scenario; fixtures: SnapshotFixture[] }) {
  const c = s.currency;
  const byOption = new Map(fixtures.map((f) => [f.optionId, f]));
  const rows: Array<[string, string]> = [
    ['Canopy', `${formatNumber(s.canopy.lengthM, 2)} m × ${formatNumber(s.canopy.widthM, 2)} m`],
    ['Target', s.target.dli !== undefined ? `DLI ${s.target.dli} mol m⁻² d⁻¹` : `PPFD ${s.target.ppfd} µmol m⁻² s⁻¹`],
    ['Growth phases', s.schedule.map((p) => `${p.label}: ${p.hoursPerDay} h a day for ${p.daysPerYear} days`).join('; ')],
    ['Leveling', `${s.levelAt} output, ${s.fixtureCount} fixture counts, utilization ${s.utilization}`],
    ['Electricity', `${formatMoney(s.electricity.pricePerKwh, c)} per kWh, rising ${s.electricity.escalationPctPerYear} % a year; demand charge ${formatMoney(s.electricity.demandChargePerKwMonth, c)} per kW and month`],
    ['Cooling', s.cooling ? `COP ${s.cooling.cop}, removing ${formatNumber(s.cooling.share * 100, 0)} % of the lamps' heat` : 'not counted'],
    ['Horizon', `${s.horizonYears} years, discounted at ${s.discountRatePct} % a year`],
    ['Baseline', s.options.find((o) => o.id === s.baseline)?.label ?? s.baseline],
  ];
  return (
    <div className="space-y-3">
      <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[12rem_1fr]">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-soft">{k}</dt>
            <dd>{v}</dd>
          </div>
        ))}
      </dl>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[44rem] border-collapse text-sm">
          <caption className="sr-only">Options compared and where their figures came from</caption>
          <thead>
            <tr className="border-b border-line-strong text-left text-ink-soft">
              <th scope="col" className="py-1 pr-2 font-medium">Option</th>
              <th scope="col" className="px-2 text-right font-medium">Wall power</th>
              <th scope="col" className="px-2 text-right font-medium">Efficacy or PPF</th>
              <th scope="col" className="px-2 text-right font-medium">Fixture price</th>
              <th scope="col" className="px-2 text-right font-medium">Lamp</th>
              <th scope="col" className="pl-2 font-medium">Data from</th>
            </tr>
          </thead>
          <tbody>
            {s.options.map((o) => (
              <tr key={o.id} className="border-b border-line align-top">
                <th scope="row" className="py-1 pr-2 text-left font-normal">
                  <TechnologyTag technology={o.technology} /> {o.label}
                </th>
                <td className="figure px-2 text-right">{formatNumber(o.wallWatts, 0)} W</td>
                <td className="figure px-2 text-right">{o.photonEfficacy !== undefined ? `${formatNumber(o.photonEfficacy, 2)} µmol/J` : `${formatNumber(o.ppf ?? 0, 0)} µmol/s`}</td>
                <td className="figure px-2 text-right">{o.owned ? 'owned' : o.fixturePrice ? formatMoney(o.fixturePrice, c) : '—'}</td>
                <td className="figure px-2 text-right">{o.lamp ? `${formatMoney(o.lamp.price, c)} every ${formatNumber(o.lamp.replaceEveryHours, 0)} h` : '—'}</td>
                <td className="pl-2">{provenance(byOption.get(o.id))}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
