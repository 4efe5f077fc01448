import type { UserRow } from '../../db/models/users';
import { hashPassword, verifyPassword } from '../../auth/passwords';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { setPassword } from '../../repos/users';

/**
 * Changes the password after checking the current one. The account's session version rises, so
 * every other session ends; the caller's route re-issues its own session cookie.
 */
export async function changePassword(m: Models, user: UserRow, currentPassword: string, newPassword: string, ip: string | null): Promise<UserRow> {
  const ok = user.passwordHash ? await verifyPassword(currentPassword, user.passwordHash) : false;
  if (!ok) throw new AppError('invalid_input', 'The current password is not right.', [{ path: 'currentPassword', message: 'is not right' }]);
  const hash = await hashPassword(newPassword);
  return m.sequelize.transaction(async (t) => {
    const updated = await setPassword(m, user.id, hash, t);
    await recordAudit(m, { action: 'password_changed', actorUserId: user.id, ip }, t);
    return updated;
  });
}
