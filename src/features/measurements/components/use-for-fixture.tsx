import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import type { Fixture } from '../../../contracts/api/fixtures';
import type { Measurement } from '../../../contracts/api/measurements';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Select } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { photonEfficacyOf } from '../../../engine/entry-conversions';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { formatNumber } from '../../../lib/format';
import { useApplyMeasurement } from '../api/apply-measurement';
import { useFixtureChoices } from '../api/get-fixture-choices';

function WhatChanges({ m, f }: { m: Measurement; f: Fixture | undefined }) {
  if (m.grid) {
    const now = f ? photonEfficacyOf(f) : null;
    return (
      <p className="text-sm">
        Sets the fixture's photon efficacy to <strong className="figure">{formatNumber(m.grid.efficacyAtCanopy ?? 0, 2)} µmol/J</strong>, the efficacy at the canopy
        {now === null ? '' : <> (now <span className="figure">{formatNumber(now, 2)} µmol/J</span>, {f?.dataSource})</>}. Canopy efficacy includes what is lost to walls and
        outside the grid's area, so it is usually below the datasheet's figure: the comparison then levels the fixture on the light this room really gets.
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

/** Sets a library fixture's efficacy (from a grid) or spectrum summary (from a spectrum) from this measurement, marking it measured. */
export function UseForFixture({ workspaceId, measurement: m }: { workspaceId: string; measurement: Measurement }) {
  const fixtures = useFixtureChoices(workspaceId);
  const apply = useApplyMeasurement();
  const [fixtureId, setFixtureId] = useState(m.fixture?.id ?? '');
  const chosen = fixtures.data?.fixtures.find((f) => f.id === fixtureId);
  const blocked = m.grid !== null && m.grid.efficacyAtCanopy === undefined;
  if (blocked) {
    return <Notice tone="info">This grid was uploaded without the area and the wall watts, so it has no efficacy at the canopy to give a fixture. Upload it again with both to use it.</Notice>;
  }
  return (
    <div className="space-y-2">
      <Field label="Library fixture" className="max-w-md" error={apply.error instanceof ApiError ? apply.error.fields.map((p) => `${p.path}: ${p.message}`).join('; ') || undefined : undefined}>
        <Select value={fixtureId} onChange={(e) => { setFixtureId(e.target.value); apply.reset(); }}>
          <option value="">choose a fixture</option>
          {(fixtures.data?.fixtures ?? []).map((f) => <option key={f.id} value={f.id}>{f.label}</option>)}
        </Select>
      </Field>
      {fixtureId && !apply.isSuccess ? <WhatChanges m={m} f={chosen} /> : null}
      <Button tone="primary" disabled={!fixtureId} busy={apply.isPending} onClick={() => apply.mutate({ wid: workspaceId, mid: m.id, fixtureId })}>
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
