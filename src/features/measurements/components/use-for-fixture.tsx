import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import type { Fixture } from '../../../contracts/api/fixtures';
import type { Measurement } from '../../../contracts/api/measurements';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { fixtureEfficacyFromCanopy } from '../../../engine';
import { photonEfficacyOf } from '../../../engine/entry-conversions';
import { as } from '../../../engine/units';
import type { Fraction, MicromolePerJoule } from '../../../engine/units';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { formatNumber } from '../../../lib/format';
import { useApplyMeasurement } from '../api/apply-measurement';
import { useFixtureChoices } from '../api/get-fixture-choices';

/** The share typed, when it is a number in (0, 1]; else null. */
function shareOf(text: string): number | null {
  const n = Number(text.trim());
  return text.trim() !== '' && n > 0 && n <= 1 ? n : null;
}

function WhatChanges({ m, f, share }: { m: Measurement; f: Fixture | undefined; share: number | null }) {
  if (m.grid) {
    const now = f ? photonEfficacyOf(f) : null;
    const atCanopy = m.grid.efficacyAtCanopy ?? 0;
    const set = share === null ? null : fixtureEfficacyFromCanopy(as<MicromolePerJoule>(atCanopy), as<Fraction>(share));
    return (
      <p className="text-sm">
        The grid gives <span className="figure">{formatNumber(atCanopy, 2)} µmol/J</span> at the canopy: photons on the measured area per joule at the wall. Divided by the share
        above, that sets the fixture's photon efficacy to <strong className="figure">{set === null ? '—' : `${formatNumber(set, 2)} µmol/J`}</strong>
        {now === null ? '' : <> (now <span className="figure">{formatNumber(now, 2)} µmol/J</span>, {f?.dataSource})</>}. Scenarios then apply their own utilization to it, so
        light that missed the measured area is not counted as lost twice.
      </p>
    );
  }
  const s = m.spectrum!;
  return (
    <p className="text-sm">
      Sets the fixture's spectrum summary to blue <span className="figure">{formatNumber(s.sharesPct.blue, 1)} %</span>, green <span className="figure">{formatNumber(s.sharesPct.green, 1)} %</span>, red{' '}
      <span className="figure">{formatNumber(s.sharesPct.red, 1)} %</span>, far-red <span className="figure">{formatNumber(s.sharesPct.farRed, 1)} %</span>
      {s.cctK === null ? '' : <>, CCT <span className="figure">{formatNumber(s.cctK, 0)} K</span></>}. Its efficacy stays as it is.
    </p>
  );
}

function fieldErrors(error: unknown, keep: (path: string) => boolean): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  return error.fields.filter((p) => keep(p.path)).map((p) => `${p.path}: ${p.message}`).join('; ') || undefined;
}

/** Sets a library fixture's efficacy (from a grid) or spectrum summary (from a spectrum) from this measurement, marking it measured. */
export function UseForFixture({ workspaceId, measurement: m }: { workspaceId: string; measurement: Measurement }) {
  const fixtures = useFixtureChoices(workspaceId);
  const apply = useApplyMeasurement();
  const [fixtureId, setFixtureId] = useState(m.fixture?.id ?? '');
  const [shareText, setShareText] = useState('1');
  const share = shareOf(shareText);
  const chosen = fixtures.data?.fixtures.find((f) => f.id === fixtureId);
  const blocked = m.grid !== null && m.grid.efficacyAtCanopy === undefined;
  if (blocked) {
    return <Notice tone="info">This grid was uploaded without the area and the wall watts, so it has no efficacy at the canopy to give a fixture. Upload it again with both to use it.</Notice>;
  }
  return (
    <div className="space-y-2">
      <Field label="Library fixture" className="max-w-md" error={fieldErrors(apply.error, (path) => path !== 'shareOnArea')}>
        <Select value={fixtureId} onChange={(e) => { setFixtureId(e.target.value); apply.reset(); }}>
          <option value="">choose a fixture</option>
          {(fixtures.data?.fixtures ?? []).map((f) => <option key={f.id} value={f.id}>{f.label}</option>)}
        </Select>
      </Field>
      {m.grid ? (
        <Field
          label="Share of the fixture's photons that landed on the measured area"
          className="max-w-md"
          hint="1 when the grid covered all the light (a closed tent with reflective walls); less in an open room, e.g. 0.85."
          error={share === null ? 'must be a number greater than 0 and at most 1' : fieldErrors(apply.error, (path) => path === 'shareOnArea')}
        >
          <Input inputMode="decimal" value={shareText} onChange={(e) => { setShareText(e.target.value); apply.reset(); }} />
        </Field>
      ) : null}
      {fixtureId && !apply.isSuccess ? <WhatChanges m={m} f={chosen} share={share} /> : null}
      <Button
        tone="primary"
        disabled={!fixtureId || (m.grid !== null && share === null)}
        busy={apply.isPending}
        onClick={() => apply.mutate({ wid: workspaceId, mid: m.id, fixtureId, ...(m.grid && share !== null ? { shareOnArea: share } : {}) })}
      >
        {m.grid ? 'Set the fixture’s efficacy from this grid' : 'Set the fixture’s spectrum from this file'}
      </Button>
      {apply.isSuccess ? (
        <Notice tone="ok">
          {apply.data.fixture.label} now carries measured figures from this file. <Link className="underline" to={paths.fixtures.to(workspaceId)}>Open the fixture library</Link>
        </Notice>
      ) : null}
      {apply.isError ? <Notice tone="error" title="The fixture was not changed">{errorMessage(apply.error)}</Notice> : null}
    </div>
  );
}
