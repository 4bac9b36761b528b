import { createHash, randomBytes } from "node:crypto";
import { and, desc, eq, isNotNull, isNull } from "drizzle-orm";
import { INVITATION_LIFETIME_DAYS, type Invitation, type InviteStaffValues } from "../contracts/invitations";
import type { Db } from "../db/client";
import { departments, staff, staffInvitations } from "../db/schema";
import { recordAudit } from "../audit/audit.repository";
import { AppError, notFound } from "../http/app-error";
import type { Mailer } from "../mail/mailer";
import { actorWith, type Actor } from "../staff/staff.repository";
import { isUniqueViolation } from "../classes/classes.repository";
import { closedReason, listOpenInvitations, type InvitationRow } from "./invitations.repository";
import { invitationMail } from "./invitations.mail";

export interface InvitationDeps {
  db: Db;
  mailer: Pick<Mailer, "send">;
  /** No trailing slash. */
  publicUrl: string;
  log: (message: string, error?: unknown) => void;
  now?: () => Date;
}

const DAY_MS = 24 * 60 * 60 * 1000;

/** The database keeps only this hash of a link's token. */
export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

function newToken() {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export const invitationLink = (publicUrl: string, token: string) => `${publicUrl}/auth/invitation/${token}`;

const pendingAlready = () =>
  new AppError("invitation_pending", "There is already an invitation waiting for this address.", {
    email: ["This address already has an invitation waiting: resend or cancel that one below."],
  });

async function invitationOrThrow(db: Db, schoolId: string, id: string, now: Date): Promise<Invitation> {
  const found = (await listOpenInvitations(db, schoolId, now)).find((i) => i.id === id);
  if (!found) throw notFound("That invitation");
  return found;
}

/** Sends (or sends again) the invitation message; records when the mail server took it. */
async function sendInvitation(deps: InvitationDeps, actor: Actor, row: InvitationRow, token: string): Promise<void> {
  const [department] = row.departmentId
    ? await deps.db.select({ name: departments.name }).from(departments).where(eq(departments.id, row.departmentId))
    : [];
  const mail = invitationMail({
    to: row.email,
    displayName: row.displayName,
    schoolName: actor.schoolName,
    departmentName: department?.name ?? null,
    role: row.role,
    invitedBy: actor.displayName,
    link: invitationLink(deps.publicUrl, token),
    expiresAt: row.expiresAt,
    timeZone: actor.schoolTimeZone,
  });
  try {
    await deps.mailer.send(mail);
  } catch (error) {
    deps.log("[invitations] the mail server did not take an invitation", error);
    throw new AppError(
      "mail_not_sent",
      "The invitation is saved, but the e-mail could not be sent. Check the mail settings, then use “Resend”.",
    );
  }
  await deps.db.update(staffInvitations).set({ lastSentAt: new Date() }).where(eq(staffInvitations.id, row.id));
}

export async function inviteStaff(deps: InvitationDeps, actor: Actor, input: InviteStaffValues): Promise<Invitation> {
  const now = deps.now?.() ?? new Date();
  const { token, tokenHash } = newToken();
  let row: InvitationRow;
  try {
    row = await deps.db.transaction(async (tx) => {
      if (input.departmentId) {
        const [department] = await tx
          .select({ id: departments.id })
          .from(departments)
          .where(and(eq(departments.id, input.departmentId), eq(departments.schoolId, actor.schoolId)));
        if (!department) {
          throw new AppError("validation_failed", "Some of the details need correcting.", {
            departmentId: ["Choose a department from the list."],
          });
        }
      }
      // An address belongs to one account: current staff here or anywhere, or removed staff elsewhere.
      const [existing] = await tx
        .select({ schoolId: staff.schoolId, removedAt: staff.removedAt })
        .from(staff)
        .where(eq(staff.email, input.email));
      if (existing && (!existing.removedAt || existing.schoolId !== actor.schoolId)) {
        const message =
          existing.schoolId === actor.schoolId
            ? "This address is already on your staff list: change their role there."
            : "This address already has a Linkleap account with another school.";
        throw new AppError("already_staff", message, { email: [message] });
      }
      const [inserted] = await tx
        .insert(staffInvitations)
        .values({
          schoolId: actor.schoolId,
          departmentId: input.departmentId,
          email: input.email,
          displayName: input.displayName,
          role: input.role,
          tokenHash,
          invitedByStaffId: actor.id,
          expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_DAYS * DAY_MS),
        })
        .returning();
      await recordAudit(tx, {
        schoolId: actor.schoolId,
        actorStaffId: actor.id,
        action: "staff.invited",
        subjectType: "invitation",
        subjectId: inserted!.id,
        detail: { email: input.email, role: input.role, departmentId: input.departmentId },
      });
      return inserted!;
    });
  } catch (error) {
    if (isUniqueViolation(error, "staff_invitations_open_email_key")) throw pendingAlready();
    throw error;
  }
  await sendInvitation(deps, actor, row, token);
  return invitationOrThrow(deps.db, actor.schoolId, row.id, now);
}

/** A fresh link and a fresh expiry date; the old link stops working at once. */
export async function resendInvitation(deps: InvitationDeps, actor: Actor, invitationId: string): Promise<Invitation> {
  const now = deps.now?.() ?? new Date();
  const { token, tokenHash } = newToken();
  const row = await deps.db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(staffInvitations)
      .where(and(eq(staffInvitations.id, invitationId), eq(staffInvitations.schoolId, actor.schoolId)))
      .for("update");
    if (!current) throw notFound("That invitation");
    const reason = closedReason(current, now);
    if (reason === "used" || reason === "cancelled") throw closedError(reason);
    const [updated] = await tx
      .update(staffInvitations)
      .set({ tokenHash, expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_DAYS * DAY_MS) })
      .where(eq(staffInvitations.id, invitationId))
      .returning();
    await recordAudit(tx, {
      schoolId: actor.schoolId,
      actorStaffId: actor.id,
      action: "staff.invitation_resent",
      subjectType: "invitation",
      subjectId: invitationId,
      detail: { email: current.email },
    });
    return updated!;
  });
  await sendInvitation(deps, actor, row, token);
  return invitationOrThrow(deps.db, actor.schoolId, row.id, now);
}

