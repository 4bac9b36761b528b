import { Router } from "express";
import { startLessonInputSchema } from "../contracts/lessons";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { parseId, parseInput } from "../http/validate";
import type { LessonLive } from "./lessons.handlers";
import * as service from "./lessons.service";

/** Starting, listing and ending live lessons; everything during a lesson goes over the socket. */
export function lessonsRoutes(db: Db, live: LessonLive) {
  const router = Router();
  const teaching = requireRole(...TEACHING_ROLES);

  router.post("/api/classes/:classId/lessons", teaching, async (req, res) => {
    const classId = parseId(req.params.classId, "That class");
    const input = parseInput(startLessonInputSchema, req.body ?? {});
    res.status(201).json(await service.startLesson(db, actorOf(req), classId, input));
  });

  router.get("/api/classes/:classId/lessons", teaching, async (req, res) => {
    res.json(await service.listLessons(db, actorOf(req), parseId(req.params.classId, "That class")));
  });

  router.get("/api/lessons/open", teaching, async (req, res) => {
    res.json(await service.openLessons(db, actorOf(req)));
  });

  router.post("/api/lessons/:lessonId/end", teaching, async (req, res) => {
    const lessonId = parseId(req.params.lessonId, "That lesson");
    const { justEnded, ...ended } = await service.endLessonByActor(db, actorOf(req), lessonId);
    if (justEnded) live.ended(lessonId);
    await live.lessonChanged(lessonId);
    res.json(ended);
  });

  return router;
}
