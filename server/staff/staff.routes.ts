import { Router } from "express";
import { and, eq, isNull, sql } from "drizzle-orm";
import { updateStaffInputSchema } from "../contracts/staff";
import type { Db } from "../db/client";
import { staff } from "../db/schema";
import { actorOf, requireRole } from "../auth/guards";
import { recordAudit } from "../audit/audit.repository";
import { AppError, notFound } from "../http/app-error";
import { parseId, parseInput } from "../http/validate";
import type { Realtime } from "../realtime/realtime";
import { findDepartment, findStaffMember, listStaff } from "./staff.repository";

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

/** School admins manage staff roles and departments, and remove access. */
export function staffRoutes(db: Db, realtime: Pick<Realtime, "staffChanged" | "endStaff">) {
  const router = Router();
  router.use("/api/staff", requireRole("admin"));

  router.get("/api/staff", async (req, res) => {
    res.json(await listStaff(db, actorOf(req).schoolId));
  });

  /**
   * Changes a person's role, department, or both at once. Their classes keep the department they
   * were created in (classes carry their own department); only what the person sees follows them.
   */
  router.patch("/api/staff/:staffId", async (req, res) => {
    const actor = actorOf(req);
    const staffId = parseId(req.params.staffId, "That member of staff");
    const input = parseInput(updateStaffInputSchema, req.body);

    await db.transaction(async (tx) => {
      const target = await findStaffMember(tx, actor.schoolId, staffId);
      if (!target) throw notFound("That member of staff");
      const role = input.role ?? target.role;
      // Ids compare as stored (lower case), so an upper-case copy of the current id is no change.
      const departmentId = input.departmentId === undefined ? target.departmentId : (input.departmentId?.toLowerCase() ?? null);
      const roleChanged = role !== target.role;
      const departmentChanged = departmentId !== target.departmentId;
      if (!roleChanged && !departmentChanged) return;

      if (departmentChanged && departmentId && !(await findDepartment(tx, actor.schoolId, departmentId))) {
        throw new AppError("validation_failed", "Some of the details need correcting.", {
          departmentId: ["Choose a department from the list."],
        });
      }
      if (role === "head_of_department" && !departmentId) {
        // Say it beside the field the admin just changed.
        throw new AppError(
          "validation_failed",
          "A head of department needs a department.",
          departmentChanged
            ? { departmentId: ["A head of department must keep a department: choose one, or change their role first."] }
            : { role: ["Put them in a department before making them head of it."] },
        );
      }
      if (roleChanged && target.role === "admin") {
        await keepOneAdmin(tx, actor.schoolId, "The school needs at least one admin: make someone else admin first.");
      }

      await tx.update(staff).set({ role, departmentId }).where(eq(staff.id, staffId));
      const audit = { schoolId: actor.schoolId, actorStaffId: actor.id, subjectType: "staff", subjectId: staffId } as const;
      if (roleChanged) {
        await recordAudit(tx, { ...audit, action: "staff.role_changed", detail: { from: target.role, to: role } });
      }
      if (departmentChanged) {
        await recordAudit(tx, {
          ...audit,
          action: "staff.department_changed",
          detail: { from: target.departmentId, to: departmentId },
        });
      }
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
