import { and, eq, inArray, isNotNull, lt } from "drizzle-orm";
import type { PupilDataKind } from "../contracts/retention";
import type { PhotoStore } from "../bench/photo-store";
import type { Db } from "../db/client";
import { benchPhotos, classes, explanations, lessonParticipants, lessons, predictions, rosterEntries, trials } from "../db/schema";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/**
 * One kind of pupil data that the retention purge and "delete this class's pupil data now" remove.
 * Both go through this list, so a kind added here is covered by both.
 *
 * Pupil data: roster names, and from live lessons a display name per lesson, predictions with
 * their reasons, and explanations. A lesson's data is on the clock from when the lesson started.
 * Photos of real runs may show pupils: on the clock from their upload.
 *
 * `files` collects the stored names of photo files whose rows went: the caller removes them once
 * the transaction has committed (a rolled-back deletion keeps its files).
 */
export interface PupilDataTarget {
  kind: PupilDataKind;
  /** Deletes this school's data of this kind whose clock started before `cutoff`; returns how many rows went. */
  purgeSchool(tx: Tx, schoolId: string, cutoff: Date, files: string[]): Promise<number>;
  /** Deletes all of one class's data of this kind; returns how many rows went. */
  deleteForClass(tx: Tx, classId: string, files: string[]): Promise<number>;
}

/**
 * Roster names of archived classes. A class in use keeps its roster (the teacher needs it every
 * lesson); the clock starts when the class is archived, so an archived class loses its pupils'
 * names once the school's retention period has passed since archiving.
 */
const rosterNamesOfArchivedClasses: PupilDataTarget = {
  kind: "roster_names",
  async purgeSchool(tx, schoolId, cutoff) {
    const expiredClasses = tx
      .select({ id: classes.id })
      .from(classes)
      .where(and(eq(classes.schoolId, schoolId), isNotNull(classes.archivedAt), lt(classes.archivedAt, cutoff)));
    const deleted = await tx
      .delete(rosterEntries)
      .where(inArray(rosterEntries.classId, expiredClasses))
      .returning({ id: rosterEntries.id });
    return deleted.length;
  },
  async deleteForClass(tx, classId) {
    const deleted = await tx.delete(rosterEntries).where(eq(rosterEntries.classId, classId)).returning({ id: rosterEntries.id });
    return deleted.length;
  },
};

/** Ids of the lessons in scope: a school's lessons started before the cutoff, or all of one class's. */
function lessonIds(tx: Tx, scope: { schoolId: string; cutoff: Date } | { classId: string }) {
  if ("classId" in scope) return tx.select({ id: lessons.id }).from(lessons).where(eq(lessons.classId, scope.classId));
  return tx
    .select({ id: lessons.id })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .where(and(eq(classes.schoolId, scope.schoolId), lt(lessons.startedAt, scope.cutoff)));
}

/** The trials of those lessons (predictions and explanations hang off trials). */
const trialIds = (tx: Tx, scope: Parameters<typeof lessonIds>[1]) =>
  tx.select({ id: trials.id }).from(trials).where(inArray(trials.lessonId, lessonIds(tx, scope)));

function lessonTarget(kind: PupilDataKind, remove: (tx: Tx, scope: Parameters<typeof lessonIds>[1]) => Promise<number>): PupilDataTarget {
  return {
    kind,
    purgeSchool: (tx, schoolId, cutoff) => remove(tx, { schoolId, cutoff }),
    deleteForClass: (tx, classId) => remove(tx, { classId }),
  };
}

const lessonPredictions = lessonTarget("lesson_predictions", async (tx, scope) => {
  const deleted = await tx.delete(predictions).where(inArray(predictions.trialId, trialIds(tx, scope))).returning({ id: predictions.id });
  return deleted.length;
});

const lessonExplanations = lessonTarget("lesson_explanations", async (tx, scope) => {
  const deleted = await tx.delete(explanations).where(inArray(explanations.trialId, trialIds(tx, scope))).returning({ id: explanations.id });
  return deleted.length;
});

/** Last, so the answers above are counted before the names' cascade would take them. */
const lessonNames = lessonTarget("lesson_names", async (tx, scope) => {
  const deleted = await tx
    .delete(lessonParticipants)
    .where(inArray(lessonParticipants.lessonId, lessonIds(tx, scope)))
    .returning({ id: lessonParticipants.id });
  return deleted.length;
});

/** The rows go here; their files go after the commit. Runs measured on a photo keep their numbers. */
const runPhotos: PupilDataTarget = {
  kind: "run_photos",
  async purgeSchool(tx, schoolId, cutoff, files) {
    const schoolClasses = tx.select({ id: classes.id }).from(classes).where(eq(classes.schoolId, schoolId));
    const deleted = await tx
      .delete(benchPhotos)
      .where(and(inArray(benchPhotos.classId, schoolClasses), lt(benchPhotos.createdAt, cutoff)))
      .returning({ storedName: benchPhotos.storedName });
    files.push(...deleted.map((d) => d.storedName));
    return deleted.length;
  },
  async deleteForClass(tx, classId, files) {
    const deleted = await tx.delete(benchPhotos).where(eq(benchPhotos.classId, classId)).returning({ storedName: benchPhotos.storedName });
    files.push(...deleted.map((d) => d.storedName));
    return deleted.length;
  },
};

export const PUPIL_DATA_TARGETS: readonly PupilDataTarget[] = [
  rosterNamesOfArchivedClasses,
  lessonPredictions,
  lessonExplanations,
  lessonNames,
  runPhotos,
];

/** Removes the files of deleted photo rows; a file that will not go is logged, not fatal (its row is gone). */
export async function removePhotoFiles(store: PhotoStore, names: readonly string[], log: (message: string, error?: unknown) => void): Promise<void> {
  for (const name of names) await store.remove(name).catch((error) => log(`[pupil data] could not remove photo file ${name}`, error));
}
