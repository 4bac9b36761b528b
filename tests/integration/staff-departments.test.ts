/**
 * The school admin moves a member of staff to another department or to none: it applies at the
 * person's next request and reaches their open tabs, is audited, leaves their classes where they
 * were made, and keeps every head of department in a department.
 */
import { and, eq, ne } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { SessionInfo } from "../../server/contracts/session";
import type { StaffMember } from "../../server/contracts/staff";
import { auditEvents, classes, departments, staff } from "../../server/db/schema";
import { PEOPLE, seedFixture, type PersonKey } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let admin: HttpAgent;

beforeAll(async () => {
  admin = new HttpAgent(ctx.stack.url);
  await signIn(admin, PEOPLE.admin.email);
});
afterAll(() => pool.closeAll());

const patch = <T>(agent: HttpAgent, who: PersonKey, json: unknown) =>
  agent.json<T>(`/api/staff/${ctx.fixture.staffIds[who]}`, { method: "PATCH", json });

async function rowOf(who: PersonKey) {
  const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds[who]));
  return row!;
}

const auditFor = (who: PersonKey, action: string) =>
  ctx.database.db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.subjectId, ctx.fixture.staffIds[who]), eq(auditEvents.action, action)));

describe("an admin moving staff between departments", () => {
  it("moves a teacher to Mathematics: their session shows it at once, their tabs are told, it is audited, and their class stays in Science", async () => {
    const teacher = new HttpAgent(ctx.stack.url);
    await signIn(teacher, PEOPLE.teacherB.email);
    expect((await teacher.json<SessionInfo>("/api/session")).body.user?.department?.name).toBe("Science");
    const socket = await pool.open({ agent: teacher });
    const told = new Promise<void>((resolve) => socket.once("session:changed", resolve));

    const { status, body } = await patch<StaffMember>(admin, "teacherB", { departmentId: ctx.fixture.mathsId });
    expect(status).toBe(200);
    expect(body.department).toEqual({ id: ctx.fixture.mathsId, name: "Mathematics" });
    expect(body.role).toBe("teacher");
    await told;

    const me = (await teacher.json<SessionInfo>("/api/session")).body.user;
    expect(me?.department).toEqual({ id: ctx.fixture.mathsId, name: "Mathematics" });

    const audit = await auditFor("teacherB", "staff.department_changed");
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({
      actorStaffId: ctx.fixture.staffIds.admin,
      detail: { from: ctx.fixture.departmentId, to: ctx.fixture.mathsId },
    });
    // Only the department changed: no role row.
    expect(await auditFor("teacherB", "staff.role_changed")).toHaveLength(0);

    // The class keeps the department it was made in: Science's head still reads it, Mathematics' head does not.
    const [cls] = await ctx.database.db.select().from(classes).where(eq(classes.id, ctx.fixture.classB));
    expect(cls!.departmentId).toBe(ctx.fixture.departmentId);
    const scienceHead = new HttpAgent(ctx.stack.url);
    await signIn(scienceHead, PEOPLE.head.email);
    expect((await scienceHead.get(`/api/classes/${ctx.fixture.classB}`)).status).toBe(200);
    const mathsHead = new HttpAgent(ctx.stack.url);
    await signIn(mathsHead, PEOPLE.otherHead.email);
    expect((await mathsHead.get(`/api/classes/${ctx.fixture.classB}`)).status).toBe(404);
  });

  it("saving the department someone is already in changes nothing and writes no audit row", async () => {
    const { status } = await patch<StaffMember>(admin, "teacherA", { departmentId: ctx.fixture.departmentId.toUpperCase() });
    expect(status).toBe(200);
    expect(await auditFor("teacherA", "staff.department_changed")).toHaveLength(0);
    expect((await rowOf("teacherA")).departmentId).toBe(ctx.fixture.departmentId);
  });

  it("moves a teacher to no department", async () => {
    const { status, body } = await patch<StaffMember>(admin, "teacherB", { departmentId: null });
    expect(status).toBe(200);
    expect(body.department).toBeNull();
    expect((await rowOf("teacherB")).departmentId).toBeNull();
    const audit = await auditFor("teacherB", "staff.department_changed");
    expect(audit.map((a) => a.detail)).toContainEqual({ from: ctx.fixture.mathsId, to: null });
  });

  it("will not leave a head of department without a department, unless their role changes in the same request", async () => {
    const refused = await patch<ApiErrorBody>(admin, "head", { departmentId: null });
    expect(refused.status).toBe(400);
    expect(refused.body.error.code).toBe("validation_failed");
    expect(refused.body.error.fields?.departmentId?.[0]).toMatch(/head of department must keep a department/);
    expect((await rowOf("head")).departmentId).toBe(ctx.fixture.departmentId);
    expect(await auditFor("head", "staff.department_changed")).toHaveLength(0);

    const stepsDown = await patch<StaffMember>(admin, "head", { role: "teacher", departmentId: null });
    expect(stepsDown.status).toBe(200);
    expect(stepsDown.body).toMatchObject({ role: "teacher", department: null });
    expect((await auditFor("head", "staff.role_changed"))[0]?.detail).toEqual({ from: "head_of_department", to: "teacher" });
    expect((await auditFor("head", "staff.department_changed"))[0]?.detail).toEqual({ from: ctx.fixture.departmentId, to: null });
  });

  it("makes someone without a department head only together with a department", async () => {
    const alone = await patch<ApiErrorBody>(admin, "head", { role: "head_of_department" });
    expect(alone.status).toBe(400);
    expect(alone.body.error.fields?.role?.[0]).toMatch(/department/);
    expect((await rowOf("head")).role).toBe("teacher");

    const together = await patch<StaffMember>(admin, "head", { role: "head_of_department", departmentId: ctx.fixture.mathsId });
    expect(together.status).toBe(200);
    expect(together.body).toMatchObject({ role: "head_of_department", department: { id: ctx.fixture.mathsId } });
  });

  it("refuses another school's department, an unknown one and a malformed one with a message for the department field", async () => {
    const [elsewhere] = await ctx.database.db
      .select({ id: departments.id })
      .from(departments)
      .where(ne(departments.schoolId, ctx.fixture.schoolId));
    const cases = [elsewhere!.id, "00000000-0000-4000-8000-000000000000", "Science"];
    for (const departmentId of cases) {
      const { status, body } = await patch<ApiErrorBody>(admin, "teacherA", { departmentId });
      expect(status, departmentId).toBe(400);
      expect(body.error.code).toBe("validation_failed");
      expect(body.error.fields?.departmentId).toEqual(["Choose a department from the list."]);
    }
    expect((await rowOf("teacherA")).departmentId).toBe(ctx.fixture.departmentId);
  });

  it("refuses a request that names neither a role nor a department", async () => {
    const { status, body } = await patch<ApiErrorBody>(admin, "teacherA", {});
    expect(status).toBe(400);
    expect(body.error.fields?._form?.[0]).toMatch(/role or department/);
  });

  it("refuses anyone but the school's admin, and changes nothing", async () => {
    const callers: [PersonKey, number][] = [
      ["teacherA", 403],
      ["otherHead", 403],
      ["elsewhere", 403],
    ];
    for (const [who, expected] of callers) {
      const agent = new HttpAgent(ctx.stack.url);
      await signIn(agent, PEOPLE[who].email);
      expect((await patch(agent, "teacherA", { departmentId: ctx.fixture.mathsId })).status, who).toBe(expected);
    }
    expect((await patch(new HttpAgent(ctx.stack.url), "teacherA", { departmentId: ctx.fixture.mathsId })).status).toBe(401);
    expect((await rowOf("teacherA")).departmentId).toBe(ctx.fixture.departmentId);
  });
});
