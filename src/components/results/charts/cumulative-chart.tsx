import { CartesianGrid, Legend, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultViewProps } from '../results-table';
import { TECHNOLOGY_COLOURS } from '../../technology';
import { cumulativeAt } from '../../../engine/payback';
import { formatMoney } from '../../../lib/format';

const DASHES = ['', '6 3', '2 3', '8 3 2 3'];

/** Cumulative nominal cost of each option over the years; a ring marks where an option pays back against the baseline. */
export default function CumulativeChart({ scenario, result }: ResultViewProps) {
  const options = result.options;
  const data = Array.from({ length: scenario.horizonYears + 1 }, (_, year) => {
    const row: Record<string, number> = { year };
    for (const o of options) row[o.id] = Number(o.years[year]?.cumulative ?? 0);
    return row;
  });
  const seen = new Map<string, number>();
  const styles = options.map((r) => {
    const o = scenario.options.find((x) => x.id === r.id);
    const tech = o?.technology ?? 'other';
    const n = seen.get(tech) ?? 0;
    seen.set(tech, n + 1);
    return { id: r.id, label: o?.label ?? r.id, colour: TECHNOLOGY_COLOURS[tech], dash: DASHES[n % DASHES.length] ?? '' };
  });
  const crossings = options.flatMap((o) => {
    if (o.paybackYears === null || o.id === scenario.baseline) return [];
    return [{ id: o.id, x: o.paybackYears, y: cumulativeAt(o.years.map((y) => y.cumulative), o.paybackYears).toNumber() }];
  });
  const money = (v: number) => formatMoney(String(Math.round(v)), scenario.currency);
  return (
    <div className="h-72 w-full" aria-hidden="true">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ left: 8, right: 16, top: 8, bottom: 4 }}>
          <CartesianGrid stroke="#e5e0d4" />
          <XAxis type="number" dataKey="year" domain={[0, scenario.horizonYears]} allowDecimals={false} stroke="#4b5759" fontSize={12}
            label={{ value: 'year', position: 'insideBottomRight', offset: -2, fontSize: 12 }} />
          <YAxis tickFormatter={money} width={90} stroke="#4b5759" fontSize={12} />
          <Tooltip formatter={(v) => money(Number(v))} labelFormatter={(v) => `Year ${String(v)}`} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {styles.map((s) => (
            <Line key={s.id} dataKey={s.id} name={s.label} stroke={s.colour} strokeDasharray={s.dash} strokeWidth={2} dot={false} isAnimationActive={false} />
          ))}
          {crossings.map((c) => (
            <ReferenceDot key={c.id} x={c.x} y={c.y} r={6} fill="none" stroke="#1e2a2c" strokeWidth={2} />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
