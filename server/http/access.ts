import type { RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import type { Role } from '../../src/contracts/api/common';
import { models } from '../db/models';
import { findMembership } from '../repos/workspaces';
import { AppError } from './app-error';
import { requireCaller, setAccess } from './context';
import { idParam } from './validate';

const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

/** True when `role` is at least `needed`. */
export function roleAtLeast(role: Role, needed: Role): boolean {
  return RANK[role] >= RANK[needed];
}

/**
 * Guards every /api/workspaces/:wid route: 401 without a session; 404 when the caller is not a
 * member (so workspace ids do not leak, whatever the caller's site role); 403 when the role is
 * below `needed`.
 */
export function workspaceRole(sequelize: Sequelize, needed: Role): RequestHandler {
  const m = models(sequelize);
  return async (req, _res, next) => {
    const caller = requireCaller(req);
    const found = await findMembership(m, idParam(req, 'wid'), caller.user.id);
    if (!found) throw new AppError('not_found', 'There is no such workspace, or you are not a member of it.');
    if (!roleAtLeast(found.role, needed)) {
      throw new AppError('forbidden', `This needs the ${needed} role in the workspace; yours is ${found.role}.`);
    }
    setAccess(req, { workspace: found.workspace, role: found.role });
    next();
  };
}

/** Guards site-admin routes: 401 without a session, 403 for anyone but a site admin. */
export const siteAdminOnly: RequestHandler = (req, _res, next) => {
  const caller = requireCaller(req);
  if (!caller.user.isSiteAdmin) throw new AppError('forbidden', 'Only site admins may do this.');
  next();
};

/** Guards routes for any signed-in person. */
export const signedIn: RequestHandler = (req, _res, next) => {
  requireCaller(req);
  next();
};
