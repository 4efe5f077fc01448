import type { Request } from 'express';
import type { Role } from '../../src/contracts/api/common';
import type { UserRow } from '../db/models/users';
import type { WorkspaceRow } from '../db/models/workspaces';
import type { SessionClaims } from '../auth/session-token';
import { AppError } from './app-error';

/** Who is asking, as found from the session cookie. */
export interface Caller {
  user: UserRow;
  session: SessionClaims;
}

/** The workspace a request addresses and the caller's role in it. */
export interface WorkspaceAccess {
  workspace: WorkspaceRow;
  role: Role;
}

const callers = new WeakMap<Request, Caller | null>();
const access = new WeakMap<Request, WorkspaceAccess>();

export function setCaller(req: Request, caller: Caller | null): void {
  callers.set(req, caller);
}

/** The signed-in caller, or null. */
export function callerOf(req: Request): Caller | null {
  return callers.get(req) ?? null;
}

/** The signed-in caller; 401 when nobody is signed in. */
export function requireCaller(req: Request): Caller {
  const caller = callerOf(req);
  if (!caller) throw new AppError('unauthenticated', 'Sign in to use this.');
  return caller;
}

export function setAccess(req: Request, a: WorkspaceAccess): void {
  access.set(req, a);
}

/** The workspace checked by `workspaceRole` for this request. */
export function accessOf(req: Request): WorkspaceAccess {
  const a = access.get(req);
  if (!a) throw new Error('workspace access was not checked for this route');
  return a;
}

/** The client's address (Express honours `trust proxy`). */
export function clientIp(req: Request): string | null {
  return req.ip ?? null;
}
