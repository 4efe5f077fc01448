import { createContext, useContext } from 'react';
import type { Role, UnitSystem } from '../contracts/api/common';

/** The workspace a page works in and what the signed-in person may do there. */
export interface WorkspaceScope {
  workspaceId: string;
  name: string;
  role: Role;
  currency: string;
  unitSystem: UnitSystem;
  /** editors and owners change data; viewers only read */
  canEdit: boolean;
  /** owners manage members, invitations and settings */
  canManage: boolean;
}

const WorkspaceContext = createContext<WorkspaceScope | null>(null);

/** Provides the current workspace to the pages inside it. */
export const WorkspaceProvider = WorkspaceContext.Provider;

/** The current workspace; throws when used outside a workspace page (a programming error). */
export function useWorkspace(): WorkspaceScope {
  const scope = useContext(WorkspaceContext);
  if (!scope) throw new Error('useWorkspace is used outside a workspace page');
  return scope;
}
