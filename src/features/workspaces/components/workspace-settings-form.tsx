import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { Resolver } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { errorMessage } from '../../../lib/api-client';
import type { WorkspaceScope } from '../../../lib/workspace-context';
import { updateWorkspaceRequestSchema, useUpdateWorkspace } from '../api/update-workspace';
import { SettingsFields } from './settings-fields';
import type { SettingsValues } from './settings-fields';

/** Name, currency and units of the workspace; owners change them, others read them. */
export function WorkspaceSettingsForm({ scope }: { scope: WorkspaceScope }) {
  const form = useForm<SettingsValues>({
    resolver: zodResolver(updateWorkspaceRequestSchema) as unknown as Resolver<SettingsValues>,
    defaultValues: { name: scope.name, currency: scope.currency, unitSystem: scope.unitSystem },
  });
  const update = useUpdateWorkspace();
  const submit = form.handleSubmit((v) => update.mutate({ wid: scope.workspaceId, changes: v }, { onSuccess: () => form.reset(v) }));
  return (
    <form noValidate onSubmit={submit} className="space-y-3">
      <SettingsFields form={form} disabled={!scope.canManage} />
      {update.isError ? <Notice tone="error">{errorMessage(update.error)}</Notice> : null}
      {update.isSuccess && !form.formState.isDirty ? <Notice tone="ok">Settings saved.</Notice> : null}
      {scope.canManage ? (
        <Button type="submit" tone="primary" busy={update.isPending} disabled={!form.formState.isDirty}>
          Save settings
        </Button>
      ) : (
        <p className="text-sm text-ink-soft">Only owners change these settings.</p>
      )}
    </form>
  );
}
