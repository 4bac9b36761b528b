import { Router } from "express";
import { and, eq, isNull } from "drizzle-orm";
import { updateStaffRoleInputSchema } from "../contracts/staff";
import type { Db } from "../db/client";
import { staff } from "../db/schema";
import { actorOf, requireRole } from "../auth/guards";
import { recordAudit } from "../audit/audit.repository";
import { AppError, notFound } from "../http/app-error";
import { parseId, parseInput } from "../http/validate";
import type { Realtime } from "../realtime/realtime";
import { findStaffMember, listStaff } from "./staff.repository";

/** School admins manage staff roles. */
export function staffRoutes(db: Db, realtime: Pick<Realtime, "staffChanged">) {
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
        // Lock the school's admins so two demotions at once cannot both pass the check.
        const admins = await tx
          .select({ id: staff.id })
          .from(staff)
          .where(and(eq(staff.schoolId, actor.schoolId), eq(staff.role, "admin"), isNull(staff.removedAt)))
          .for("update");
        if (admins.length <= 1) {
          throw new AppError("last_admin", "The school needs at least one admin: make someone else admin first.", {
            role: ["The school needs at least one admin: make someone else admin first."],
          });
        }
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

  return router;
}
