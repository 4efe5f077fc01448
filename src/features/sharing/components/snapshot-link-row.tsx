import { useState } from 'react';
import { paths } from '../../../app/paths';
import type { SnapshotSummary } from '../../../contracts/api/snapshots';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/input';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useRevokeSnapshot, useSetSnapshotExpiry } from '../api/update-snapshot-link';
import { EXPIRY_CHOICES, expiryFor } from '../lib/expiry-choices';
import type { ExpiryChoice } from '../lib/expiry-choices';
import { SendLinkForm } from './send-link-form';

const STATUS = { live: { tone: 'ok', text: 'open' }, revoked: { tone: 'danger', text: 'withdrawn' }, expired: { tone: 'neutral', text: 'expired' } } as const;

/** One share link: its address, state and expiry, with copy, e-mail and withdraw. */
export function SnapshotLinkRow({ wid, snapshot: s }: { wid: string; snapshot: SnapshotSummary }) {
  const revoke = useRevokeSnapshot();
  const expiry = useSetSnapshotExpiry();
  const [sending, setSending] = useState(false);
  const [copied, setCopied] = useState(false);
  const url = `${window.location.origin}${paths.sharedSnapshot.to(s.id)}`;
  const live = s.link.status === 'live';
  const status = STATUS[s.link.status];
  const copy = async () => {
    await navigator.clipboard?.writeText(url).catch(() => undefined);
    setCopied(true);
  };
  const withdraw = () => {
    if (window.confirm('Withdraw this link? Anyone opening it will be told it is no longer available. This cannot be undone.')) revoke.mutate({ wid, id: s.id });
  };
  return (
    <li className="border-b border-line py-2" data-snapshot={s.id}>
      <div className="flex flex-wrap items-center gap-2">
        <Badge tone={status.tone}>{status.text}</Badge>
        <a className="figure break-all text-sm text-spruce-700 underline" href={url} target="_blank" rel="noreferrer">{url}</a>
        {live ? <Button size="sm" tone="quiet" onClick={() => void copy()}>{copied ? 'Copied' : 'Copy link'}</Button> : null}
      </div>
      <p className="mt-0.5 text-xs text-ink-soft">
        Revision {s.scenarioRevision}, published {formatDateTime(s.createdAt)} by {s.createdBy.name}
        {s.link.expiresAt ? `; ${live ? 'works until' : 'expired'} ${formatDateTime(s.link.expiresAt)}` : ''}
        {s.link.revokedAt ? `; withdrawn ${formatDateTime(s.link.revokedAt)}` : ''}.
      </p>
      {live ? (
        <div className="mt-1 flex flex-wrap items-center gap-2">
          <label className="flex items-center gap-1 text-sm">
            <span className="text-ink-soft">Link works</span>
            <Select
              aria-label="Change how long the link works"
              className="w-auto"
              defaultValue=""
              disabled={expiry.isPending}
              onChange={(e) => e.target.value && expiry.mutate({ wid, id: s.id, expiresAt: expiryFor(e.target.value as ExpiryChoice) })}
            >
              <option value="" disabled>{s.link.expiresAt ? 'change expiry…' : 'until withdrawn'}</option>
              {EXPIRY_CHOICES.map((c) => <option key={c.value} value={c.value}>{c.label}{c.days ? ' from now' : ''}</option>)}
            </Select>
          </label>
          <Button size="sm" onClick={() => setSending((v) => !v)} aria-expanded={sending}>Send by e-mail</Button>
          <Button size="sm" tone="danger" busy={revoke.isPending} onClick={withdraw}>Withdraw link</Button>
        </div>
      ) : null}
      {revoke.isError || expiry.isError ? <p role="alert" className="text-sm text-danger-700">{errorMessage(revoke.error ?? expiry.error)}</p> : null}
      {sending && live ? <SendLinkForm wid={wid} id={s.id} /> : null}
    </li>
  );
}
