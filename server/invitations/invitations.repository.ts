import { and, desc, eq, isNull } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Invitation } from "../contracts/invitations";
import type { Db } from "../db/client";
import { departments, staff, staffInvitations } from "../db/schema";

export type InvitationRow = typeof staffInvitations.$inferSelect;
type Reader = Pick<Db, "select">;

const inviter = alias(staff, "inviter");

/** Open invitations of a school (neither used nor cancelled), newest first. */
export async function listOpenInvitations(db: Reader, schoolId: string, now: Date): Promise<Invitation[]> {
  const rows = await db
    .select({
      invitation: staffInvitations,
      departmentName: departments.name,
      invitedBy: inviter.displayName,
    })
    .from(staffInvitations)
    .leftJoin(departments, eq(departments.id, staffInvitations.departmentId))
    .leftJoin(inviter, eq(inviter.id, staffInvitations.invitedByStaffId))
    .where(and(eq(staffInvitations.schoolId, schoolId), isNull(staffInvitations.acceptedAt), isNull(staffInvitations.cancelledAt)))
    .orderBy(desc(staffInvitations.createdAt));
  return rows.map(({ invitation: i, departmentName, invitedBy }) => ({
    id: i.id,
    email: i.email,
    displayName: i.displayName,
    role: i.role,
    department: i.departmentId && departmentName ? { id: i.departmentId, name: departmentName } : null,
    invitedBy,
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
    lastSentAt: i.lastSentAt?.toISOString() ?? null,
    state: i.expiresAt.getTime() > now.getTime() ? "pending" : "expired",
  }));
}

/** Why an invitation can no longer be used, or null while it can. */
export function closedReason(row: InvitationRow, now: Date): "used" | "cancelled" | "expired" | null {
  if (row.acceptedAt) return "used";
  if (row.cancelledAt) return "cancelled";
  if (row.expiresAt.getTime() <= now.getTime()) return "expired";
  return null;
}
