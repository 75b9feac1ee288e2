import type { Database } from '../db/client';
import { auditLog } from '../db/schema';

export type AuditEvent =
  | 'sign_up'
  | 'sign_in'
  | 'sign_in_failed'
  | 'sign_in_rate_limited'
  | 'sign_out'
  | 'password_changed'
  | 'member_added'
  | 'role_changed'
  | 'member_removed'
  | 'invitation_sent'
  | 'invitation_resent'
  | 'invitation_revoked'
  | 'invitation_accepted'
  | 'password_reset_requested'
  | 'password_reset';

/** Security-relevant events go to the audit log; failures here must not break the request. */
export async function audit(
  db: Database,
  event: AuditEvent,
  who: { userId?: string | null; workspaceId?: string | null; ip?: string | null },
  detail: Record<string, unknown> = {},
) {
  await db.insert(auditLog).values({
    at: new Date(),
    event,
    userId: who.userId ?? null,
    workspaceId: who.workspaceId ?? null,
    ip: who.ip ?? null,
    detail,
  });
}
