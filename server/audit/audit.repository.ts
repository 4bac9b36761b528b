import type { Db } from "../db/client";
import { auditEvents } from "../db/schema";

export interface AuditEntry {
  schoolId: string;
  actorStaffId: string | null;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  detail?: Record<string, unknown>;
}

/** Records a change a school may need to account for later. Write it in the same transaction as the change. */
export async function recordAudit(db: Pick<Db, "insert">, entry: AuditEntry): Promise<void> {
  await db.insert(auditEvents).values({ ...entry, subjectId: entry.subjectId ?? null, detail: entry.detail ?? {} });
}
