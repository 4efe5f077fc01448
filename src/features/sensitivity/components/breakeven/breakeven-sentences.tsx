import type { Scenario } from '../../../../contracts/scenario';
import { MAX_PHOTON_EFFICACY } from '../../../../contracts/scenario';
import { dec } from '../../../../engine/money';
import type { EfficacyBreakeven } from '../../../../engine/sensitivity/breakeven';
import { efficacyBreakevenFigures } from '../../../../engine/sensitivity/breakeven-figures';
import { formatMoney, formatNumber } from '../../../../lib/format';
import { optionLabel } from '../../lib/labels';
import type { BreakevenReport } from '../../worker/breakeven-report';

const F = ({ children }: { children: string }) => <strong className="figure">{children}</strong>;

/** The break-even price of a pair in sentences, with which option costs less on each side of it. */
export function PriceSentences({ r, scenario }: { r: BreakevenReport; scenario: Scenario }) {
  const c = scenario.currency;
  const A = optionLabel(scenario, r.a);
  const B = optionLabel(scenario, r.b);
  const gapNow = dec(r.gapNow);
  const aCheaperAtZero = dec(r.gapAtZero).lt(0);
  const cheaperLow = aCheaperAtZero ? A : B;
  const dearerLow = aCheaperAtZero ? B : A;
  const nowCheaper = gapNow.lt(0) ? A : B;
  const years = scenario.horizonYears;
  const p = r.price;
  return (
    <div className="space-y-1" data-testid="breakeven-price">
      {p.pricePerKwh !== null ? (
        <p>
          Over {years} years, <em>{A}</em> and <em>{B}</em> cost the same at a year-1 electricity price of <F>{formatNumber(p.pricePerKwh, 6)}</F> {c} per kWh
          (the scenario has <F>{formatNumber(r.currentPrice, 4)}</F>). Below that price {cheaperLow} costs less; above it, {dearerLow} does.
        </p>
      ) : p.reason === 'equal-at-every-price' ? (
        <p>Over {years} years, <em>{A}</em> and <em>{B}</em> cost the same at every electricity price.</p>
      ) : p.reason === 'never-equal' ? (
        <p>Over {years} years, <em>{A}</em> and <em>{B}</em> never cost the same: {cheaperLow} costs less at every electricity price.</p>
      ) : (
        <p>
          <em>{A}</em> and <em>{B}</em> would cost the same only at a price below 0 or above 100 {c} per kWh; at every price in between, {cheaperLow} costs less.
        </p>
      )}
      {!gapNow.isZero() ? (
        <p>
          At the scenario’s own price, {nowCheaper} costs <F>{formatMoney(gapNow.abs().toString(), c)}</F> less in present value.
        </p>
      ) : null}
      {p.pricePerKwh !== null ? (
        <p className="text-xs text-ink-soft">
          Found in closed form from the yearly ledger ({p.exact} per kWh);{' '}
          {p.verified ? 'a separate bracketed search agrees to within 0.000000001 per kWh.' : 'a separate bracketed search did not agree to 0.000000001 per kWh; treat the figure with care.'}
        </p>
      ) : null}
    </div>
  );
}

/** How far one option's efficacy would have to move for it to cost no more than the other, in a sentence. */
export function EfficacySentence({ e, scenario, efficacy, noDearerNow }: { e: EfficacyBreakeven; scenario: Scenario; efficacy: number; noDearerNow: boolean }) {
  const V = optionLabel(scenario, e.vary);
  const O = optionLabel(scenario, e.against);
  const [, hi] = e.searched;
  const f = efficacyBreakevenFigures(e, efficacy);
  if (e.factor === null || f.breakevenEfficacy === null || f.changePct === null) {
    return noDearerNow ? (
      <p>{V} costs no more than {O} even at ×<F>{formatNumber(e.searched[0], 2)}</F> of its photon efficacy.</p>
    ) : (
      <p>
        Even at ×<F>{formatNumber(hi, 3)}</F> of its photon efficacy ({formatNumber(f.topEfficacy, 2)} µmol/J
        {f.topIsPhysicalLimit ? `, the physical limit of ${MAX_PHOTON_EFFICACY} µmol/J for 400–700 nm` : ''}), {V} still costs more than {O}.
      </p>
    );
  }
  const change = f.changePct < 0
    ? `could lose ${formatNumber(-f.changePct, 1)} % of its photon efficacy and still cost no more than`
    : `would need ${formatNumber(f.changePct, 1)} % more photon efficacy to cost no more than`;
  return (
    <p>
      {V} {change} {O} at the scenario’s price: the break-even multiplier is ×<F>{formatNumber(e.factor, 4)}</F>, that is{' '}
      <F>{formatNumber(f.breakevenEfficacy, 3)}</F> µmol/J instead of <F>{formatNumber(efficacy, 3)}</F>.
      {e.kind === 'step' ? ' With whole fixtures the cost falls in steps, so the two are never exactly equal; this is the step at which the count drops far enough.' : ''}
    </p>
  );
}
