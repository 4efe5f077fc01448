import type { CaughtMail } from '../../../contracts/api/admin';
import { formatDateTime } from '../../../lib/format';
import { TextWithLinks } from './text-with-links';

/** One caught message in full: who sent it to whom and when, and its text with working links. */
export function CaughtMessage({ message }: { message: CaughtMail }) {
  return (
    <article aria-labelledby={`caught-${message.id}`} className="rounded-lg border border-line bg-panel p-4">
      <h2 id={`caught-${message.id}`} className="text-lg font-semibold">{message.subject || '(no subject)'}</h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-ink-soft">From</dt>
        <dd className="break-all">{message.from}</dd>
        <dt className="text-ink-soft">To</dt>
        <dd className="break-all">{message.to.join(', ')}</dd>
        <dt className="text-ink-soft">Received</dt>
        <dd>{formatDateTime(message.receivedAt)}</dd>
      </dl>
      <div className="mt-3 border-t border-line pt-3">
        <TextWithLinks text={message.text} />
      </div>
    </article>
  );
}
