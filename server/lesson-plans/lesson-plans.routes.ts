import { Router } from "express";
import { lessonPlanInputSchema, planPreviewInputSchema } from "../contracts/lesson-plans";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { parseId, parseInput } from "../http/validate";
import * as service from "./lesson-plans.service";

/** Lesson plans: the teacher's own, and those shared in their department (read and duplicate only). */
export function lessonPlansRoutes(db: Db) {
  const router = Router();
  const teaching = requireRole(...TEACHING_ROLES);
  const planId = (raw: unknown) => parseId(raw, "That plan");

  router.get("/api/lesson-plans", teaching, async (req, res) => {
    res.json(await service.listPlans(db, actorOf(req)));
  });

  router.post("/api/lesson-plans", teaching, async (req, res) => {
    const input = parseInput(lessonPlanInputSchema, req.body ?? {});
    res.status(201).json(await service.createPlan(db, actorOf(req), input));
  });

  // Before "/:planId" so "preview" is not read as an id.
  router.post("/api/lesson-plans/preview", teaching, async (req, res) => {
    res.json(service.previewTrial(parseInput(planPreviewInputSchema, req.body ?? {})));
  });

  router.get("/api/lesson-plans/:planId", teaching, async (req, res) => {
    res.json(await service.getPlan(db, actorOf(req), planId(req.params.planId)));
  });

  router.put("/api/lesson-plans/:planId", teaching, async (req, res) => {
    // The body is read once the caller is known to own the plan: others learn nothing from its errors.
    res.json(await service.updatePlan(db, actorOf(req), planId(req.params.planId), req.body ?? {}));
  });

  router.delete("/api/lesson-plans/:planId", teaching, async (req, res) => {
    await service.deletePlan(db, actorOf(req), planId(req.params.planId));
    res.status(204).end();
  });

  router.post("/api/lesson-plans/:planId/duplicate", teaching, async (req, res) => {
    res.status(201).json(await service.duplicatePlan(db, actorOf(req), planId(req.params.planId)));
  });

  return router;
}
