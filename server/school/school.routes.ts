import { Router } from "express";
import { actorOf, requireRole } from "../auth/guards";
import { updateTimeZoneInputSchema } from "../contracts/school";
import type { Db } from "../db/client";
import { parseInput } from "../http/validate";
import { updateSchoolTimeZone } from "./school.service";

/** School-wide settings an admin changes. (The retention period lives with retention.) */
export function schoolRoutes(db: Db) {
  const router = Router();

  router.put("/api/school/time-zone", requireRole("admin"), async (req, res) => {
    const { timeZone } = parseInput(updateTimeZoneInputSchema, req.body);
    res.json(await updateSchoolTimeZone(db, actorOf(req), timeZone));
  });

  return router;
}
