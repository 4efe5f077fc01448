import type { ExpressAuthConfig } from '@auth/express';
import Credentials from '@auth/express/providers/credentials';
import Nodemailer from '@auth/express/providers/nodemailer';
import SequelizeAdapter from '@auth/sequelize-adapter';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import { z } from '../../src/contracts/zod-messages';
import { emailSchema, PASSWORD_MAX_LENGTH } from '../../src/contracts/api';
import { models } from '../db/models';
import type { Mailer } from '../mail/mailer';
import { recordAudit } from '../repos/audit';
import { findUserByEmail, findUserById } from '../repos/users';
import { verifyAgainstDecoy, verifyPassword } from './passwords';
import { currentIp } from './request-scope';
import { newClaims, SESSION_MAX_AGE_S } from './session-token';
import type { SessionSettings } from './session-token';

/** Minutes an e-mailed sign-in link stays valid. */
export const SIGN_IN_LINK_MINUTES = 60;

const credentialsInput = z.object({ email: emailSchema, password: z.string().min(1).max(PASSWORD_MAX_LENGTH) });

const adapters = new WeakMap<Sequelize, ReturnType<typeof SequelizeAdapter>>();

/** Auth.js's Sequelize adapter over our own `users` and `verification_tokens` tables (created by migration 0002). */
function adapterFor(sequelize: Sequelize): ReturnType<typeof SequelizeAdapter> {
  let adapter = adapters.get(sequelize);
  if (!adapter) {
    const m = models(sequelize);
    type AdapterModels = NonNullable<NonNullable<Parameters<typeof SequelizeAdapter>[1]>['models']>;
    adapter = SequelizeAdapter(sequelize, {
      synchronize: false,
      models: { User: m.AuthUser as unknown as AdapterModels['User'], VerificationToken: m.VerificationToken as unknown as AdapterModels['VerificationToken'] },
    });
    adapters.set(sequelize, adapter);
  }
  return adapter;
}

export interface AuthDeps {
  sequelize: Sequelize;
  log: Logger;
  mailer: Mailer;
  session: SessionSettings;
}

/**
 * Auth.js for Express, mounted at /auth: e-mail and password (Credentials) and e-mailed sign-in
 * links (Nodemailer), JWT sessions in an httpOnly SameSite=Lax cookie. A failed password sign-in
 * answers the same way whether or not the account exists; a link is only mailed to an existing,
 * enabled account, and the reply does not say which.
 */
export function authConfig({ sequelize, log, mailer, session }: AuthDeps): ExpressAuthConfig {
  const m = models(sequelize);
  return {
    secret: session.secret,
    trustHost: true,
    useSecureCookies: session.secureCookies,
    adapter: adapterFor(sequelize),
    session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
    pages: { signIn: '/sign-in', error: '/sign-in', verifyRequest: '/sign-in/check-mail' },
    providers: [
      Credentials({
        credentials: { email: {}, password: {} },
        async authorize(input) {
          const parsed = credentialsInput.safeParse({ email: input.email, password: input.password });
          if (!parsed.success) return null;
          const user = await findUserByEmail(m, parsed.data.email);
          const ok = user?.passwordHash && !user.disabledAt
            ? await verifyPassword(parsed.data.password, user.passwordHash)
            : await verifyAgainstDecoy(parsed.data.password);
          if (!ok || !user) {
            await recordAudit(m, { action: 'sign_in_failed', target: parsed.data.email, ip: currentIp(), details: { provider: 'credentials' } });
            return null;
          }
          return { id: user.id, email: user.email, name: user.name };
        },
      }),
      Nodemailer({
        server: mailer.smtpUrl,
        from: mailer.from,
        maxAge: SIGN_IN_LINK_MINUTES * 60,
        async sendVerificationRequest({ identifier, url }) {
          const user = await findUserByEmail(m, identifier);
          if (!user || user.disabledAt) return;
          await mailer.send({
            to: identifier,
            subject: 'Your Photon Parity sign-in link',
            text: [
              `Hello ${user.name},`,
              '',
              `Open this link to sign in to Photon Parity. It works once, within ${SIGN_IN_LINK_MINUTES} minutes:`,
              '',
              url,
              '',
              'If you did not ask for it, ignore this message; nobody can sign in without the link.',
            ].join('\n'),
          });
        },
      }),
    ],
    callbacks: {
      async signIn({ user, account, email }) {
        if (account?.provider !== 'nodemailer' || email?.verificationRequest) return true;
        // The link was opened: only an existing, enabled account may use it, so no account is made here.
        const row = user.email ? await findUserByEmail(m, user.email) : null;
        return Boolean(row && !row.disabledAt);
      },
      async jwt({ token, user }) {
        if (!user?.id) return token;
        const row = await findUserById(m, user.id);
        if (!row) return null;
        return { ...newClaims(row.id, row.sessionVersion), name: row.name, email: row.email };
      },
      session({ session, token }) {
        return { ...session, user: { ...session.user, id: String(token.sub ?? '') } };
      },
    },
    events: {
      async signIn({ user, account }) {
        await recordAudit(m, { action: 'sign_in', actorUserId: user.id ?? null, ip: currentIp(), details: { provider: account?.provider ?? 'unknown' } });
      },
      async signOut(message) {
        const sub = 'token' in message ? message.token?.sub : undefined;
        await recordAudit(m, { action: 'sign_out', actorUserId: sub ?? null, ip: currentIp() });
      },
    },
    logger: {
      error: (error) => log.warn({ authError: error.name, message: error.message }, 'sign-in refused or failed'),
      warn: (code) => log.warn({ code }, 'Auth.js warning'),
      debug: () => undefined,
    },
  };
}
