import { and, asc, eq, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import type { ArchivedFilter, ClassSummary } from "../contracts/classes";
import type { Db } from "../db/client";
import { classes, rosterEntries, staff } from "../db/schema";

export type ClassRow = typeof classes.$inferSelect;
type Reader = Pick<Db, "select">;

const summaryColumns = {
  id: classes.id,
  name: classes.name,
  yearGroup: classes.yearGroup,
  subject: classes.subject,
  archivedAt: classes.archivedAt,
  createdAt: classes.createdAt,
  updatedAt: classes.updatedAt,
  teacherId: classes.teacherId,
  teacherName: staff.displayName,
  rosterCount: sql<number>`(select count(*)::int from ${rosterEntries} where ${rosterEntries.classId} = ${classes.id})`,
};
function querySummaries(db: Reader, where: SQL | undefined) {
  return db
    .select(summaryColumns)
    .from(classes)
    .innerJoin(staff, eq(staff.id, classes.teacherId))
    .where(where);
}
type SummaryRow = Awaited<ReturnType<typeof querySummaries>>[number];

function toSummary(row: SummaryRow, viewerId: string): ClassSummary {
  return {
    id: row.id,
    name: row.name,
    yearGroup: row.yearGroup,
    subject: row.subject,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    teacher: { id: row.teacherId, displayName: row.teacherName },
    rosterCount: row.rosterCount,
    access: row.teacherId === viewerId ? "owner" : "department",
  };
}

function archivedFilter(archived: ArchivedFilter): SQL | undefined {
  if (archived === "only") return isNotNull(classes.archivedAt);
  if (archived === "exclude") return isNull(classes.archivedAt);
  return undefined;
}

/** "9Q" before "10A": names compare with their numbers as numbers. */
const byName = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

async function selectSummaries(db: Reader, where: SQL | undefined, viewerId: string) {
  const rows = await querySummaries(db, where);
  return rows
    .map((row) => toSummary(row, viewerId))
    .sort((a, b) => Number(Boolean(a.archivedAt)) - Number(Boolean(b.archivedAt)) || byName.compare(a.name, b.name));
}

export function listOwnClasses(
  db: Reader,
  teacherId: string,
  archived: ArchivedFilter,
): Promise<ClassSummary[]> {
  return selectSummaries(db, and(eq(classes.teacherId, teacherId), archivedFilter(archived)), teacherId);
}

export function listDepartmentClasses(
  db: Reader,
  departmentId: string,
  viewerId: string,
  archived: ArchivedFilter,
): Promise<ClassSummary[]> {
  return selectSummaries(db, and(eq(classes.departmentId, departmentId), archivedFilter(archived)), viewerId);
}

export async function findClassSummary(db: Reader, classId: string, viewerId: string) {
  const [summary] = await selectSummaries(db, eq(classes.id, classId), viewerId);
  return summary;
}

export async function findClassRow(db: Reader, schoolId: string, classId: string): Promise<ClassRow | undefined> {
  const [row] = await db
    .select()
    .from(classes)
    .where(and(eq(classes.id, classId), eq(classes.schoolId, schoolId)));
  return row;
}

export async function listRoster(db: Reader, classId: string) {
  return db
    .select({ id: rosterEntries.id, displayName: rosterEntries.displayName, createdAt: rosterEntries.createdAt })
    .from(rosterEntries)
    .where(eq(rosterEntries.classId, classId))
    .orderBy(asc(rosterEntries.position));
}

/** The Postgres unique-violation code, and whether it came from the given index. */
export function isUniqueViolation(error: unknown, constraint: string): boolean {
  const e = (error as { cause?: unknown }).cause ?? error;
  return (e as { code?: string }).code === "23505" && (e as { constraint?: string }).constraint === constraint;
}
