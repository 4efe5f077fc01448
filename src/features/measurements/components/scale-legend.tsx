import { useId } from 'react';
import { formatNumber } from '../../../lib/format';
import { SCALE_STOPS, scalePosition } from '../lib/colour-scale';

/** The heat map's colour scale as a bar from the lowest to the highest reading, with the mean marked. */
export function ScaleLegend({ min, max, mean }: { min: number; max: number; mean: number }) {
  const id = useId().replace(/:/g, '');
  const W = 320;
  const meanX = 10 + scalePosition(mean, min, max) * W;
  return (
    <svg viewBox={`0 0 ${W + 20} 48`} className="h-auto w-full max-w-sm" role="img" aria-label={`Colour scale: dark ${formatNumber(min, 0)}, pale ${formatNumber(max, 0)} µmol m⁻² s⁻¹, mean ${formatNumber(mean, 0)}`}>
      <defs>
        <linearGradient id={`scale-${id}`} x1="0" x2="1" y1="0" y2="0">
          {SCALE_STOPS.map((s) => <stop key={s.at} offset={s.at} stopColor={`rgb(${s.rgb.join(',')})`} />)}
        </linearGradient>
      </defs>
      <rect x={10} y={4} width={W} height={14} fill={`url(#scale-${id})`} stroke="#b9b2a1" />
      <line x1={meanX} x2={meanX} y1={2} y2={22} stroke="#1e2a2c" strokeWidth={1.5} />
      <text x={10} y={34} fontSize={11} fill="#1e2a2c">{formatNumber(min, 0)} (min)</text>
      <text x={meanX} y={46} fontSize={11} fill="#1e2a2c" textAnchor="middle">mean {formatNumber(mean, 0)}</text>
      <text x={W + 10} y={34} fontSize={11} fill="#1e2a2c" textAnchor="end">{formatNumber(max, 0)} (max) µmol m⁻² s⁻¹</text>
    </svg>
  );
}
