import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input, Textarea } from '../../../components/ui/input';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useSendSnapshot } from '../api/send-snapshot';
import { splitAddresses } from '../lib/expiry-choices';

/** E-mails a share link with a note to one or more addresses. */
export function SendLinkForm({ wid, id }: { wid: string; id: string }) {
  const send = useSendSnapshot();
  const [to, setTo] = useState('');
  const [note, setNote] = useState('');
  const fieldError = (path: string) => (isApiError(send.error) ? send.error.fields.find((f) => f.path.startsWith(path))?.message : undefined);
  const submit = () => send.mutate({ wid, id, body: { to: splitAddresses(to), note } }, { onSuccess: () => setTo('') });
  return (
    <form
      className="mt-2 grid gap-2 rounded-md border border-line bg-paper p-3"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <Field label="Send to" hint="One or more e-mail addresses, separated by commas or spaces; each person gets their own message." error={fieldError('to')}>
        <Input value={to} onChange={(e) => setTo(e.target.value)} autoComplete="off" />
      </Field>
      <Field label="Note" error={fieldError('note')}>
        <Textarea value={note} rows={3} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <div className="flex items-center gap-2">
        <Button type="submit" size="sm" tone="primary" busy={send.isPending}>Send the link</Button>
        {send.isSuccess ? <span role="status" className="text-sm text-ok-700">Sent to {send.data.sent.join(', ')}.</span> : null}
        {send.isError && !fieldError('to') && !fieldError('note') ? <span role="alert" className="text-sm text-danger-700">{errorMessage(send.error)}</span> : null}
      </div>
    </form>
  );
}
