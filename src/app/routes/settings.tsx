import { Panel } from '../../components/ui/panel';
import { InvitationsPanel } from '../../features/workspaces/components/invitations-panel';
import { MembersTable } from '../../features/workspaces/components/members-table';
import { WorkspaceSettingsForm } from '../../features/workspaces/components/workspace-settings-form';
import { useMe } from '../../lib/auth';
import { useWorkspace } from '../../lib/workspace-context';

/** The workspace's settings, members and invitations. */
export default function Settings() {
  const scope = useWorkspace();
  const me = useMe();
  return (
    <div className="space-y-4">
      <Panel title="Settings">
        <WorkspaceSettingsForm key={scope.workspaceId} scope={scope} />
      </Panel>
      <Panel title="Members">
        <MembersTable scope={scope} currentUserId={me.data?.user?.id ?? ''} />
      </Panel>
      <Panel title="Invitations">
        <InvitationsPanel scope={scope} />
      </Panel>
    </div>
  );
}
