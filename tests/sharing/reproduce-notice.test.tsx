import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { compareResults, computeScenario, ENGINE_VERSION } from '../../src/engine';
import type { ScenarioResult } from '../../src/engine';
import { ReproduceNotice } from '../../src/features/sharing/components/reproduce-notice';
import { shippedScenario } from '../support/scenarios';

const text = (html: string) => html.replace(/<[^>]+>/g, ' ').replace(/&#x27;/g, "'").replace(/\s+/g, ' ');

describe('the reproduce notice of the read-only page', () => {
  const scenario = shippedScenario('room-a-relamp-or-replace.scenario.json');
  const published = computeScenario(scenario);

  it('says the figures reproduce when the recomputation matches figure for figure', () => {
    const html = renderToStaticMarkup(<ReproduceNotice report={compareResults(published, computeScenario(scenario))} hashMatches />);
    expect(text(html)).toContain('These figures reproduce');
    expect(text(html)).toContain(`engine ${ENGINE_VERSION}`);
  });

  it('names each figure that differs and both engine versions when they do not', () => {
    const first = published.options[0]!;
    const older: ScenarioResult = { ...published, engineVersion: '0.9.0', options: [{ ...first, totalPresentValue: '1.00' }, ...published.options.slice(1)] };
    const html = text(renderToStaticMarkup(<ReproduceNotice report={compareResults(older, computeScenario(scenario))} hashMatches />));
    expect(html).toContain('1 figure differs from the published one');
    expect(html).toContain(`Published with engine 0.9.0; recomputed here with engine ${ENGINE_VERSION}`);
    expect(html).toContain('options[0].totalPresentValue');
    expect(html).toContain(first.totalPresentValue);
  });

  it('says so when the inputs do not hash to the stored SHA-256', () => {
    const html = text(renderToStaticMarkup(<ReproduceNotice report={compareResults(published, computeScenario(scenario))} hashMatches={false} />));
    expect(html).toContain('The figures match, but the inputs are not the ones stored');
    expect(html).toContain('do not hash to the SHA-256 stored with the snapshot');
  });
});
