import type { RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { readSession } from '../auth/session-token';
import type { SessionSettings } from '../auth/session-token';
import { models } from '../db/models';
import { findUserById } from '../repos/users';
import { setCaller } from './context';

/**
 * Finds the caller from the session cookie. A session whose account is gone, disabled, or whose
 * session version is older than the account's (after a password change) counts as nobody.
 */
export function identify(sequelize: Sequelize, settings: SessionSettings): RequestHandler {
  const m = models(sequelize);
  return async (req, _res, next) => {
    const claims = await readSession(req.headers.cookie, settings);
    const user = claims ? await findUserById(m, claims.sub) : null;
    const valid = claims && user && !user.disabledAt && user.sessionVersion === claims.ver;
    setCaller(req, valid ? { user, session: claims } : null);
    next();
  };
}
