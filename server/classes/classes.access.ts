import { AppError, notFound } from "../http/app-error";
import type { Db } from "../db/client";
import type { Actor } from "../staff/staff.repository";
import { findClassRow, type ClassRow } from "./classes.repository";

/**
 * Who may see or change a class:
 * - its teacher: read and write;
 * - the head of the class's department: read only (403 on writes, since they can see it);
 * - anyone else, including other schools: 404, so a class's existence never leaks.
 * Admins are stopped earlier, at the route guard (403).
 */
export async function classForActor(db: Db, actor: Actor, classId: string, intent: "read" | "write"): Promise<ClassRow> {
  const row = await findClassRow(db, actor.schoolId, classId);
  if (!row) throw notFound("That class");
  if (row.teacherId === actor.id) return row;
  const headOfItsDepartment = actor.role === "head_of_department" && actor.departmentId === row.departmentId;
  if (!headOfItsDepartment) throw notFound("That class");
  if (intent === "write") throw new AppError("forbidden", "Only the class's own teacher can change it.");
  return row;
}
