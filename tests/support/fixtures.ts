/**
 * Invented people and classes for integration tests: two schools, so that nothing leaks
 * across a school boundary, and in the first school every role.
 */
import type { Db } from "../../server/db/client";
import { classes, departments, rosterEntries, schools, staff, staffInvitations } from "../../server/db/schema";
import { hashToken } from "../../server/invitations/invitations.service";
import type { StaffRole } from "../../server/contracts/staff-roles";

export const PEOPLE = {
  teacherA: { email: "ada.quill@northfen.example", name: "Ada Quill", role: "teacher" },
  teacherB: { email: "bram.otter@northfen.example", name: "Bram Otter", role: "teacher" },
  head: { email: "cora.vane@northfen.example", name: "Cora Vane", role: "head_of_department" },
  admin: { email: "dov.marsh@northfen.example", name: "Dov Marsh", role: "admin" },
  /** Head of another department in the same school. */
  otherHead: { email: "eli.brook@northfen.example", name: "Eli Brook", role: "head_of_department" },
  /** A teacher at another school. */
  elsewhere: { email: "fay.lorne@southmere.example", name: "Fay Lorne", role: "teacher" },
  /** A teacher whose access tests remove. */
  leaver: { email: "hal.finch@northfen.example", name: "Hal Finch", role: "teacher" },
} as const satisfies Record<string, { email: string; name: string; role: StaffRole }>;
export type PersonKey = keyof typeof PEOPLE;

/** Signs in fine at the provider but was never invited to a school. */
export const OUTSIDER = { email: "gil.rowan@nowhere.example", name: "Gil Rowan" } as const;

export interface Fixture {
  schoolId: string;
  departmentId: string;
  staffIds: Record<PersonKey, string>;
  /** Teacher A's class, with a three-name roster. */
  classA: string;
  /** Teacher B's class (same department). */
  classB: string;
  /** A class at the other school. */
  classElsewhere: string;
  /** The Mathematics department of the first school. */
  mathsId: string;
  /** An open invitation to the first school, sent by the admin (its link's token is FIXTURE_INVITATION_TOKEN). */
  invitationId: string;
}

export const FIXTURE_INVITATION_TOKEN = "fixture-invitation-token-0123456789abcdef";

export async function seedFixture(db: Db): Promise<Fixture> {
  const [school] = await db.insert(schools).values({ name: "Northfen School" }).returning();
  const [other] = await db.insert(schools).values({ name: "Southmere College" }).returning();
  const [science] = await db.insert(departments).values({ schoolId: school!.id, name: "Science" }).returning();
  const [maths] = await db.insert(departments).values({ schoolId: school!.id, name: "Mathematics" }).returning();
  const [otherScience] = await db.insert(departments).values({ schoolId: other!.id, name: "Science" }).returning();

  const placement: Record<PersonKey, { schoolId: string; departmentId: string | null }> = {
    teacherA: { schoolId: school!.id, departmentId: science!.id },
    teacherB: { schoolId: school!.id, departmentId: science!.id },
    head: { schoolId: school!.id, departmentId: science!.id },
    admin: { schoolId: school!.id, departmentId: null },
    otherHead: { schoolId: school!.id, departmentId: maths!.id },
    elsewhere: { schoolId: other!.id, departmentId: otherScience!.id },
    leaver: { schoolId: school!.id, departmentId: science!.id },
  };
  const staffIds = {} as Record<PersonKey, string>;
  for (const key of Object.keys(PEOPLE) as PersonKey[]) {
    const p = PEOPLE[key];
    const [row] = await db
      .insert(staff)
      .values({ ...placement[key], email: p.email, displayName: p.name, role: p.role })
      .returning({ id: staff.id });
    staffIds[key] = row!.id;
  }
  const addClass = async (teacher: PersonKey, name: string) => {
    const [row] = await db
      .insert(classes)
      .values({
        schoolId: placement[teacher].schoolId,
        departmentId: placement[teacher].departmentId!,
        teacherId: staffIds[teacher],
        name,
        yearGroup: "Year 11",
        subject: "Physics",
      })
      .returning({ id: classes.id });
    return row!.id;
  };
  const classA = await addClass("teacherA", "11X Physics");
  const classB = await addClass("teacherB", "11Y Physics");
  const classElsewhere = await addClass("elsewhere", "11Z Physics");
  await db.insert(rosterEntries).values(
    ["Iris P.", "Jude K.", "Kofi M."].map((displayName, position) => ({ classId: classA, displayName, position })),
  );
  const [invitation] = await db
    .insert(staffInvitations)
    .values({
      schoolId: school!.id,
      departmentId: science!.id,
      email: "ivo.penn@northfen.example",
      displayName: "Ivo Penn",
      role: "teacher",
      tokenHash: hashToken(FIXTURE_INVITATION_TOKEN),
      invitedByStaffId: staffIds.admin,
      expiresAt: new Date(Date.now() + 14 * 24 * 60 * 60 * 1000),
    })
    .returning({ id: staffInvitations.id });
  return {
    schoolId: school!.id,
    departmentId: science!.id,
    mathsId: maths!.id,
    staffIds,
    classA,
    classB,
    classElsewhere,
    invitationId: invitation!.id,
  };
}
