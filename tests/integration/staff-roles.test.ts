import { eq } from "drizzle-orm";
import { io as connect, type Socket } from "socket.io-client";
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import { PROTOCOL_VERSION, type ClientToServerEvents, type ServerToClientEvents } from "../../server/contracts/socket-events";
import type { StaffMember } from "../../server/contracts/staff";
import { auditEvents, staff } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
let admin: HttpAgent;

beforeAll(async () => {
  admin = new HttpAgent(ctx.stack.url);
  await signIn(admin, PEOPLE.admin.email);
});

describe("an admin managing staff roles", () => {
  it("lists only their own school's staff", async () => {
    const { status, body } = await admin.json<StaffMember[]>("/api/staff");
    expect(status).toBe(200);
    const emails = body.map((m) => m.email);
    expect(emails).toContain(PEOPLE.teacherA.email);
    expect(emails).not.toContain(PEOPLE.elsewhere.email);
  });

  it("makes a teacher head of department: it takes effect at once, their open tabs are told, and it is audited", async () => {
    const teacher = new HttpAgent(ctx.stack.url);
    await signIn(teacher, PEOPLE.teacherB.email);
    expect((await teacher.get("/api/department/classes")).status).toBe(403);
    const socket: Socket<ServerToClientEvents, ClientToServerEvents> = connect(ctx.stack.url, {
      transports: ["websocket"],
      auth: { protocol: PROTOCOL_VERSION },
      extraHeaders: { cookie: teacher.cookieHeader() },
      reconnection: false,
      forceNew: true,
    });
    await new Promise<void>((resolve, reject) => {
      socket.once("connect", resolve);
      socket.once("connect_error", reject);
    });
    const told = new Promise<void>((resolve) => socket.once("session:changed", resolve));

    const { status, body } = await admin.json<StaffMember>(`/api/staff/${ctx.fixture.staffIds.teacherB}`, {
      method: "PATCH",
      json: { role: "head_of_department" },
    });
    expect(status).toBe(200);
    expect(body.role).toBe("head_of_department");
    await told;
    socket.close();
    expect((await teacher.get("/api/department/classes")).status).toBe(200);

    const audit = await ctx.database.db.select().from(auditEvents).where(eq(auditEvents.subjectId, ctx.fixture.staffIds.teacherB));
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({
      action: "staff.role_changed",
      actorStaffId: ctx.fixture.staffIds.admin,
      detail: { from: "teacher", to: "head_of_department" },
    });
  });

  it("cannot leave the school without an admin", async () => {
    const { status, body } = await admin.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.admin}`, {
      method: "PATCH",
      json: { role: "teacher" },
    });
    expect(status).toBe(409);
    expect(body.error.code).toBe("last_admin");
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds.admin));
    expect(row!.role).toBe("admin");
  });

  it("can hand over: once a second admin exists, the first may step down", async () => {
    expect((await admin.json(`/api/staff/${ctx.fixture.staffIds.teacherA}`, { method: "PATCH", json: { role: "admin" } })).status).toBe(200);
    expect((await admin.json(`/api/staff/${ctx.fixture.staffIds.admin}`, { method: "PATCH", json: { role: "teacher" } })).status).toBe(200);
    // The change applies to the admin's own session straight away.
    expect((await admin.get("/api/staff")).status).toBe(403);
  });

  it("refuses a head of department without a department, and an unknown role", async () => {
    const newAdmin = new HttpAgent(ctx.stack.url);
    await signIn(newAdmin, PEOPLE.teacherA.email);
    const noDept = await newAdmin.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.admin}`, { method: "PATCH", json: { role: "head_of_department" } });
    expect(noDept.status).toBe(400);
    expect(noDept.body.error.fields?.role?.[0]).toMatch(/department/);
    const badRole = await newAdmin.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.teacherB}`, { method: "PATCH", json: { role: "owner" } });
    expect(badRole.status).toBe(400);
    expect(badRole.body.error.code).toBe("validation_failed");
  });

  it("cannot see or touch staff of another school", async () => {
    // Teacher A became admin above.
    const current = new HttpAgent(ctx.stack.url);
    await signIn(current, PEOPLE.teacherA.email);
    const other = await current.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.elsewhere}`, { method: "PATCH", json: { role: "admin" } });
    expect(other.status).toBe(404);
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds.elsewhere));
    expect(row!.role).toBe("teacher");
  });
});
