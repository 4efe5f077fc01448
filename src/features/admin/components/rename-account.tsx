import { useState } from 'react';
import type { AdminUser } from '../../../contracts/api/admin';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input } from '../../../components/ui/input';

/** A small form for an account's shown name; the server checks the name and its refusal shows under the field. */
export function RenameAccount({ user, busy, error, onSave, onCancel }: { user: AdminUser; busy: boolean; error: string | undefined; onSave: (name: string) => void; onCancel: () => void }) {
  const [name, setName] = useState(user.name);
  return (
    <form
      className="flex min-w-56 flex-col gap-1.5"
      onSubmit={(e) => {
        e.preventDefault();
        onSave(name);
      }}
    >
      <Field label={`New name for ${user.email}`} error={error}>
        <Input value={name} onChange={(e) => setName(e.target.value)} autoFocus />
      </Field>
      <div className="flex gap-1.5">
        <Button type="submit" size="sm" tone="primary" busy={busy}>Save name</Button>
        <Button size="sm" tone="quiet" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
