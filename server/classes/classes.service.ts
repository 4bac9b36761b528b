import { and, eq, inArray, sql } from "drizzle-orm";
import type { ArchivedFilter, ClassSummary, CreateClassValues, UpdateClassValues } from "../contracts/classes";
import type { Roster } from "../contracts/roster";
import { rosterNameKey } from "../contracts/roster";
import type { Db } from "../db/client";
import { classes, rosterEntries } from "../db/schema";
import { AppError, forbidden, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { classForActor } from "./classes.access";
import { findClassSummary, isUniqueViolation, listOwnClasses, listRoster } from "./classes.repository";

const nameTaken = () =>
  new AppError("class_name_taken", "You already have a current class with that name.", {
    name: ["You already have a current class with that name: choose another, or archive the old one."],
  });

async function summaryOrThrow(db: Db, classId: string, viewerId: string): Promise<ClassSummary> {
  const summary = await findClassSummary(db, classId, viewerId);
  if (!summary) throw notFound("That class");
  return summary;
}

export function listClasses(db: Db, actor: Actor, archived: ArchivedFilter) {
  return listOwnClasses(db, actor.id, archived);
}

export async function createClass(db: Db, actor: Actor, input: CreateClassValues): Promise<ClassSummary> {
  if (!actor.departmentId) throw forbidden("You need to be in a department to create classes: ask your school admin.");
  try {
    const [row] = await db
      .insert(classes)
      .values({ ...input, schoolId: actor.schoolId, departmentId: actor.departmentId, teacherId: actor.id })
      .returning({ id: classes.id });
    return summaryOrThrow(db, row!.id, actor.id);
  } catch (error) {
    if (isUniqueViolation(error, "classes_teacher_active_name_key")) throw nameTaken();
    throw error;
  }
}

export async function getClass(db: Db, actor: Actor, classId: string): Promise<ClassSummary> {
  await classForActor(db, actor, classId, "read");
  return summaryOrThrow(db, classId, actor.id);
}

export async function updateClass(db: Db, actor: Actor, classId: string, input: UpdateClassValues) {
  await classForActor(db, actor, classId, "write");
  try {
    await db
      .update(classes)
      .set({ ...input, updatedAt: new Date() })
      .where(eq(classes.id, classId));
  } catch (error) {
    if (isUniqueViolation(error, "classes_teacher_active_name_key")) throw nameTaken();
    throw error;
  }
  return summaryOrThrow(db, classId, actor.id);
}

export async function setArchived(db: Db, actor: Actor, classId: string, archived: boolean): Promise<ClassSummary> {
  const row = await classForActor(db, actor, classId, "write");
  if (Boolean(row.archivedAt) !== archived) {
    try {
      await db
        .update(classes)
        .set({ archivedAt: archived ? new Date() : null, updatedAt: new Date() })
        .where(eq(classes.id, classId));
    } catch (error) {
      // Restoring a class whose name a current class now uses.
      if (isUniqueViolation(error, "classes_teacher_active_name_key")) throw nameTaken();
      throw error;
    }
  }
  return summaryOrThrow(db, classId, actor.id);
}

export async function getRoster(db: Db, actor: Actor, classId: string): Promise<Roster> {
  const row = await classForActor(db, actor, classId, "read");
  const names = await listRoster(db, classId);
  return {
    classId,
    names: names.map(({ id, displayName }) => ({ id, displayName })),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/**
 * Replaces the roster with `names`, in order, all or nothing. Entries whose name is
 * unchanged keep their id, so anything that refers to a pupil's roster entry survives an edit.
 */
export async function replaceRoster(db: Db, actor: Actor, classId: string, names: string[]): Promise<Roster> {
  await classForActor(db, actor, classId, "write");
  await db.transaction(async (tx) => {
    // Serialise concurrent edits of one roster (two tabs saving at once).
    await tx.execute(sql`select 1 from ${classes} where ${classes.id} = ${classId} for update`);
    const existing = await tx
      .select({ id: rosterEntries.id, displayName: rosterEntries.displayName })
      .from(rosterEntries)
      .where(eq(rosterEntries.classId, classId));
    const byKey = new Map(existing.map((e) => [rosterNameKey(e.displayName), e]));
    const kept = new Set<string>();
    const inserts: { classId: string; displayName: string; position: number }[] = [];
    const updates: { id: string; displayName: string; position: number }[] = [];
    names.forEach((displayName, position) => {
      const match = byKey.get(rosterNameKey(displayName));
      if (match) {
        kept.add(match.id);
        updates.push({ id: match.id, displayName, position });
      } else inserts.push({ classId, displayName, position });
    });
    const removed = existing.filter((e) => !kept.has(e.id)).map((e) => e.id);
    if (removed.length) await tx.delete(rosterEntries).where(and(eq(rosterEntries.classId, classId), inArray(rosterEntries.id, removed)));
    for (const u of updates) {
      await tx
        .update(rosterEntries)
        .set({ displayName: u.displayName, position: u.position })
        .where(eq(rosterEntries.id, u.id));
    }
    if (inserts.length) await tx.insert(rosterEntries).values(inserts);
    await tx.update(classes).set({ updatedAt: new Date() }).where(eq(classes.id, classId));
  });
  return getRoster(db, actor, classId);
}
