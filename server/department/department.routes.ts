import { Router } from "express";
import { classListQuerySchema } from "../contracts/classes";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { forbidden } from "../http/app-error";
import { parseInput } from "../http/validate";
import { listDepartmentClasses } from "../classes/classes.repository";

/** The head of department's read-only view of the department. */
export function departmentRoutes(db: Db) {
  const router = Router();
  router.use("/api/department", requireRole("head_of_department"));

  router.get("/api/department/classes", async (req, res) => {
    const actor = actorOf(req);
    if (!actor.departmentId) throw forbidden("You are not attached to a department: ask your school admin.");
    const { archived } = parseInput(classListQuerySchema, req.query);
    res.json(await listDepartmentClasses(db, actor.departmentId, actor.id, archived));
  });

  return router;
}
