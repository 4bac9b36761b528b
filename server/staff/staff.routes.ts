import { Router } from "express";
import { and, eq, isNull, sql } from "drizzle-orm";
import { updateStaffRoleInputSchema } from "../contracts/staff";
import type { Db } from "../db/client";
import { staff } from "../db/schema";
import { actorOf, requireRole } from "../auth/guards";
import { recordAudit } from "../audit/audit.repository";
import { AppError, notFound } from "../http/app-error";
import { parseId, parseInput } from "../http/validate";
import type { Realtime } from "../realtime/realtime";
import { findStaffMember, listStaff } from "./staff.repository";

/** Locks the school's admins and refuses if `staffId` is the only one left. */
async function keepOneAdmin(tx: Pick<Db, "select">, schoolId: string, message: string) {
  // Locked, so two changes at once cannot both pass the check.
  const admins = await tx
    .select({ id: staff.id })
    .from(staff)
    .where(and(eq(staff.schoolId, schoolId), eq(staff.role, "admin"), isNull(staff.removedAt)))
    .for("update");
  if (admins.length <= 1) throw new AppError("last_admin", message, { role: [message] });
}

/** School admins manage staff roles and remove access. */
export function staffRoutes(db: Db, realtime: Pick<Realtime, "staffChanged" | "endStaff">) {
  const router = Router();
  router.use("/api/staff", requireRole("admin"));

  router.get("/api/staff", async (req, res) => {
    res.json(await listStaff(db, actorOf(req).schoolId));
  });

  router.patch("/api/staff/:staffId", async (req, res) => {
    const actor = actorOf(req);
    const staffId = parseId(req.params.staffId, "That member of staff");
    const { role } = parseInput(updateStaffRoleInputSchema, req.body);

    await db.transaction(async (tx) => {
      const target = await findStaffMember(tx, actor.schoolId, staffId);
      if (!target) throw notFound("That member of staff");
      if (target.role === role) return;
      if (role === "head_of_department" && !target.departmentId) {
        throw new AppError("validation_failed", "A head of department needs a department.", {
          role: ["Put them in a department before making them head of it."],
        });
      }
      if (target.role === "admin") {
        await keepOneAdmin(tx, actor.schoolId, "The school needs at least one admin: make someone else admin first.");
      }
      await tx.update(staff).set({ role }).where(eq(staff.id, staffId));
      await recordAudit(tx, {
        schoolId: actor.schoolId,
        actorStaffId: actor.id,
        action: "staff.role_changed",
        subjectType: "staff",
        subjectId: staffId,
        detail: { from: target.role, to: role },
      });
    });
    realtime.staffChanged(staffId);
    const member = (await listStaff(db, actor.schoolId)).find((m) => m.id === staffId);
    if (!member) throw notFound("That member of staff");
    res.json(member);
  });

  /**
   * Removes a person's access: they cannot sign in again, their sessions are deleted, and their
   * open tabs are told and disconnected at once. Their classes stay with the school.
   */
  router.delete("/api/staff/:staffId", async (req, res) => {
    const actor = actorOf(req);
    const staffId = parseId(req.params.staffId, "That member of staff");
    if (staffId === actor.id) {
      throw new AppError("forbidden", "You cannot remove your own access: another admin can.");
    }
    await db.transaction(async (tx) => {
      const target = await findStaffMember(tx, actor.schoolId, staffId);
      if (!target) throw notFound("That member of staff");
      if (target.role === "admin") {
        await keepOneAdmin(tx, actor.schoolId, "The school needs at least one admin: make someone else admin first.");
      }
      await tx.update(staff).set({ removedAt: new Date() }).where(eq(staff.id, staffId));
      await tx.execute(sql`delete from "session" where sess -> 'passport' ->> 'user' = ${staffId}`);
      await recordAudit(tx, {
        schoolId: actor.schoolId,
        actorStaffId: actor.id,
        action: "staff.removed",
        subjectType: "staff",
        subjectId: staffId,
        detail: { role: target.role, displayName: target.displayName },
      });
    });
    realtime.endStaff(staffId, "access_changed");
    res.status(204).end();
  });

  return router;
}
