/**
 * Inviting staff, end to end: the admin's request, the message as the local SMTP server
 * received it, the link in it, and the invited person's sign-in through the OAuth round trip.
 */
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { Invitation } from "../../server/contracts/invitations";
import type { SessionInfo } from "../../server/contracts/session";
import { auditEvents, staff, staffInvitations } from "../../server/db/schema";
import type { CaughtMail } from "../../server/devstack/mail-catcher";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { freePort, startTestStack, useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
let admin: HttpAgent;

beforeAll(async () => {
  admin = new HttpAgent(ctx.stack.url);
  await signIn(admin, PEOPLE.admin.email);
});

/** Invites someone and returns the invitation and the message the SMTP server received for them. */
async function invite(input: { email: string; displayName: string; role: string; departmentId: string | null }) {
  const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(input.email));
  const { status, body } = await admin.json<Invitation>("/api/invitations", { method: "POST", json: input });
  expect(status).toBe(201);
  return { invitation: body, mail: await arrived };
}

/** The invitation link in a message's plain-text part, as a path on the app. */
function linkIn(mail: CaughtMail): string {
  const match = /https?:\/\/\S+\/auth\/invitation\/[A-Za-z0-9_-]+/.exec(mail.text);
  expect(match, "the message holds an invitation link").not.toBeNull();
  const url = new URL(match![0]);
  expect(url.origin).toBe(ctx.stack.url);
  return url.pathname;
}

async function notice(agent: HttpAgent) {
  return (await agent.json<SessionInfo>("/api/session")).body;
}

