import { Router } from "express";
import { updateRetentionInputSchema } from "../contracts/retention";
import type { PhotoStore } from "../bench/photo-store";
import type { Db } from "../db/client";
import { actorOf, requireRole, requireStaff } from "../auth/guards";
import { parseId, parseInput } from "../http/validate";
import { deleteClassPupilData, getRetentionSettings, listSchoolClasses, updateRetention } from "./retention.service";

/**
 * How long pupil data is kept, and deleting it. Any member of staff may read the school's
 * setting (the privacy page states it); only admins change it.
 *
 * Mounted before the classes router, whose guard would stop admins at `/api/classes`.
 */
export function retentionRoutes(db: Db, schedule: { nextRunAt(): Date | null } | null, photos: PhotoStore) {
  const router = Router();

  router.get("/api/school/retention", requireStaff, async (req, res) => {
    res.json(await getRetentionSettings(db, actorOf(req).schoolId, schedule?.nextRunAt() ?? null));
  });

  router.put("/api/school/retention", requireRole("admin"), async (req, res) => {
    const actor = actorOf(req);
    const { period } = parseInput(updateRetentionInputSchema, req.body);
    await updateRetention(db, actor, period);
    res.json(await getRetentionSettings(db, actor.schoolId, schedule?.nextRunAt() ?? null));
  });

  router.get("/api/school/classes", requireRole("admin"), async (req, res) => {
    res.json(await listSchoolClasses(db, actorOf(req).schoolId));
  });

  router.delete("/api/classes/:classId/pupil-data", requireStaff, async (req, res) => {
    res.json(await deleteClassPupilData(db, photos, actorOf(req), parseId(req.params.classId, "That class")));
  });

  return router;
}
