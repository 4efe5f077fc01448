import { Bar, BarChart, CartesianGrid, Cell, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { Scenario } from '../../../../contracts/scenario';
import type { UncertaintySummary } from '../../../../engine/sensitivity/uncertainty';
import { formatNumber } from '../../../../lib/format';
import { axisMoney } from '../../lib/axis-money';
import { shortName } from '../../lib/labels';
import type { OptionStyle } from '../../lib/option-colours';
import { niceTicks } from '../../lib/ticks';

/** Chance of being cheapest as bars, and the P10–P90 spread of each present value with its P50; the table has the numbers. */
export default function UncertaintyCharts({ result, scenario, styles }: { result: UncertaintySummary; scenario: Scenario; styles: OptionStyle[] }) {
  const colour = new Map(styles.map((s) => [s.id, s.css]));
  const data = result.options.map((o) => ({ id: o.id, name: shortName(scenario, o.id), chance: 100 * o.chanceCheapest }));
  return (
    <div className="grid gap-4 xl:grid-cols-2" aria-hidden="true">
      <figure>
        <figcaption className="mb-1 text-sm font-semibold">Chance of being the cheapest</figcaption>
        <div style={{ height: 50 + data.length * 36 }} data-testid="uncertainty-chance-chart">
          <ResponsiveContainer width="100%" height="100%">
            <BarChart data={data} layout="vertical" margin={{ left: 8, right: 24, top: 4, bottom: 4 }}>
              <CartesianGrid stroke="#e5e0d4" horizontal={false} />
              <XAxis type="number" domain={[0, 100]} tickFormatter={(v: number) => `${v} %`} stroke="#4b5759" fontSize={12} />
              <YAxis type="category" dataKey="name" width={220} stroke="#4b5759" fontSize={12} interval={0} />
              <Tooltip formatter={(v) => `${formatNumber(Number(v), 1)} %`} />
              <Bar dataKey="chance" name="Chance of being cheapest" isAnimationActive={false}>
                {data.map((d) => <Cell key={d.id} fill={colour.get(d.id) ?? '#8a8478'} />)}
              </Bar>
            </BarChart>
          </ResponsiveContainer>
        </div>
      </figure>
      <figure>
        <figcaption className="mb-1 text-sm font-semibold">Present value: P10 to P90, with the P50 marked</figcaption>
        <SpreadChart result={result} scenario={scenario} colour={colour} />
      </figure>
    </div>
  );
}

function SpreadChart({ result, scenario, colour }: { result: UncertaintySummary; scenario: Scenario; colour: Map<string, string> }) {
  const W = 560;
  const row = 36;
  const M = { left: 224, right: 20, top: 6, bottom: 30 };
  const H = M.top + M.bottom + row * result.options.length;
  const lo = Math.min(...result.options.map((o) => o.p10));
  const hi = Math.max(...result.options.map((o) => o.p90));
  const pad = (hi - lo) * 0.05 || Math.abs(hi) * 0.05 || 1;
  const ticks = niceTicks(lo - pad, hi + pad, 6);
  const from = Math.min(lo - pad, ticks[0]!);
  const to = Math.max(hi + pad, ticks.at(-1)!);
  const x = (v: number) => M.left + ((v - from) / (to - from)) * (W - M.left - M.right);
  const money = (v: number) => axisMoney(v, scenario.currency);
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="w-full" data-testid="uncertainty-spread-chart">
      {ticks.map((t) => (
        <g key={t} transform={`translate(${x(t)},0)`}>
          <line y1={M.top} y2={H - M.bottom} stroke="#e5e0d4" />
          <text y={H - M.bottom + 16} textAnchor="middle" fontSize={11} fill="#4b5759">{money(t)}</text>
        </g>
      ))}
      {result.options.map((o, i) => {
        const y = M.top + row * i + row / 2;
        return (
          <g key={o.id}>
            <text x={M.left - 8} y={y} dy="0.32em" textAnchor="end" fontSize={12} fill="#1e2a2c">{shortName(scenario, o.id)}</text>
            <rect x={x(o.p10)} y={y - 8} width={Math.max(2, x(o.p90) - x(o.p10))} height={16} rx={3} fill={colour.get(o.id) ?? '#8a8478'} opacity={0.85} />
            <line x1={x(o.p50)} x2={x(o.p50)} y1={y - 12} y2={y + 12} stroke="#1e2a2c" strokeWidth={2.5} />
          </g>
        );
      })}
    </svg>
  );
}
