import { and, eq, inArray, isNotNull, lt } from "drizzle-orm";
import type { PupilDataKind } from "../contracts/retention";
import type { Db } from "../db/client";
import { classes, rosterEntries } from "../db/schema";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/**
 * One kind of pupil data that the retention purge and "delete this class's pupil data now" remove.
 * Both go through this list, so a kind added here is covered by both.
 *
 * Today the only pupil data is roster names. Pupil answers arrive with live lessons (a display
 * name per lesson, predictions, reasons, explanations): each gets a target here whose clock
 * starts when its lesson ends.
 */
export interface PupilDataTarget {
  kind: PupilDataKind;
  /** Deletes this school's data of this kind whose clock started before `cutoff`; returns how many rows went. */
  purgeSchool(tx: Tx, schoolId: string, cutoff: Date): Promise<number>;
  /** Deletes all of one class's data of this kind; returns how many rows went. */
  deleteForClass(tx: Tx, classId: string): Promise<number>;
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

export const PUPIL_DATA_TARGETS: readonly PupilDataTarget[] = [rosterNamesOfArchivedClasses];
