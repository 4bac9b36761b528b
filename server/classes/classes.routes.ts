import { Router } from "express";
import { classListQuerySchema, createClassInputSchema, updateClassInputSchema } from "../contracts/classes";
import { rosterInputSchema } from "../contracts/roster";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { parseId, parseInput } from "../http/validate";
import * as service from "./classes.service";

/** A teacher's own classes. Heads of department read their department's through these too. */
export function classesRoutes(db: Db) {
  const router = Router();
  router.use("/api/classes", requireRole(...TEACHING_ROLES));

  router.get("/api/classes", async (req, res) => {
    const { archived } = parseInput(classListQuerySchema, req.query);
    res.json(await service.listClasses(db, actorOf(req), archived));
  });

  router.post("/api/classes", async (req, res) => {
    const input = parseInput(createClassInputSchema, req.body);
    res.status(201).json(await service.createClass(db, actorOf(req), input));
  });

  router.get("/api/classes/:classId", async (req, res) => {
    res.json(await service.getClass(db, actorOf(req), parseId(req.params.classId, "That class")));
  });

  router.patch("/api/classes/:classId", async (req, res) => {
    const classId = parseId(req.params.classId, "That class");
    const input = parseInput(updateClassInputSchema, req.body);
    res.json(await service.updateClass(db, actorOf(req), classId, input));
  });

  router.post("/api/classes/:classId/archive", async (req, res) => {
    res.json(await service.setArchived(db, actorOf(req), parseId(req.params.classId, "That class"), true));
  });

  router.post("/api/classes/:classId/restore", async (req, res) => {
    res.json(await service.setArchived(db, actorOf(req), parseId(req.params.classId, "That class"), false));
  });

  router.get("/api/classes/:classId/roster", async (req, res) => {
    res.json(await service.getRoster(db, actorOf(req), parseId(req.params.classId, "That class")));
  });

  router.put("/api/classes/:classId/roster", async (req, res) => {
    const classId = parseId(req.params.classId, "That class");
    const { names } = parseInput(rosterInputSchema, req.body);
    res.json(await service.replaceRoster(db, actorOf(req), classId, names));
  });

  return router;
}
