import { Link, useSearchParams } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { isApiError } from '../../../lib/api-client';
import { cn } from '../../../lib/cn';
import { formatDateTime } from '../../../lib/format';
import { useCaughtMail } from '../api/get-caught-mail';
import { OnlySiteAdmins } from './admin-access';
import { CaughtMessage } from './caught-message';

function AboutCaughtMail() {
  return (
    <Notice tone="caution" title="Nothing on this page was delivered" className="mb-4">
      <p>
        These are the messages the local fake mail server caught. It accepts every message and sends none on, and it
        runs only when <code>SMTP_URL</code> is not set: with <code>SMTP_URL</code> set, mail goes out through that
        server and this list shows only what was caught before.
      </p>
      <p className="mt-1">Opening a sign-in link from here signs this browser in as the person it was meant for.</p>
    </Notice>
  );
}

/** The caught messages, newest first, and the one chosen (`?message=<id>`) in full. */
export function CaughtMailSection() {
  const mail = useCaughtMail();
  const [search] = useSearchParams();
  const chosenId = Number(search.get('message'));
  if (mail.isPending) return <><AboutCaughtMail /><LoadingState what="Loading the caught mail" /></>;
  if (mail.isError) {
    if (isApiError(mail.error) && mail.error.status === 403) return <OnlySiteAdmins />;
    const missing = isApiError(mail.error, 'not_found');
    return <ErrorState title={missing ? 'There is no caught mail on this installation' : undefined} error={mail.error} retry={missing ? undefined : () => void mail.refetch()} />;
  }
  const messages = mail.data.messages;
  const chosen = messages.find((m) => m.id === chosenId);
  return (
    <>
      <AboutCaughtMail />
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-soft">{messages.length === 1 ? '1 message' : `${messages.length} messages`} (the newest 200 at most)</p>
        <Button size="sm" busy={mail.isFetching} onClick={() => void mail.refetch()}>Check for new mail</Button>
      </div>
      {messages.length === 0 ? (
        <EmptyState title="No mail caught yet">Ask for a sign-in link or send an invitation, and the message shows up here.</EmptyState>
      ) : (
        <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
          <div className="overflow-x-auto rounded-lg border border-line bg-panel">
            <table className="w-full border-collapse text-sm" aria-label="Caught messages">
              <thead>
                <tr className="border-b border-line-strong text-left text-ink-soft">
                  <th scope="col" className="px-3 py-1.5 font-medium">Received</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">To</th>
                  <th scope="col" className="px-3 py-1.5 font-medium">Subject</th>
                </tr>
              </thead>
              <tbody>
                {messages.map((m) => (
                  <tr key={m.id} className={cn('border-b border-line align-top', m.id === chosen?.id && 'bg-spruce-50')}>
                    <td className="whitespace-nowrap px-3 py-1.5 text-ink-soft">{formatDateTime(m.receivedAt)}</td>
                    <td className="break-all px-3 py-1.5">{m.to.join(', ')}</td>
                    <td className="px-3 py-1.5">
                      <Link
                        to={{ search: `?message=${m.id}` }}
                        aria-current={m.id === chosen?.id ? 'true' : undefined}
                        className="text-spruce-700 underline underline-offset-2"
                      >
                        {m.subject || '(no subject)'}
                      </Link>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {chosen ? (
            <CaughtMessage message={chosen} />
          ) : (
            <EmptyState title="No message open">Choose a subject in the list to read the message.</EmptyState>
          )}
        </div>
      )}
    </>
  );
}
