import { request } from "node:http";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import type { SessionInfo } from "../../server/contracts/session";
import { staff } from "../../server/db/schema";
import { OUTSIDER, PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);


const session = async (agent: HttpAgent) => (await agent.json<SessionInfo>("/api/session")).body;

describe("sign-in through the local OAuth2 provider", () => {
  it("completes the authorization-code round trip with state and PKCE, and remembers the account", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    const trace = await signIn(agent, PEOPLE.teacherA.email);

    // The app asked for the code flow, with a state value and an S256 PKCE challenge.
    expect(trace.authorizeUrl.origin).toBe(ctx.stack.providerUrl);
    expect(trace.authorizeUrl.searchParams.get("response_type")).toBe("code");
    expect(trace.authorizeUrl.searchParams.get("state")).toMatch(/.{16,}/);
    expect(trace.authorizeUrl.searchParams.get("code_challenge_method")).toBe("S256");
    expect(trace.authorizeUrl.searchParams.get("redirect_uri")).toBe(`${ctx.stack.url}/auth/google/callback`);
    // The provider's picker lists the accounts it knows.
    expect(trace.pickerHtml).toContain(PEOPLE.teacherA.name);
    expect(trace.finalLocation).toBe("/");

    const info = await session(agent);
    expect(info.user).toMatchObject({
      id: ctx.fixture.staffIds.teacherA,
      email: PEOPLE.teacherA.email,
      role: "teacher",
      school: { name: "Northfen School", timeZone: "Europe/London" },
      department: { name: "Science" },
    });
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.id, ctx.fixture.staffIds.teacherA));
    expect(row!.oauthSubject).toMatch(/^local-/);
    expect(row!.lastSignInAt).toBeInstanceOf(Date);
  });

  it("sends an account that was never invited to the 'ask your department' page, signed out", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    const trace = await signIn(agent, OUTSIDER.email);
    expect(trace.finalLocation).toBe("/sign-in/not-invited");
    const info = await session(agent);
    expect(info.user).toBeNull();
    expect(info.notice).toEqual({ kind: "not_invited", email: OUTSIDER.email });
    expect((await agent.get("/api/classes")).status).toBe(401);
  });

  it("returns to the page the teacher asked for, but never to another site", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    expect((await signIn(agent, PEOPLE.teacherB.email, { returnTo: "/classes" })).finalLocation).toBe("/classes");
    const other = new HttpAgent(ctx.stack.url);
    expect((await signIn(other, PEOPLE.teacherB.email, { returnTo: "//evil.example/x" })).finalLocation).toBe("/");
  });

  it("refuses a callback whose state does not match the one it issued", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    const trace = await signIn(agent, PEOPLE.teacherA.email, { tamperState: true });
    expect(trace.finalLocation).toBe("/sign-in");
    const info = await session(agent);
    expect(info.user).toBeNull();
    expect(info.notice).toEqual({ kind: "sign_in_failed" });
  });

  it("tells the person when they cancelled at the provider", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    const start = await agent.get("/auth/google");
    const authorizeUrl = new URL(start.headers.get("location")!);
    const form = new URLSearchParams(authorizeUrl.searchParams);
    form.set("cancel", "1");
    const cancelled = await fetch(new URL("/authorize", authorizeUrl), { method: "POST", body: form, redirect: "manual" });
    const back = await agent.get(cancelled.headers.get("location")!);
    expect(back.headers.get("location")).toBe("/sign-in");
    expect((await session(agent)).notice).toEqual({ kind: "sign_in_cancelled" });
  });

  it("refuses an unknown client or callback address at the provider before showing any account", async () => {
    const res = await fetch(`${ctx.stack.providerUrl}/authorize?client_id=linkleap-test&redirect_uri=${encodeURIComponent("http://evil.example/cb")}&response_type=code`);
    expect(res.status).toBe(400);
    expect(await res.text()).not.toContain(PEOPLE.teacherA.email);
  });

  it("ends the session of a removed account at its next request, and refuses it sign-in", async () => {
    const [removed] = await ctx.database.db
      .insert(staff)
      .values({ schoolId: ctx.fixture.schoolId, departmentId: ctx.fixture.departmentId, email: "hal.reed@northfen.example", displayName: "Hal Reed", role: "teacher" })
      .returning();
    const agent = new HttpAgent(ctx.stack.url);
    await signIn(agent, "hal.reed@northfen.example", { name: "Hal Reed" });
    expect((await agent.get("/api/classes")).status).toBe(200);

    await ctx.database.db.update(staff).set({ removedAt: new Date() }).where(eq(staff.id, removed!.id));
    expect((await agent.get("/api/classes")).status).toBe(401);
    expect((await session(agent)).user).toBeNull();

    const again = new HttpAgent(ctx.stack.url);
    expect((await signIn(again, "hal.reed@northfen.example", { name: "Hal Reed" })).finalLocation).toBe("/sign-in/not-invited");
  });
});

describe("the sign-in entry point", () => {
  it("moves a browser that arrived by another name for this host to the public address first", async () => {
    // Same server, reached as "localhost": the Host header is what differs.
    const { status, location } = await new Promise<{ status: number; location?: string }>((resolve, reject) => {
      const req = request(
        { host: "127.0.0.1", port: ctx.stack.port, path: "/auth/google?returnTo=%2Fclasses", headers: { host: `localhost:${ctx.stack.port}` } },
        (res) => {
          res.resume();
          resolve({ status: res.statusCode!, location: res.headers.location });
        },
      );
      req.on("error", reject);
      req.end();
    });
    expect(status).toBe(302);
    expect(location).toBe(`${ctx.stack.url}/auth/google?returnTo=%2Fclasses`);
  });
});
