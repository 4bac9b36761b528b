import { asc, eq, sql } from "drizzle-orm";
import type { PupilDataDeletion, RetentionPeriod, RetentionSettings, SchoolClass } from "../contracts/retention";
import { isTeachingRole } from "../contracts/staff-roles";
import type { PhotoStore } from "../bench/photo-store";
import type { Db } from "../db/client";
import { classes, rosterEntries, schools, staff } from "../db/schema";
import { recordAudit } from "../audit/audit.repository";
import { classForActor } from "../classes/classes.access";
import { findClassRow } from "../classes/classes.repository";
import { forbidden, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { lastPurgeRun } from "./retention.purge";
import { PUPIL_DATA_TARGETS, removePhotoFiles } from "./retention.targets";

export async function getRetentionSettings(db: Db, schoolId: string, nextRunAt: Date | null): Promise<RetentionSettings> {
  const [school] = await db.select({ period: schools.pupilDataRetention }).from(schools).where(eq(schools.id, schoolId));
  if (!school) throw notFound("Your school");
  return { period: school.period, lastRun: await lastPurgeRun(db, schoolId), nextRunAt: nextRunAt?.toISOString() ?? null };
}

export async function updateRetention(db: Db, actor: Actor, period: RetentionPeriod): Promise<void> {
  await db.transaction(async (tx) => {
    const [school] = await tx
      .select({ period: schools.pupilDataRetention })
      .from(schools)
      .where(eq(schools.id, actor.schoolId))
      .for("update");
    if (!school) throw notFound("Your school");
    if (school.period === period) return;
    await tx.update(schools).set({ pupilDataRetention: period }).where(eq(schools.id, actor.schoolId));
    await recordAudit(tx, {
      schoolId: actor.schoolId,
      actorStaffId: actor.id,
      action: "school.retention_changed",
      subjectType: "school",
      subjectId: actor.schoolId,
      detail: { from: school.period, to: period },
    });
  });
}

/** Every class of the school with how many roster names it holds: counts only, never the names. */
export async function listSchoolClasses(db: Db, schoolId: string): Promise<SchoolClass[]> {
  const rows = await db
    .select({
      id: classes.id,
      name: classes.name,
      yearGroup: classes.yearGroup,
      subject: classes.subject,
      teacherId: staff.id,
      teacherName: staff.displayName,
      archivedAt: classes.archivedAt,
      rosterCount: sql<number>`(select count(*)::int from ${rosterEntries} where ${rosterEntries.classId} = ${classes.id})`,
    })
    .from(classes)
    .innerJoin(staff, eq(staff.id, classes.teacherId))
    .where(eq(classes.schoolId, schoolId))
    .orderBy(asc(classes.name));
  const byName = new Intl.Collator("en", { numeric: true, sensitivity: "base" });
  return rows
    .map((r) => ({
      id: r.id,
      name: r.name,
      yearGroup: r.yearGroup,
      subject: r.subject,
      teacher: { id: r.teacherId, displayName: r.teacherName },
      archivedAt: r.archivedAt?.toISOString() ?? null,
      rosterCount: r.rosterCount,
    }))
    .sort((a, b) => Number(Boolean(a.archivedAt)) - Number(Boolean(b.archivedAt)) || byName.compare(a.name, b.name));
}

/**
 * Deletes every kind of pupil data one class holds, at once, for its teacher or a school admin.
 * The head of department can see the class but not do this (403); anyone else gets 404.
 * Photo files are removed once the deletion has committed.
 */
export async function deleteClassPupilData(
  db: Db,
  photos: PhotoStore,
  actor: Actor,
  classId: string,
  log: (message: string, error?: unknown) => void = console.error,
): Promise<PupilDataDeletion> {
  if (actor.role === "admin") {
    if (!(await findClassRow(db, actor.schoolId, classId))) throw notFound("That class");
  } else if (isTeachingRole(actor.role)) {
    await classForActor(db, actor, classId, "write");
  } else {
    throw forbidden();
  }
  const files: string[] = [];
  const deleted = await db.transaction(async (tx) => {
    // Serialise with roster saves on the same class.
    await tx.execute(sql`select 1 from ${classes} where ${classes.id} = ${classId} for update`);
    const counts = [];
    for (const target of PUPIL_DATA_TARGETS) counts.push({ kind: target.kind, count: await target.deleteForClass(tx, classId, files) });
    await tx.update(classes).set({ updatedAt: new Date() }).where(eq(classes.id, classId));
    await recordAudit(tx, {
      schoolId: actor.schoolId,
      actorStaffId: actor.id,
      action: "class.pupil_data_deleted",
      subjectType: "class",
      subjectId: classId,
      detail: Object.fromEntries(counts.map((c) => [c.kind, c.count])),
    });
    return counts;
  });
  await removePhotoFiles(photos, files, log);
  return { classId, deleted };
}