export async function cancelInvitation(db: Db, actor: Actor, invitationId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(staffInvitations)
      .where(and(eq(staffInvitations.id, invitationId), eq(staffInvitations.schoolId, actor.schoolId)))
      .for("update");
    if (!current) throw notFound("That invitation");
    if (current.acceptedAt) throw closedError("used");
    if (current.cancelledAt) return;
    await tx.update(staffInvitations).set({ cancelledAt: new Date() }).where(eq(staffInvitations.id, invitationId));
    await recordAudit(tx, {
      schoolId: actor.schoolId,
      actorStaffId: actor.id,
      action: "staff.invitation_cancelled",
      subjectType: "invitation",
      subjectId: invitationId,
      detail: { email: current.email },
    });
  });
}

function closedError(reason: "used" | "cancelled") {
  return new AppError(
    "invitation_closed",
    reason === "used" ? "This invitation has already been accepted." : "This invitation was cancelled.",
  );
}

/** The invitation a link's token names, and whether it can still be used. */
export async function invitationForToken(db: Db, token: string, now = new Date()) {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return { row: undefined, closed: "unknown" as const };
  const [row] = await db.select().from(staffInvitations).where(eq(staffInvitations.tokenHash, hashToken(token)));
  if (!row) return { row: undefined, closed: "unknown" as const };
  return { row, closed: closedReason(row, now) };
}

export type InvitationRefusal =
  | { kind: "not_invited"; email: string }
  | { kind: "invitation_closed"; reason: "used" | "cancelled" | "expired" | "unknown" }
  | { kind: "invitation_other_account"; email: string };

/**
 * Sign-in of someone who is not (or no longer) on the staff list: their open invitation, if
 * there is one for the verified address, makes them staff with its department and role. The
 * invitation from the link they followed is used when there is one; otherwise the newest open
 * one for the address. Single use: the invitation is marked accepted in the same transaction.
 */
export async function acceptInvitationOnSignIn(
  db: Db,
  identity: { subject: string; email: string },
  invitationId: string | undefined,
  now = new Date(),
): Promise<{ actor: Actor } | { refusal: InvitationRefusal }> {
  const email = identity.email.toLowerCase();
  return db.transaction(async (tx) => {
    let invitation: InvitationRow | undefined;
    if (invitationId) {
      [invitation] = await tx.select().from(staffInvitations).where(eq(staffInvitations.id, invitationId)).for("update");
      if (!invitation) return { refusal: { kind: "invitation_closed", reason: "unknown" } };
      const reason = closedReason(invitation, now);
      if (reason) return { refusal: { kind: "invitation_closed", reason } };
      if (invitation.email !== email) return { refusal: { kind: "invitation_other_account", email: identity.email } };
    } else {
      [invitation] = await tx
        .select()
        .from(staffInvitations)
        .where(and(eq(staffInvitations.email, email), isNull(staffInvitations.acceptedAt), isNull(staffInvitations.cancelledAt)))
        .orderBy(desc(staffInvitations.createdAt))
        .limit(1)
        .for("update");
      if (!invitation) return { refusal: { kind: "not_invited", email: identity.email } };
      if (closedReason(invitation, now)) return { refusal: { kind: "invitation_closed", reason: "expired" } };
    }

    const [existing] = await tx.select().from(staff).where(eq(staff.email, email)).for("update");
    // An address belongs to one school; a current row here means another identity already holds it.
    if (existing && (existing.schoolId !== invitation.schoolId || !existing.removedAt)) {
      return { refusal: { kind: "not_invited", email: identity.email } };
    }
    // A removed account may still hold this identity's subject id; the new or restored row takes it.
    await tx
      .update(staff)
      .set({ oauthSubject: null })
      .where(and(eq(staff.oauthSubject, identity.subject), isNotNull(staff.removedAt)));
    const placement = {
      schoolId: invitation.schoolId,
      departmentId: invitation.departmentId,
      role: invitation.role,
      displayName: invitation.displayName,
      oauthSubject: identity.subject,
      lastSignInAt: now,
    };
    let staffId: string;
    if (existing) {
      await tx
        .update(staff)
        .set({ ...placement, removedAt: null })
        .where(eq(staff.id, existing.id));
      staffId = existing.id;
    } else {
      const [inserted] = await tx.insert(staff).values({ ...placement, email }).returning({ id: staff.id });
      staffId = inserted!.id;
    }
    await tx
      .update(staffInvitations)
      .set({ acceptedAt: now, acceptedStaffId: staffId })
      .where(eq(staffInvitations.id, invitation.id));
    await recordAudit(tx, {
      schoolId: invitation.schoolId,
      actorStaffId: staffId,
      action: "staff.invitation_accepted",
      subjectType: "invitation",
      subjectId: invitation.id,
      detail: { email, role: invitation.role, departmentId: invitation.departmentId, restored: Boolean(existing) },
    });
    const actor = await actorWith(tx, staffId);
    if (!actor) throw new Error("accepted invitation left no staff row");
    return { actor };
  });
}

/** The school's departments, for the invitation form. */
export function listDepartments(db: Db, schoolId: string) {
  return db
    .select({ id: departments.id, name: departments.name })
    .from(departments)
    .where(eq(departments.schoolId, schoolId))
    .orderBy(departments.name);
}