describe("inviting a member of staff", () => {
  it("sends an e-mail with a working link; the invited person signs in with the invited role and department", async () => {
    const email = "jun.reyes@northfen.example";
    const { invitation, mail } = await invite({
      email,
      displayName: "Jun Reyes",
      role: "head_of_department",
      departmentId: ctx.fixture.mathsId,
    });
    expect(invitation).toMatchObject({ email, role: "head_of_department", state: "pending", department: { name: "Mathematics" } });
    expect(invitation.lastSentAt).not.toBeNull();
    expect(invitation.invitedBy).toBe(PEOPLE.admin.name);

    // The message as the SMTP server got it: plain text and HTML, the same link in both, no pupil names.
    expect(mail.subject).toBe("Your invitation to Linkleap at Northfen School");
    expect(mail.text).toContain("Hello Jun Reyes");
    expect(mail.text).toContain("Dov Marsh has invited you to use Linkleap at Northfen School, as head of department in the Mathematics department.");
    const path = linkIn(mail);
    expect(mail.html).toContain(`${ctx.stack.url}${path}`);
    for (const pupil of ["Iris P.", "Jude K.", "Kofi M."]) expect(mail.text + mail.html).not.toContain(pupil);
    // Kept on disk by the local server too, and readable back.
    const stored = (await ctx.stack.mail.messages()).find((m) => m.id === mail.id);
    expect(stored?.text).toBe(mail.text);

    const invitee = new HttpAgent(ctx.stack.url);
    const opened = await invitee.get(path);
    expect(opened.status).toBe(302);
    expect(opened.headers.get("location")).toBe("/auth/google");
    const trace = await signIn(invitee, email, { name: "Jun Reyes" });
    expect(trace.finalLocation).toBe("/");

    const me = (await notice(invitee)).user;
    expect(me).toMatchObject({ email, displayName: "Jun Reyes", role: "head_of_department", department: { name: "Mathematics" } });
    expect((await invitee.get("/api/department/classes")).status).toBe(200);

    // No longer pending; staff list has them; the acceptance is audited.
    const pending = await admin.json<Invitation[]>("/api/invitations");
    expect(pending.body.map((i) => i.email)).not.toContain(email);
    const list = await admin.json<{ email: string }[]>("/api/staff");
    expect(list.body.map((m) => m.email)).toContain(email);
    const audit = await ctx.database.db.select().from(auditEvents).where(eq(auditEvents.subjectId, invitation.id));
    expect(audit.map((a) => a.action).sort()).toEqual(["staff.invitation_accepted", "staff.invited"]);
  });

  it("refuses a second use of the same link", async () => {
    const email = "kit.moss@northfen.example";
    const { mail } = await invite({ email, displayName: "Kit Moss", role: "teacher", departmentId: ctx.fixture.departmentId });
    const path = linkIn(mail);
    const first = new HttpAgent(ctx.stack.url);
    await first.get(path);
    await signIn(first, email, { name: "Kit Moss" });
    expect((await notice(first)).user?.role).toBe("teacher");

    const second = new HttpAgent(ctx.stack.url);
    const again = await second.get(path);
    expect(again.headers.get("location")).toBe("/sign-in");
    expect((await notice(second)).notice).toEqual({ kind: "invitation_closed", reason: "used" });
  });

  it("refuses an expired invitation, and a resent one works with its new link only", async () => {
    const email = "lena.voss@northfen.example";
    const { invitation, mail } = await invite({ email, displayName: "Lena Voss", role: "teacher", departmentId: ctx.fixture.departmentId });
    const oldPath = linkIn(mail);
    await ctx.database.db
      .update(staffInvitations)
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where(eq(staffInvitations.id, invitation.id));

    const listed = await admin.json<Invitation[]>("/api/invitations");
    expect(listed.body.find((i) => i.id === invitation.id)?.state).toBe("expired");

    const late = new HttpAgent(ctx.stack.url);
    expect((await late.get(oldPath)).headers.get("location")).toBe("/sign-in");
    expect((await notice(late)).notice).toEqual({ kind: "invitation_closed", reason: "expired" });
    // Signing in directly with the invited address does not get round the expiry.
    const direct = new HttpAgent(ctx.stack.url);
    const trace = await signIn(direct, email, { name: "Lena Voss" });
    expect(trace.finalLocation).toBe("/sign-in");
    expect(await notice(direct)).toMatchObject({ user: null, notice: { kind: "invitation_closed", reason: "expired" } });

    const resentMail = ctx.stack.mail.waitFor((m) => m.to.includes(email) && linkIn(m) !== oldPath);
    const resent = await admin.json<Invitation>(`/api/invitations/${invitation.id}/resend`, { method: "POST" });
    expect(resent.status).toBe(200);
    expect(resent.body.state).toBe("pending");
    expect(new Date(resent.body.expiresAt).getTime()).toBeGreaterThan(Date.now() + 13 * 24 * 3600 * 1000);
    const newPath = linkIn(await resentMail);

    const stale = new HttpAgent(ctx.stack.url);
    await stale.get(oldPath);
    expect((await notice(stale)).notice).toEqual({ kind: "invitation_closed", reason: "unknown" });

    const fresh = new HttpAgent(ctx.stack.url);
    expect((await fresh.get(newPath)).headers.get("location")).toBe("/auth/google");
    await signIn(fresh, email, { name: "Lena Voss" });
    expect((await notice(fresh)).user?.email).toBe(email);
  });

  it("refuses a cancelled invitation, by link or by signing in directly", async () => {
    const email = "milo.grant@northfen.example";
    const { invitation, mail } = await invite({ email, displayName: "Milo Grant", role: "teacher", departmentId: ctx.fixture.departmentId });
    expect((await admin.request(`/api/invitations/${invitation.id}`, { method: "DELETE" })).status).toBe(204);

    const viaLink = new HttpAgent(ctx.stack.url);
    await viaLink.get(linkIn(mail));
    expect((await notice(viaLink)).notice).toEqual({ kind: "invitation_closed", reason: "cancelled" });

    const direct = new HttpAgent(ctx.stack.url);
    const trace = await signIn(direct, email, { name: "Milo Grant" });
    expect(trace.finalLocation).toBe("/sign-in/not-invited");
    expect((await notice(direct)).user).toBeNull();
    const [row] = await ctx.database.db.select().from(staff).where(eq(staff.email, email));
    expect(row).toBeUndefined();

    // Cancelled means closed: it cannot be resent.
    const resend = await admin.json<ApiErrorBody>(`/api/invitations/${invitation.id}/resend`, { method: "POST" });
    expect(resend.status).toBe(409);
    expect(resend.body.error.code).toBe("invitation_closed");
  });

  it("does not let someone else use the link with their own account", async () => {
    const email = "nia.hart@northfen.example";
    const { invitation, mail } = await invite({ email, displayName: "Nia Hart", role: "teacher", departmentId: ctx.fixture.departmentId });
    const other = new HttpAgent(ctx.stack.url);
    await other.get(linkIn(mail));
    const trace = await signIn(other, "someone.else@northfen.example", { name: "Someone Else" });
    expect(trace.finalLocation).toBe("/sign-in");
    expect(await notice(other)).toMatchObject({
      user: null,
      notice: { kind: "invitation_other_account", email: "someone.else@northfen.example" },
    });
    const [row] = await ctx.database.db.select().from(staffInvitations).where(eq(staffInvitations.id, invitation.id));
    expect(row!.acceptedAt).toBeNull();
  });

  it("refuses bad invitations with a reason on the field", async () => {
    const post = (json: unknown) => admin.json<ApiErrorBody>("/api/invitations", { method: "POST", json });
    const base = { displayName: "Olu Ward", email: "olu.ward@northfen.example", role: "teacher", departmentId: ctx.fixture.departmentId };

    const current = await post({ ...base, email: PEOPLE.teacherA.email.toUpperCase() });
    expect(current.status).toBe(409);
    expect(current.body.error.code).toBe("already_staff");
    expect(current.body.error.fields?.email?.[0]).toMatch(/already on your staff list/);

    const noDepartment = await post({ ...base, departmentId: null });
    expect(noDepartment.status).toBe(400);
    expect(noDepartment.body.error.fields?.departmentId?.[0]).toMatch(/department/);

    const badEmail = await post({ ...base, email: "olu.ward" });
    expect(badEmail.status).toBe(400);
    expect(Object.keys(badEmail.body.error.fields ?? {})).toEqual(["email"]);

    // A department of another school is not one of the choices.
    const [otherSchoolDept] = await ctx.database.db.select().from(staff).where(eq(staff.email, PEOPLE.elsewhere.email));
    const foreign = await post({ ...base, departmentId: otherSchoolDept!.departmentId });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields?.departmentId).toBeDefined();

    expect((await post(base)).status).toBe(201);
    const twice = await post(base);
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe("invitation_pending");
    const open = await ctx.database.db
      .select()
      .from(staffInvitations)
      .where(and(eq(staffInvitations.email, base.email)));
    expect(open).toHaveLength(1);
  });

  it("an admin may be invited without a department", async () => {
    const { invitation } = await invite({ email: "pia.lund@northfen.example", displayName: "Pia Lund", role: "admin", departmentId: null });
    expect(invitation).toMatchObject({ role: "admin", department: null });
  });

  it("when the mail server cannot be reached, says the invitation is saved but not sent, and lists it as not sent", async () => {
    // An SMTP port nobody listens on: nodemailer's real connection fails.
    const unreachable = await startTestStack(ctx.database, { smtpPort: await freePort() });
    try {
      const agent = new HttpAgent(unreachable.url);
      await signIn(agent, PEOPLE.admin.email);
      const email = "sol.ames@northfen.example";
      const { status, body } = await agent.json<ApiErrorBody>("/api/invitations", {
        method: "POST",
        json: { email, displayName: "Sol Ames", role: "teacher", departmentId: ctx.fixture.departmentId },
      });
      expect(status).toBe(502);
      expect(body.error.code).toBe("mail_not_sent");
      expect(body.error.message).toMatch(/saved.*Resend/);
      const listed = (await agent.json<Invitation[]>("/api/invitations")).body.find((i) => i.email === email);
      expect(listed).toMatchObject({ state: "pending", lastSentAt: null });
    } finally {
      await unreachable.close();
    }
  });
});
