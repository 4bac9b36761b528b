import { and, eq } from "drizzle-orm";
import type { z } from "zod";
import { checkBenchValue, PHOTO_MAX_TEXT, type BenchPhoto, type BenchRun } from "../contracts/bench";
import type { createBenchRunsInputSchema } from "../contracts/bench";
import { measurePhoto, referenceMetres, type photoMeasurementInputSchema } from "../contracts/photo-measure";
import type { Db } from "../db/client";
import { benchPhotos, benchRuns } from "../db/schema";
import { classForActor } from "../classes/classes.access";
import { AppError, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { findBenchPhoto, listBenchPhotos, listBenchRuns, toBenchPhoto, toBenchRun } from "./bench.repository";
import { sniffPhotoType, type PhotoStore } from "./photo-store";

export async function getBenchRuns(db: Db, actor: Actor, classId: string): Promise<BenchRun[]> {
  await classForActor(db, actor, classId, "read");
  return listBenchRuns(db, classId);
}

/** Every run is checked before any is saved; they are inserted in one statement, all or none. */
export async function createBenchRuns(
  db: Db,
  actor: Actor,
  classId: string,
  input: z.output<typeof createBenchRunsInputSchema>,
): Promise<BenchRun[]> {
  await classForActor(db, actor, classId, "write");
  const rows = await db
    .insert(benchRuns)
    .values(input.runs.map((run) => ({ ...run, classId, source: input.source, createdBy: actor.id })))
    .returning();
  return rows.map(toBenchRun);
}

export async function deleteBenchRun(db: Db, actor: Actor, classId: string, runId: string): Promise<void> {
  await classForActor(db, actor, classId, "write");
  const deleted = await db
    .delete(benchRuns)
    .where(and(eq(benchRuns.classId, classId), eq(benchRuns.id, runId)))
    .returning({ id: benchRuns.id });
  if (!deleted.length) throw notFound("That run");
}

export async function getBenchPhotos(db: Db, actor: Actor, classId: string): Promise<BenchPhoto[]> {
  await classForActor(db, actor, classId, "read");
  return listBenchPhotos(db, classId);
}

/** Checks the bytes are a JPEG, PNG or WebP (by content), stores them under a made name, records the photo. */
export async function addBenchPhoto(db: Db, store: PhotoStore, actor: Actor, classId: string, bytes: Uint8Array): Promise<BenchPhoto> {
  await classForActor(db, actor, classId, "write");
  if (bytes.length === 0) throw new AppError("bad_request", "The photo file is empty.");
  const mediaType = await sniffPhotoType(bytes);
  if (!mediaType) {
    throw new AppError(
      "unsupported_file_type",
      `This file is not a JPEG, PNG or WebP image (whatever its name says). Photos up to ${PHOTO_MAX_TEXT} in one of those formats are accepted.`,
    );
  }
  const storedName = await store.save(bytes, mediaType);
  try {
    const [row] = await db
      .insert(benchPhotos)
      .values({ classId, uploadedBy: actor.id, storedName, mediaType, byteSize: bytes.length })
      .returning();
    return toBenchPhoto(row!);
  } catch (error) {
    await store.remove(storedName);
    throw error;
  }
}

export async function readBenchPhoto(db: Db, store: PhotoStore, actor: Actor, classId: string, photoId: string) {
  await classForActor(db, actor, classId, "read");
  const row = await findBenchPhoto(db, classId, photoId);
  if (!row) throw notFound("That photo");
  try {
    return { mediaType: row.mediaType, bytes: await store.read(row.storedName) };
  } catch (error) {
    // The record outlived its file (restored database, lost disk): there is nothing to serve.
    if ((error as NodeJS.ErrnoException).code === "ENOENT") throw notFound("That photo");
    throw error;
  }
}

/** Deletes the record, then the file. Runs measured on it stay, unlinked (photo_id set null). */
export async function deleteBenchPhoto(db: Db, store: PhotoStore, actor: Actor, classId: string, photoId: string): Promise<void> {
  await classForActor(db, actor, classId, "write");
  const [deleted] = await db
    .delete(benchPhotos)
    .where(and(eq(benchPhotos.classId, classId), eq(benchPhotos.id, photoId)))
    .returning({ storedName: benchPhotos.storedName });
  if (!deleted) throw notFound("That photo");
  await store.remove(deleted.storedName);
}

/** Computes the heights from the marks on the server (never trusting the client's numbers) and saves a run. */
export async function measureBenchPhoto(
  db: Db,
  actor: Actor,
  classId: string,
  photoId: string,
  input: z.output<typeof photoMeasurementInputSchema>,
): Promise<BenchRun> {
  await classForActor(db, actor, classId, "write");
  const photo = await findBenchPhoto(db, classId, photoId);
  if (!photo) throw notFound("That photo");
  const result = measurePhoto(input.marks, referenceMetres(input.referenceLength, input.referenceUnit));
  if (!result.ok) throw new AppError("validation_failed", result.message, { marks: [result.message] });
  const potHeightM = Number(result.potHeightM.toPrecision(4));
  const riseM = Number(result.riseM.toPrecision(4));
  // The same ranges as typed runs: a photo measured with a wrong scale is caught here too.
  const pot = checkBenchValue(potHeightM, "potHeight", "m");
  const rise = checkBenchValue(riseM, "rise", "m");
  const fields: Record<string, string[]> = {};
  if (!pot.ok) fields.potHeight = [`${pot.message} This photo gives ${potHeightM} m: check the marks and the known length.`];
  if (!rise.ok) fields.rise = [`${rise.message} This photo gives ${riseM} m: check the marks and the known length.`];
  if (Object.keys(fields).length) throw new AppError("validation_failed", "Some of the details need correcting.", fields);
  const [row] = await db
    .insert(benchRuns)
    .values({
      classId,
      potHeightM,
      riseM,
      speedMps: null,
      heightUnit: "m",
      note: input.note.replace(/\s+/g, " ").trim(),
      source: "photo",
      photoId,
      photoMarks: input.marks,
      createdBy: actor.id,
    })
    .returning();
  return toBenchRun(row!);
}
