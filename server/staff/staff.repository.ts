import { and, asc, eq, isNull, sql } from "drizzle-orm";
import type { StaffMember } from "../contracts/staff";
import type { StaffRole } from "../contracts/staff-roles";
import type { Db } from "../db/client";
import { departments, schools, staff } from "../db/schema";

/** A signed-in member of staff, as every guard and service sees them. */
export interface Actor {
  id: string;
  email: string;
  displayName: string;
  role: StaffRole;
  schoolId: string;
  schoolName: string;
  /** IANA name: days and weeks in the overview and digest are the school's. */
  schoolTimeZone: string;
  departmentId: string | null;
  departmentName: string | null;
}

const actorColumns = {
  id: staff.id,
  email: staff.email,
  displayName: staff.displayName,
  role: staff.role,
  schoolId: staff.schoolId,
  schoolName: schools.name,
  schoolTimeZone: schools.timeZone,
  departmentId: staff.departmentId,
  departmentName: departments.name,
};

function actorQuery(db: Pick<Db, "select">) {
  return db
    .select(actorColumns)
    .from(staff)
    .innerJoin(schools, eq(schools.id, staff.schoolId))
    .leftJoin(departments, eq(departments.id, staff.departmentId));
}

/** The staff member with this id as an actor, removed or not (inside a transaction that just changed them). */
export async function actorWith(db: Pick<Db, "select">, id: string): Promise<Actor | undefined> {
  const [row] = await actorQuery(db).where(eq(staff.id, id));
  return row;
}

/** The current (not removed) staff member with this id, or undefined. */
export async function findActorById(db: Db, id: string): Promise<Actor | undefined> {
  const [row] = await actorQuery(db).where(and(eq(staff.id, id), isNull(staff.removedAt)));
  return row;
}

/**
 * Matches a sign-in to an invited staff member: by the provider's subject id once known,
 * otherwise by verified e-mail address (the invitation), remembering the subject id.
 */
export async function findActorForSignIn(
  db: Db,
  identity: { subject: string; email: string },
): Promise<Actor | undefined> {
  const email = identity.email.toLowerCase();
  return db.transaction(async (tx) => {
    const [match] = await tx
      .select({ id: staff.id, oauthSubject: staff.oauthSubject })
      .from(staff)
      .where(and(isNull(staff.removedAt), sql`(${staff.oauthSubject} = ${identity.subject} or ${staff.email} = ${email})`))
      .orderBy(sql`${staff.oauthSubject} = ${identity.subject} desc nulls last`)
      .limit(1);
    if (!match) return undefined;
    // A different subject already linked to this address means another identity: refuse.
    if (match.oauthSubject && match.oauthSubject !== identity.subject) return undefined;
    await tx
      .update(staff)
      .set({ oauthSubject: identity.subject, lastSignInAt: new Date() })
      .where(eq(staff.id, match.id));
    const [actor] = await actorQuery(tx).where(eq(staff.id, match.id));
    return actor;
  });
}

export async function listStaff(db: Db, schoolId: string): Promise<StaffMember[]> {
  const rows = await db
    .select({
      id: staff.id,
      displayName: staff.displayName,
      email: staff.email,
      role: staff.role,
      departmentId: departments.id,
      departmentName: departments.name,
      lastSignInAt: staff.lastSignInAt,
    })
    .from(staff)
    .leftJoin(departments, eq(departments.id, staff.departmentId))
    .where(and(eq(staff.schoolId, schoolId), isNull(staff.removedAt)))
    .orderBy(asc(staff.displayName));
  return rows.map(toStaffMember);
}

export async function findStaffMember(db: Pick<Db, "select">, schoolId: string, id: string) {
  const [row] = await db
    .select({ id: staff.id, role: staff.role, displayName: staff.displayName, departmentId: staff.departmentId })
    .from(staff)
    .where(and(eq(staff.id, id), eq(staff.schoolId, schoolId), isNull(staff.removedAt)));
  return row;
}

/** The school's department with this id, or undefined (another school's counts as unknown). */
export async function findDepartment(db: Pick<Db, "select">, schoolId: string, id: string) {
  const [row] = await db
    .select({ id: departments.id })
    .from(departments)
    .where(and(eq(departments.id, id), eq(departments.schoolId, schoolId)));
  return row;
}

export function toStaffMember(row: {
  id: string;
  displayName: string;
  email: string;
  role: StaffRole;
  departmentId: string | null;
  departmentName: string | null;
  lastSignInAt: Date | null;
}): StaffMember {
  return {
    id: row.id,
    displayName: row.displayName,
    email: row.email,
    role: row.role,
    department: row.departmentId && row.departmentName ? { id: row.departmentId, name: row.departmentName } : null,
    lastSignInAt: row.lastSignInAt?.toISOString() ?? null,
  };
}
