import { Router } from "express";
import { classListQuerySchema } from "../contracts/classes";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { forbidden } from "../http/app-error";
import { parseInput } from "../http/validate";
import { listDepartmentClasses } from "../classes/classes.repository";
import { overviewQuerySchema } from "../contracts/department-overview";
import type { Actor } from "../staff/staff.repository";
import { departmentOverview, departmentOverviewCsv, resolveRange } from "./department-overview.service";

function departmentOf(actor: { departmentId: string | null }): string {
  if (!actor.departmentId) throw forbidden("You are not attached to a department: ask your school admin.");
  return actor.departmentId;
}

/** The overview is of the head's department, in the school's days. */
const overviewOf = (actor: Actor) => ({ departmentId: departmentOf(actor), timeZone: actor.schoolTimeZone });

/** The head of department's read-only view of the department. */
export function departmentRoutes(db: Db) {
  const router = Router();
  router.use("/api/department", requireRole("head_of_department"));

  router.get("/api/department/classes", async (req, res) => {
    const actor = actorOf(req);
    const departmentId = departmentOf(actor);
    const { archived } = parseInput(classListQuerySchema, req.query);
    res.json(await listDepartmentClasses(db, departmentId, actor.id, archived));
  });

  /** The range asked for with defaults filled in, checked again so a lone `from` cannot reach past the limit. */
  const overviewRange = (query: unknown, timeZone: string) =>
    parseInput(overviewQuerySchema, resolveRange(parseInput(overviewQuerySchema, query), timeZone));

  router.get("/api/department/overview", async (req, res) => {
    const of = overviewOf(actorOf(req));
    res.json(await departmentOverview(db, of, overviewRange(req.query, of.timeZone)));
  });

  router.get("/api/department/overview.csv", async (req, res) => {
    const of = overviewOf(actorOf(req));
    const { from, to, csv } = await departmentOverviewCsv(db, of, overviewRange(req.query, of.timeZone));
    res
      .type("text/csv; charset=utf-8")
      .attachment(`department-overview-${from}-to-${to}.csv`)
      .set("Cache-Control", "no-store")
      .send(csv);
  });

  return router;
}
