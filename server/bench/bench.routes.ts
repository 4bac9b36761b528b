import { Router, type NextFunction, type Request, type Response } from "express";
import multer from "multer";
import { createBenchRunsInputSchema, PHOTO_MAX_BYTES, PHOTO_MAX_TEXT } from "../contracts/bench";
import { photoMeasurementInputSchema } from "../contracts/photo-measure";
import { TEACHING_ROLES } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { actorOf, requireRole } from "../auth/guards";
import { classForActor } from "../classes/classes.access";
import { AppError } from "../http/app-error";
import { parseId, parseInput } from "../http/validate";
import * as service from "./bench.service";
import type { PhotoStore } from "./photo-store";

const classIdOf = (req: Request) => parseId(req.params.classId, "That class");

/** A class's bench data (real runs) and the photos they were measured on. */
export function benchRoutes(db: Db, store: PhotoStore) {
  const router = Router();
  router.use("/api/classes/:classId/bench-runs", requireRole(...TEACHING_ROLES));
  router.use("/api/classes/:classId/bench-photos", requireRole(...TEACHING_ROLES));

  router.get("/api/classes/:classId/bench-runs", async (req, res) => {
    res.json(await service.getBenchRuns(db, actorOf(req), classIdOf(req)));
  });

  router.post("/api/classes/:classId/bench-runs", async (req, res) => {
    const classId = classIdOf(req);
    // Access first: someone else's class answers 404 whatever the body.
    await classForActor(db, actorOf(req), classId, "write");
    const input = parseInput(createBenchRunsInputSchema, req.body);
    res.status(201).json(await service.createBenchRuns(db, actorOf(req), classId, input));
  });

  router.delete("/api/classes/:classId/bench-runs/:runId", async (req, res) => {
    await service.deleteBenchRun(db, actorOf(req), classIdOf(req), parseId(req.params.runId, "That run"));
    res.status(204).end();
  });

  router.get("/api/classes/:classId/bench-photos", async (req, res) => {
    res.json(await service.getBenchPhotos(db, actorOf(req), classIdOf(req)));
  });

  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 5 } });
  router.post(
    "/api/classes/:classId/bench-photos",
    // Only the class's teacher gets as far as sending the file's bytes to the parser.
    async (req, _res, next) => {
      await classForActor(db, actorOf(req), classIdOf(req), "write");
      next();
    },
    (req: Request, res: Response, next: NextFunction) => {
      upload.single("photo")(req, res, (error: unknown) => {
        if (!error) return next();
        if (error instanceof multer.MulterError) {
          if (error.code === "LIMIT_FILE_SIZE") {
            return next(new AppError("file_too_large", `This photo is larger than ${PHOTO_MAX_TEXT}, the most Linkleap accepts. Send a smaller copy.`));
          }
          return next(new AppError("bad_request", "Send one photo, in a form field named “photo”."));
        }
        next(error);
      });
    },
    async (req, res) => {
      if (!req.file) throw new AppError("bad_request", "Send one photo, in a form field named “photo”.");
      res.status(201).json(await service.addBenchPhoto(db, store, actorOf(req), classIdOf(req), req.file.buffer));
    },
  );

  router.get("/api/classes/:classId/bench-photos/:photoId/image", async (req, res) => {
    const photo = await service.readBenchPhoto(db, store, actorOf(req), classIdOf(req), parseId(req.params.photoId, "That photo"));
    // Only ever an image: the sniffed type, no sniffing by the browser, shown inline, and a
    // policy that lets nothing in it run even if opened on its own.
    res
      .status(200)
      .set({
        "Content-Type": photo.mediaType,
        "X-Content-Type-Options": "nosniff",
        "Content-Disposition": "inline",
        "Content-Security-Policy": "default-src 'none'; sandbox",
        "Cache-Control": "private, no-cache",
      })
      .send(photo.bytes);
  });

  router.delete("/api/classes/:classId/bench-photos/:photoId", async (req, res) => {
    await service.deleteBenchPhoto(db, store, actorOf(req), classIdOf(req), parseId(req.params.photoId, "That photo"));
    res.status(204).end();
  });

  router.post("/api/classes/:classId/bench-photos/:photoId/measurements", async (req, res) => {
    const classId = classIdOf(req);
    const photoId = parseId(req.params.photoId, "That photo");
    await classForActor(db, actorOf(req), classId, "write");
    const input = parseInput(photoMeasurementInputSchema, req.body);
    res.status(201).json(await service.measureBenchPhoto(db, actorOf(req), classId, photoId, input));
  });

  return router;
}
