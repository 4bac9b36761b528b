import { Router } from "express";
import { planLessonInputSchema } from "../contracts/planned-lessons";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { AppError } from "../http/app-error";
import { parseId, parseInput } from "../http/validate";
import { startLesson } from "../lessons/lessons.service";
import * as service from "./planned-lessons.service";

/** The teacher's diary of planned lessons, and their recent lessons across classes (for home). */
export function plannedLessonsRoutes(db: Db) {
  const router = Router();
  const teaching = requireRole(...TEACHING_ROLES);

  router.get("/api/planned-lessons", teaching, async (req, res) => {
    res.json(await service.upcoming(db, actorOf(req)));
  });

  router.post("/api/planned-lessons", teaching, async (req, res) => {
    const input = parseInput(planLessonInputSchema, req.body ?? {});
    res.status(201).json(await service.planLesson(db, actorOf(req), input));
  });

  router.delete("/api/planned-lessons/:id", teaching, async (req, res) => {
    await service.removePlanned(db, actorOf(req), parseId(req.params.id, "That planned lesson"));
    res.status(204).end();
  });

  /** Starts the live lesson with the planned class and plan (a deleted plan starts one fountain trial). */
  router.post("/api/planned-lessons/:id/start", teaching, async (req, res) => {
    const actor = actorOf(req);
    const planned = await service.ownPlanned(db, actor, parseId(req.params.id, "That planned lesson"));
    if (planned.lessonId) throw new AppError("already_started", "This lesson has already been started: find it under recent lessons.");
    const started = await startLesson(db, actor, planned.classId, { showNames: false, fromLessonId: null, planId: planned.planId });
    await service.markStarted(db, planned.id, started.lessonId);
    res.status(201).json(started);
  });

  router.get("/api/lessons/recent", teaching, async (req, res) => {
    res.json(await service.recent(db, actorOf(req)));
  });

  return router;
}
