import { ExpressAuth } from '@auth/express';
import express, { Router } from 'express';
import { authConfig } from '../auth/auth-config';
import { requestScope } from '../auth/request-scope';
import type { ApiDeps } from './api-deps';

/**
 * Auth.js at /auth (sign-in, sign-out, e-mailed links, its own CSRF token at /auth/csrf). Sign-in
 * requests are parsed first so that the rate limits can count per account as well as per address.
 */
export function authRouter(deps: ApiDeps): Router {
  const router = Router();
  const limited = [express.urlencoded({ extended: false, limit: '16kb' }), express.json({ limit: '16kb' }), deps.limits.signInPerAddress, deps.limits.signInPerAccount];
  router.post('/callback/credentials', ...limited);
  router.post('/signin/nodemailer', ...limited);
  const auth = ExpressAuth(authConfig({ sequelize: deps.sequelize, log: deps.log, mailer: deps.mailer, session: deps.session }));
  router.use((req, res, next) => requestScope.run({ ip: req.ip }, () => auth(req, res, next)));
  return router;
}
