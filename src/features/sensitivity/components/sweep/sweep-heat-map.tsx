import { useMemo, useState } from 'react';
import type { KeyboardEvent, MouseEvent } from 'react';
import type { Scenario } from '../../../../contracts/scenario';
import type { SweepResult } from '../../../../engine/sensitivity/sweep';
import { formatMoney, formatNumber } from '../../../../lib/format';
import { optionLabel, shortName } from '../../lib/labels';
import { styleRgb } from '../../lib/option-colours';
import type { OptionStyle } from '../../lib/option-colours';
import { cellFraction, niceTicks, tickDecimals } from '../../lib/ticks';

const W = 720;
const H = 420;
const M = { left: 64, right: 16, top: 14, bottom: 48 };
const PW = W - M.left - M.right;
const PH = H - M.top - M.bottom;

/** The grid as a picture with one pixel per cell (price to the right, multiplier upward), as a data URL. */
function gridImage(r: SweepResult, styles: OptionStyle[]): string {
  const nT = r.tariffs.length;
  const nE = r.efficacyFactors.length;
  const canvas = document.createElement('canvas');
  canvas.width = nT;
  canvas.height = nE;
  const ctx = canvas.getContext('2d');
  if (!ctx) return '';
  const rgb = new Map(styles.map((s) => [s.id, styleRgb(s)]));
  const img = ctx.createImageData(nT, nE);
  for (let t = 0; t < nT; t++) {
    for (let e = 0; e < nE; e++) {
      const [red, green, blue] = rgb.get(r.winner[t]![e]!) ?? [128, 128, 128];
      const at = 4 * ((nE - 1 - e) * nT + t);
      img.data[at] = red;
      img.data[at + 1] = green;
      img.data[at + 2] = blue;
      img.data[at + 3] = 255;
    }
  }
  ctx.putImageData(img, 0, 0);
  return canvas.toDataURL();
}

/**
 * Which option costs least at each electricity price (across) and efficacy multiplier on one option
 * (up): a grid of our own design coloured by the winner, with the scenario as entered ringed. Pointing
 * at a cell, or moving over it with the arrow keys, tells its figures and one chosen option's present value.
 */
