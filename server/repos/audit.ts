import type { Transaction } from 'sequelize';
import type { Models } from '../db/models';

/** A security-relevant event: sign-ins, account changes, role and membership changes, invitations. */
export interface AuditEvent {
  action: string;
  actorUserId?: string | null;
  workspaceId?: string | null;
  target?: string | null;
  ip?: string | null;
  details?: Record<string, unknown>;
}

/** Appends one event to the audit log. */
export async function recordAudit(m: Models, e: AuditEvent, transaction?: Transaction): Promise<void> {
  await m.Audit.create(
    {
      at: new Date(),
      action: e.action,
      actorUserId: e.actorUserId ?? null,
      workspaceId: e.workspaceId ?? null,
      target: e.target ?? null,
      ip: e.ip ?? null,
      details: JSON.stringify(e.details ?? {}),
    },
    { transaction },
  );
}

/** The newest events first, for tests and for a future admin page. */
export async function listAudit(m: Models, limit = 200): Promise<Array<Omit<AuditEvent, 'details'> & { at: string; details: Record<string, unknown> }>> {
  const rows = await m.Audit.findAll({ order: [['id', 'DESC']], limit });
  return rows.map((r) => {
    const a = r.get({ plain: true });
    return { action: a.action, actorUserId: a.actorUserId, workspaceId: a.workspaceId, target: a.target, ip: a.ip, at: a.at.toISOString(), details: JSON.parse(a.details) as Record<string, unknown> };
  });
}
