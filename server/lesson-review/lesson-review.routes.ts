import { Router, type Response } from "express";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { parseId } from "../http/validate";
import { exportFileName, predictionsCsv, resultsCsv } from "./lesson-review.csv";
import { reviewForActor } from "./lesson-review.service";

/** Pupils' names travel in these answers: never cached by the browser or anything between. */
const PRIVATE = "private, no-store";

function sendCsv(res: Response, fileName: string, body: string) {
  res
    .set({
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "Cache-Control": PRIVATE,
    })
    .send(body);
}

/** The lesson review and its CSV exports: the lesson's own teacher only. */
export function lessonReviewRoutes(db: Db) {
  const router = Router();
  const teaching = requireRole(...TEACHING_ROLES);

  router.get("/api/lessons/:lessonId/review", teaching, async (req, res) => {
    const review = await reviewForActor(db, actorOf(req), parseId(req.params.lessonId, "That lesson"));
    res.set("Cache-Control", PRIVATE).json(review);
  });

  router.get("/api/lessons/:lessonId/exports/predictions.csv", teaching, async (req, res) => {
    const review = await reviewForActor(db, actorOf(req), parseId(req.params.lessonId, "That lesson"));
    sendCsv(res, exportFileName(review, "predictions"), predictionsCsv(review));
  });

  router.get("/api/lessons/:lessonId/exports/results.csv", teaching, async (req, res) => {
    const review = await reviewForActor(db, actorOf(req), parseId(req.params.lessonId, "That lesson"));
    sendCsv(res, exportFileName(review, "results"), resultsCsv(review));
  });

  return router;
}
