import { Bar, BarChart, CartesianGrid, Legend, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { axisMoney } from '../../lib/axis-money';

/** One bar pair: how far the measure moves when the input is lowered and when it is raised. */
export interface SwingBar {
  name: string;
  lowered: number;
  raised: number;
}

/** Horizontal bars of the change in the measure, largest swing at the top; the table beside it has the numbers. */
export default function SwingsChart({ bars, pct, currency }: { bars: SwingBar[]; pct: number; currency: string }) {
  const money = (v: number) => axisMoney(v, currency);
  return (
    <div className="w-full" style={{ height: 70 + bars.length * 34 }} aria-hidden="true" data-testid="swings-chart">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={bars} layout="vertical" margin={{ left: 8, right: 24, top: 4, bottom: 4 }} barGap={1}>
          <CartesianGrid stroke="#e5e0d4" horizontal={false} />
          <XAxis type="number" tickFormatter={money} stroke="#4b5759" fontSize={12} />
          <YAxis type="category" dataKey="name" width={250} stroke="#4b5759" fontSize={12} interval={0} />
          <ReferenceLine x={0} stroke="#1e2a2c" />
          <Tooltip formatter={(v) => money(Number(v))} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="lowered" name={`Input lowered by ${pct} %`} fill="#2b6166" isAnimationActive={false} />
          <Bar dataKey="raised" name={`Input raised by ${pct} %`} fill="#d9a441" isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
