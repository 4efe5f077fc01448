import { Area, AreaChart, CartesianGrid, ReferenceArea, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../../../lib/format';
import { BANDS } from './bands';

/** Props of the chart: wavelengths (nm) and photons per nm, already scaled for display. */
export interface SpectrumChartProps {
  wavelengthNm: number[];
  photons: number[];
  unitLabel: string;
}

/** The photon spectrum as an area over wavelength with the four bands shaded behind it; loaded only when first shown. */
export default function SpectrumChart({ wavelengthNm, photons, unitLabel }: SpectrumChartProps) {
  const data = wavelengthNm.map((nm, i) => ({ nm, photons: photons[i] ?? 0 }));
  const lo = wavelengthNm[0] ?? 380;
  const hi = wavelengthNm[wavelengthNm.length - 1] ?? 780;
  const ticks = Array.from({ length: Math.floor(hi / 50) - Math.ceil(lo / 50) + 1 }, (_, i) => (Math.ceil(lo / 50) + i) * 50);
  const top = photons.reduce((a, b) => Math.max(a, b), 0);
  const digits = top >= 10 ? 0 : top >= 1 ? 1 : top >= 0.1 ? 2 : 3;
  return (
    <div className="h-80 w-full" data-testid="spectrum-chart">
      <ResponsiveContainer width="100%" height="100%">
        <AreaChart data={data} margin={{ top: 24, right: 16, bottom: 24, left: 8 }}>
          {BANDS.filter((b) => b.nm[1] > lo && b.nm[0] < hi).map((b) => (
            <ReferenceArea key={b.key} x1={Math.max(b.nm[0], lo)} x2={Math.min(b.nm[1], hi)} fill={b.tint} fillOpacity={0.16} strokeOpacity={0}
              label={{ value: `${b.name} ${b.nm[0]}–${b.nm[1]}`, position: 'insideTop', fontSize: 11, fill: '#1e2a2c' }} ifOverflow="hidden" />
          ))}
          <CartesianGrid stroke="#d9d4c7" strokeDasharray="2 4" vertical={false} />
          <XAxis dataKey="nm" type="number" domain={[lo, hi]} allowDataOverflow ticks={ticks} label={{ value: 'wavelength, nm', position: 'insideBottom', offset: -12, fontSize: 12 }} fontSize={11} />
          <YAxis fontSize={11} width={56} tickFormatter={(v: number) => formatNumber(v, digits)} label={{ value: unitLabel, angle: -90, position: 'insideLeft', fontSize: 11, dy: 60 }} />
          <Tooltip formatter={(v) => [formatNumber(Number(v), 4), unitLabel]} labelFormatter={(nm) => `${formatNumber(Number(nm), 1)} nm`} />
          <Area type="linear" dataKey="photons" stroke="#1f4a4f" strokeWidth={1.5} fill="#1f4a4f" fillOpacity={0.22} isAnimationActive={false} dot={false} />
        </AreaChart>
      </ResponsiveContainer>
    </div>
  );
}
