import { randomUUID } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '../../src/contracts/api/account';
import type { AdminUser } from '../../src/contracts/api/admin';
import { modelReader, readRow } from '../db/direct-read';
import type { Models } from '../db/models';
import type { UserRow } from '../db/models/users';
import { contains } from './like';

/** The signed-in person as the API shows them. */
export function sessionUser(u: UserRow): SessionUser {
  return { id: u.id, email: u.email, name: u.name, isSiteAdmin: u.isSiteAdmin };
}

export async function findUserById(m: Models, id: string, transaction?: Transaction): Promise<UserRow | null> {
  if (!transaction) {
    // Every signed-in request reads its caller: plain SQL (see server/db/direct-read.ts).
    const users = modelReader(m.User, 'u');
    const raw = await readRow<Record<string, unknown>>(m.sequelize, `SELECT ${users.columns} FROM users u WHERE u.id = ?`, [id]);
    return raw ? users.toRow(raw) : null;
  }
  const row = await m.User.findByPk(id, { transaction });
  return row ? row.get({ plain: true }) : null;
}

/** Looks an account up by its (lower-cased) e-mail address. */
export async function findUserByEmail(m: Models, email: string, transaction?: Transaction): Promise<UserRow | null> {
  const row = await m.User.findOne({ where: { email: email.toLowerCase() }, transaction });
  return row ? row.get({ plain: true }) : null;
}

export interface NewUser {
  email: string;
  name: string;
  passwordHash: string | null;
  isSiteAdmin?: boolean;
}

export async function insertUser(m: Models, u: NewUser, transaction?: Transaction): Promise<UserRow> {
  const row = await m.User.create(
    { id: randomUUID(), email: u.email.toLowerCase(), name: u.name, passwordHash: u.passwordHash, isSiteAdmin: u.isSiteAdmin ?? false, sessionVersion: 1 },
    { transaction },
  );
  return row.get({ plain: true });
}

/** Stores a new password hash and ends every other session of the account by raising its session version. */
export async function setPassword(m: Models, id: string, passwordHash: string, transaction?: Transaction): Promise<UserRow> {
  await m.User.increment('sessionVersion', { where: { id }, transaction });
  await m.User.update({ passwordHash }, { where: { id }, transaction });
  const row = await findUserById(m, id, transaction);
  if (!row) throw new Error('user vanished while changing password');
  return row;
}

export interface UserChanges {
  name?: string;
  isSiteAdmin?: boolean;
  disabled?: boolean;
}

/** Applies an admin's changes; disabling ends the account's sessions. */
export async function updateUser(m: Models, id: string, c: UserChanges, transaction?: Transaction): Promise<void> {
  const patch: Partial<UserRow> = {};
  if (c.name !== undefined) patch.name = c.name;
  if (c.isSiteAdmin !== undefined) patch.isSiteAdmin = c.isSiteAdmin;
  if (c.disabled !== undefined) patch.disabledAt = c.disabled ? new Date() : null;
  if (Object.keys(patch).length) await m.User.update(patch, { where: { id }, transaction });
  if (c.disabled) await m.User.increment('sessionVersion', { where: { id }, transaction });
}

/** One page of accounts for site admins, matching `q` in e-mail or name. */
export async function listUsers(m: Models, q: string | undefined, page: number, pageSize: number): Promise<{ items: AdminUser[]; total: number }> {
  const where = q ? { [Op.or]: [contains(m.sequelize, 'email', q), contains(m.sequelize, 'name', q)] } : {};
  const { rows, count } = await m.User.findAndCountAll({ where, order: [['email', 'ASC']], limit: pageSize, offset: (page - 1) * pageSize });
  const users = rows.map((r) => r.get({ plain: true }));
  const counts = await workspaceCounts(m, users.map((u) => u.id));
  return { items: users.map((u) => adminUser(u, counts.get(u.id) ?? 0)), total: count };
}

export function adminUser(u: UserRow, workspaceCount: number): AdminUser {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    isSiteAdmin: u.isSiteAdmin,
    disabled: u.disabledAt !== null,
    workspaceCount,
    createdAt: u.createdAt.toISOString(),
  };
}

export async function workspaceCounts(m: Models, userIds: string[]): Promise<Map<string, number>> {
  if (userIds.length === 0) return new Map();
  const rows = await m.sequelize.query<{ user_id: string; n: number }>(
    'SELECT user_id, COUNT(*) AS n FROM memberships WHERE user_id IN (:ids) GROUP BY user_id',
    { replacements: { ids: userIds }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.user_id, Number(r.n)]));
}

/** Display names of users by id, in one query (missing ids are simply absent). */
export async function userNames(m: Models, ids: string[], transaction?: Transaction): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await m.sequelize.query<{ id: string; name: string }>('SELECT id, name FROM users WHERE id IN (:ids)', {
    replacements: { ids: [...new Set(ids)] },
    type: QueryTypes.SELECT,
    transaction,
  });
  return new Map(rows.map((r) => [r.id, r.name]));
}
