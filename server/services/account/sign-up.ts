import type { SessionUser, SignUpRequest } from '../../../src/contracts/api/account';
import { hashPassword } from '../../auth/passwords';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { findUserByEmail, insertUser, sessionUser } from '../../repos/users';

/** Makes an account with a password. The new account then signs in through Auth.js. */
export async function signUp(m: Models, input: Required<SignUpRequest>, ip: string | null): Promise<SessionUser> {
  if (await findUserByEmail(m, input.email)) {
    throw new AppError('conflict', 'This e-mail address cannot be used for a new account. If it is yours, sign in or ask for a sign-in link.', [
      { path: 'email', message: 'cannot be used for a new account' },
    ]);
  }
  const passwordHash = await hashPassword(input.password);
  return m.sequelize.transaction(async (t) => {
    const user = await insertUser(m, { email: input.email, name: input.name, passwordHash }, t);
    await recordAudit(m, { action: 'sign_up', actorUserId: user.id, target: user.email, ip }, t);
    return sessionUser(user);
  });
}
