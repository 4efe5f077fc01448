import type { Scenario } from '../../../contracts/scenario';
import { formatNumber } from '../../../lib/format';
import { optionLabel } from '../lib/labels';
import type { OptionStyle } from '../lib/option-colours';

function shareWords(share: number): string {
  if (share > 0 && share < 0.01) return 'under 1 %';
  if (share < 1 && share > 0.99) return 'over 99 %';
  return `${formatNumber(100 * share, 0)} %`;
}

/** Swatch and full label of each option, with an optional share (e.g. of the grid it wins) in words. */
export function OptionLegend({ scenario, styles, shares, shareText }: {
  scenario: Scenario;
  styles: OptionStyle[];
  shares?: Map<string, number>;
  shareText?: string;
}) {
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm" aria-label="Colour of each option">
      {styles.map((s) => (
        <li key={s.id} className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block size-3.5 rounded-sm border border-ink/20" style={{ background: s.css }} />
          <span>{optionLabel(scenario, s.id)}</span>
          {shares ? <span className="text-ink-soft">{shareWords(shares.get(s.id) ?? 0)} {shareText}</span> : null}
        </li>
      ))}
    </ul>
  );
}
