import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { Resolver } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { createWorkspaceRequestSchema, useCreateWorkspace } from '../api/create-workspace';
import { SettingsFields } from './settings-fields';
import type { SettingsValues } from './settings-fields';

/** Creates a workspace; the creator becomes its owner. */
export function CreateWorkspaceForm({ onCreated }: { onCreated: (workspaceId: string) => void }) {
  const form = useForm<SettingsValues>({
    resolver: zodResolver(createWorkspaceRequestSchema) as unknown as Resolver<SettingsValues>,
    defaultValues: { name: '', currency: 'EUR', unitSystem: 'si' },
  });
  const create = useCreateWorkspace();
  const submit = form.handleSubmit((v) =>
    create.mutate(v, {
      onSuccess: (r) => onCreated(r.workspace.id),
      onError: (e) => {
        if (e instanceof ApiError) for (const f of e.fields) if (f.path === 'name' || f.path === 'currency') form.setError(f.path, { message: f.message });
      },
    }),
  );
  return (
    <form noValidate onSubmit={submit} className="space-y-3">
      <SettingsFields form={form} />
      {create.isError ? <Notice tone="error">{errorMessage(create.error)}</Notice> : null}
      <Button type="submit" tone="primary" busy={create.isPending}>
        Create the workspace
      </Button>
    </form>
  );
}
