import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ResultViewProps } from '../results-table';
import { formatMoney } from '../../../lib/format';

/** Cost categories and our own colours for them. */
export const COST_PARTS = [
  { key: 'capex', label: 'Fixtures and installation', colour: '#1f4a4f' },
  { key: 'energyCost', label: 'Electricity', colour: '#d9a441' },
  { key: 'coolingCost', label: 'Cooling', colour: '#6f9fb0' },
  { key: 'demandCost', label: 'Demand charges', colour: '#a86a4c' },
  { key: 'lampCost', label: 'Replacement lamps', colour: '#8f9a6a' },
] as const;

/** Stacked bars of what each option costs over the horizon (nominal), part by part. */
export default function CostBreakdownChart({ scenario, result }: ResultViewProps) {
  const label = (id: string) => scenario.options.find((o) => o.id === id)?.label ?? id;
  const data = result.options.map((o) => ({
    name: label(o.id),
    capex: Number(o.capex),
    energyCost: Number(o.energyCost),
    coolingCost: Number(o.coolingCost),
    demandCost: Number(o.demandCost),
    lampCost: Number(o.lampCost),
  }));
  const money = (v: number) => formatMoney(String(Math.round(v)), scenario.currency);
  return (
    <div className="h-72 w-full" aria-hidden="true">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} layout="vertical" margin={{ left: 8, right: 16, top: 4, bottom: 4 }}>
          <CartesianGrid stroke="#e5e0d4" horizontal={false} />
          <XAxis type="number" tickFormatter={money} stroke="#4b5759" fontSize={12} />
          <YAxis type="category" dataKey="name" width={180} stroke="#4b5759" fontSize={12} />
          <Tooltip formatter={(v) => money(Number(v))} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {COST_PARTS.map((p) => (
            <Bar key={p.key} dataKey={p.key} name={p.label} stackId="cost" fill={p.colour} isAnimationActive={false} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