export default function SweepHeatMap({ result, scenario, styles, showValueOf }: {
  result: SweepResult;
  scenario: Scenario;
  styles: OptionStyle[];
  showValueOf: string;
}) {
  const href = useMemo(() => gridImage(result, styles), [result, styles]);
  const nT = result.tariffs.length;
  const nE = result.efficacyFactors.length;
  const [pointed, setPointed] = useState<{ t: number; e: number; of: SweepResult } | null>(null);
  const cell = pointed?.of === result ? pointed : null;
  const setCell = (next: { t: number; e: number } | null) => setPointed(next ? { ...next, of: result } : null);
  const tLo = result.tariffs[0]!;
  const tHi = result.tariffs[nT - 1]!;
  const eLo = result.efficacyFactors[0]!;
  const eHi = result.efficacyFactors[nE - 1]!;
  const xOf = (price: number) => M.left + cellFraction(price, tLo, tHi, nT) * PW;
  const yOf = (factor: number) => M.top + (1 - cellFraction(factor, eLo, eHi, nE)) * PH;
  const price = Number(scenario.electricity.pricePerKwh);
  const inside = price >= tLo && price <= tHi && 1 >= eLo && 1 <= eHi;
  const xTicks = useMemo(() => niceTicks(tLo, tHi, 6), [tLo, tHi]);
  const yTicks = useMemo(() => niceTicks(eLo, eHi, 5), [eLo, eHi]);
  const c = scenario.currency;

  const pick = (ev: MouseEvent<SVGRectElement>) => {
    const box = ev.currentTarget.getBoundingClientRect();
    const t = Math.min(nT - 1, Math.max(0, Math.floor(((ev.clientX - box.left) / box.width) * nT)));
    const e = Math.min(nE - 1, Math.max(0, nE - 1 - Math.floor(((ev.clientY - box.top) / box.height) * nE)));
    setCell({ t, e });
  };
  const keys = (ev: KeyboardEvent<HTMLDivElement>) => {
    const move: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };
    const d = move[ev.key];
    if (!d) return;
    ev.preventDefault();
    const step = ev.shiftKey ? 10 : 1;
    const from = cell ?? { t: Math.round((nT - 1) / 2), e: Math.round((nE - 1) / 2) };
    setCell({ t: Math.min(nT - 1, Math.max(0, from.t + d[0] * step)), e: Math.min(nE - 1, Math.max(0, from.e + d[1] * step)) });
  };

  const tip = cell
    ? {
        price: result.tariffs[cell.t]!,
        factor: result.efficacyFactors[cell.e]!,
        winner: result.winner[cell.t]![cell.e]!,
        value: result.presentValue[showValueOf]?.[cell.t]?.[cell.e],
      }
    : null;
  const cw = PW / nT;
  const ch = PH / nE;
  // The pointed cell, drawn at least 8 units wide so it shows on a 200 × 200 grid.
  const mark = cell
    ? { x: M.left + (cell.t + 0.5) * cw - Math.max(cw, 8) / 2, y: M.top + (nE - 0.5 - cell.e) * ch - Math.max(ch, 8) / 2, width: Math.max(cw, 8), height: Math.max(ch, 8) }
    : null;

  return (
    <div>
      <div
        tabIndex={0}
        role="group"
        aria-label="Grid of the cheapest option by price and efficacy multiplier; use the arrow keys to read cells"
        onKeyDown={keys}
        onBlur={() => setCell(null)}
        className="max-w-3xl rounded-md"
      >
        <svg viewBox={`0 0 ${W} ${H}`} className="w-full select-none" role="img" aria-label="Cheapest option at each price and efficacy multiplier" data-testid="sweep-grid">
          {href ? <image href={href} x={M.left} y={M.top} width={PW} height={PH} preserveAspectRatio="none" style={{ imageRendering: 'pixelated' }} /> : null}
          <rect x={M.left} y={M.top} width={PW} height={PH} fill="none" stroke="#b9b2a1" />
          {xTicks.map((v) => (
            <g key={`x${v}`} transform={`translate(${xOf(v)},${M.top + PH})`}>
              <line y2={5} stroke="#4b5759" />
              <text y={18} textAnchor="middle" fontSize={12} fill="#4b5759">{formatNumber(v, tickDecimals(xTicks))}</text>
            </g>
          ))}
          {yTicks.map((v) => (
            <g key={`y${v}`} transform={`translate(${M.left},${yOf(v)})`}>
              <line x2={-5} stroke="#4b5759" />
              <text x={-8} dy="0.32em" textAnchor="end" fontSize={12} fill="#4b5759">×{formatNumber(v, tickDecimals(yTicks))}</text>
            </g>
          ))}
          <text x={M.left + PW / 2} y={H - 8} textAnchor="middle" fontSize={13} fill="#1e2a2c">Electricity price in year 1 ({c} per kWh)</text>
          <text transform={`translate(14,${M.top + PH / 2}) rotate(-90)`} textAnchor="middle" fontSize={13} fill="#1e2a2c">
            Efficacy multiplier on {shortName(scenario, result.vary)}
          </text>
          {inside ? (
            <g transform={`translate(${xOf(price)},${yOf(1)})`} pointerEvents="none" data-testid="sweep-current">
              <circle r={9} fill="none" stroke="#ffffff" strokeWidth={4} />
              <circle r={9} fill="none" stroke="#1e2a2c" strokeWidth={2} />
              <text x={13} y={-10} fontSize={12} fontWeight={600} fill="#1e2a2c" stroke="#ffffff" strokeWidth={3} paintOrder="stroke">as entered</text>
            </g>
          ) : null}
          {mark ? (
            <g pointerEvents="none" fill="none">
              <rect {...mark} stroke="#ffffff" strokeWidth={3} />
              <rect {...mark} stroke="#1e2a2c" strokeWidth={1.5} />
            </g>
          ) : null}
          <rect x={M.left} y={M.top} width={PW} height={PH} fill="transparent" onMouseMove={pick} onMouseLeave={() => setCell(null)} data-testid="sweep-hover-area" />
        </svg>
      </div>
      <div role="status" aria-live="polite" className="min-h-12 max-w-3xl text-sm" data-testid="sweep-readout">
        {tip ? (
          <p>
            At <span className="figure">{formatNumber(tip.price, 4)}</span> {c} per kWh and ×<span className="figure">{formatNumber(tip.factor, 3)}</span> on{' '}
            {shortName(scenario, result.vary)}, the cheapest is <strong>{optionLabel(scenario, tip.winner)}</strong>. Present value of{' '}
            {shortName(scenario, showValueOf)}: <strong className="figure">{tip.value === undefined ? '—' : formatMoney(String(tip.value), c)}</strong>.
          </p>
        ) : (
          <p className="text-ink-soft">
            {inside ? 'The ring marks the scenario as entered. ' : `The scenario as entered (${formatNumber(price, 4)} ${c} per kWh, ×1) lies outside this grid. `}
            Point at the grid, or focus it and use the arrow keys (Shift moves ten cells), to read a cell’s figures.
          </p>
        )}
      </div>
    </div>
  );
}
