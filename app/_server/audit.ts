import { db } from '@/db';
import { auditEvents } from '@/db/schema';

export interface AuditEntry {
  teamId?: string | null;
  actorId?: string | null;
  /** An action from lib/auth/permissions.ts, or an event such as 'auth.signIn'. */
  action: string;
  subjectType?: string;
  subjectId?: string;
  details?: Record<string, unknown>;
}

/** Append one event to the audit trail. */
export async function recordAudit(entry: AuditEntry): Promise<void> {
  await db.insert(auditEvents).values({
    teamId: entry.teamId ?? null,
    actorId: entry.actorId ?? null,
    action: entry.action,
    subjectType: entry.subjectType ?? null,
    subjectId: entry.subjectId ?? null,
    details: entry.details ?? {},
  });
}
