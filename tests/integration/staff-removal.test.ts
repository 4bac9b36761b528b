/**
 * Removing a person's access: at once, on every open socket and at their next request; and a
 * removed person can be invited back.
 */
import { eq } from "drizzle-orm";
import { io as connect, type Socket } from "socket.io-client";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { SessionInfo } from "../../server/contracts/session";
import { PROTOCOL_VERSION, type ClientToServerEvents, type ServerToClientEvents } from "../../server/contracts/socket-events";
import type { StaffMember } from "../../server/contracts/staff";
import { auditEvents, classes, staff } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;
const ctx = useTestStack(seedFixture);
const sockets: ClientSocket[] = [];
let admin: HttpAgent;

beforeAll(async () => {
  admin = new HttpAgent(ctx.stack.url);
  await signIn(admin, PEOPLE.admin.email);
});
afterAll(() => {
  for (const s of sockets) s.close();
});

async function openSocket(agent: HttpAgent): Promise<ClientSocket> {
  const socket: ClientSocket = connect(ctx.stack.url, {
    transports: ["websocket"],
    auth: { protocol: PROTOCOL_VERSION },
    extraHeaders: { cookie: agent.cookieHeader() },
    reconnection: false,
    forceNew: true,
  });
  sockets.push(socket);
  await new Promise<void>((resolve, reject) => {
    socket.once("connect", resolve);
    socket.once("connect_error", reject);
  });
  return socket;
}

describe("removing a member of staff", () => {
  it("closes their open sockets at once, refuses their next request, and keeps them out", async () => {
    const laptop = new HttpAgent(ctx.stack.url);
    const phone = new HttpAgent(ctx.stack.url);
    await signIn(laptop, PEOPLE.teacherB.email);
    await signIn(phone, PEOPLE.teacherB.email);
    const laptopSocket = await openSocket(laptop);
    const phoneSocket = await openSocket(phone);
    const ended = Promise.all([laptopSocket, phoneSocket].map((s) => new Promise((resolve) => s.once("session:ended", resolve))));
    const closed = Promise.all([laptopSocket, phoneSocket].map((s) => new Promise((resolve) => s.once("disconnect", resolve))));
    expect((await laptop.get("/api/classes")).status).toBe(200);

    const removed = await admin.request(`/api/staff/${ctx.fixture.staffIds.teacherB}`, { method: "DELETE" });
    expect(removed.status).toBe(204);

    expect(await ended).toEqual([{ reason: "access_changed" }, { reason: "access_changed" }]);
    expect(await closed).toEqual(["io server disconnect", "io server disconnect"]);
    expect((await laptop.get("/api/classes")).status).toBe(401);
    expect((await phone.json<SessionInfo>("/api/session")).body.user).toBeNull();

    // Signing in again finds no account.
    const again = new HttpAgent(ctx.stack.url);
    expect((await signIn(again, PEOPLE.teacherB.email)).finalLocation).toBe("/sign-in/not-invited");

    // Off the staff list; their class stays with the school; audited.
    const list = await admin.json<StaffMember[]>("/api/staff");
    expect(list.body.map((m) => m.id)).not.toContain(ctx.fixture.staffIds.teacherB);
    const [kept] = await ctx.database.db.select().from(classes).where(eq(classes.id, ctx.fixture.classB));
    expect(kept).toBeDefined();
    const audit = await ctx.database.db.select().from(auditEvents).where(eq(auditEvents.subjectId, ctx.fixture.staffIds.teacherB));
    expect(audit.map((a) => [a.action, a.actorStaffId])).toEqual([["staff.removed", ctx.fixture.staffIds.admin]]);
  });

  it("leaves everyone else signed in", async () => {
    const colleague = new HttpAgent(ctx.stack.url);
    await signIn(colleague, PEOPLE.teacherA.email);
    const socket = await openSocket(colleague);
    let ended = false;
    socket.on("session:ended", () => (ended = true));
    expect((await admin.request(`/api/staff/${ctx.fixture.staffIds.leaver}`, { method: "DELETE" })).status).toBe(204);
    expect((await colleague.get("/api/classes")).status).toBe(200);
    expect(ended).toBe(false);
    expect(socket.connected).toBe(true);
  });

  it("an admin cannot remove themselves, so the school keeps an admin", async () => {
    const self = await admin.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.admin}`, { method: "DELETE" });
    expect(self.status).toBe(403);
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds.admin));
    expect(row!.removedAt).toBeNull();
    expect((await admin.get("/api/staff")).status).toBe(200);
  });

  it("cannot remove staff of another school, and answers 404 for them", async () => {
    const other = await admin.json<ApiErrorBody>(`/api/staff/${ctx.fixture.staffIds.elsewhere}`, { method: "DELETE" });
    expect(other.status).toBe(404);
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds.elsewhere));
    expect(row!.removedAt).toBeNull();
  });

  it("a removed person can be invited back, and returns as the same account with the new role", async () => {
    const email = PEOPLE.teacherB.email;
    const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(email));
    const invited = await admin.json("/api/invitations", {
      method: "POST",
      json: { email, displayName: PEOPLE.teacherB.name, role: "head_of_department", departmentId: ctx.fixture.departmentId },
    });
    expect(invited.status).toBe(201);
    const link = new URL(/https?:\/\/\S+\/auth\/invitation\/\S+/.exec((await arrived).text)![0]);
    const back = new HttpAgent(ctx.stack.url);
    await back.get(link.pathname);
    await signIn(back, email);
    const me = (await back.json<SessionInfo>("/api/session")).body.user;
    expect(me?.id).toBe(ctx.fixture.staffIds.teacherB);
    expect(me?.role).toBe("head_of_department");
    // Their own class is theirs again.
    expect((await back.get(`/api/classes/${ctx.fixture.classB}`)).status).toBe(200);
  });
});
