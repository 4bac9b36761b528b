/**
 * The captured-mail page's data: in demo mode a school admin reads what the local SMTP server
 * caught; in production mode, and for anyone else, the page does not exist.
 */
import { describe, expect, it } from "vitest";
import type { CapturedMail } from "../../server/contracts/captured-mail";
import type { ApiErrorBody } from "../../server/contracts/errors";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { startTestStack, useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);

describe("captured mail", () => {
  it("in demo mode, lists for the admin what the local SMTP server received, newest first", async () => {
    const admin = new HttpAgent(ctx.stack.url);
    await signIn(admin, PEOPLE.admin.email);
    for (const [email, name] of [["quin.ash@northfen.example", "Quin Ash"], ["rae.bell@northfen.example", "Rae Bell"]]) {
      const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(email!));
      const sent = await admin.json("/api/invitations", {
        method: "POST",
        json: { email, displayName: name, role: "teacher", departmentId: ctx.fixture.departmentId },
      });
      expect(sent.status).toBe(201);
      await arrived;
    }

    const { status, body } = await admin.json<CapturedMail[]>("/api/dev/mail");
    expect(status).toBe(200);
    expect(body.map((m) => m.to)).toEqual([["rae.bell@northfen.example"], ["quin.ash@northfen.example"]]);
    expect(body[0]).toMatchObject({ subject: "Your invitation to Linkleap at Northfen School" });
    expect(body[0]!.from).toContain("linkleap@northfen.example");
    expect(body[0]!.text).toContain("Hello Rae Bell");
    expect(new Date(body[0]!.receivedAt).getTime()).toBeGreaterThanOrEqual(new Date(body[1]!.receivedAt).getTime());
    expect(Date.now() - new Date(body[0]!.receivedAt).getTime()).toBeLessThan(60_000);
  });

  it("is not there for a teacher (404), and asks an anonymous caller to sign in (401)", async () => {
    const teacher = new HttpAgent(ctx.stack.url);
    await signIn(teacher, PEOPLE.teacherA.email);
    const seen = await teacher.json<ApiErrorBody>("/api/dev/mail");
    expect(seen.status).toBe(404);
    expect(JSON.stringify(seen.body)).not.toContain("invitation");
    expect((await new HttpAgent(ctx.stack.url).get("/api/dev/mail")).status).toBe(401);
  });

  it("in production mode is not there at all, even for an admin", async () => {
    const production = await startTestStack(ctx.database, { demo: false });
    try {
      const admin = new HttpAgent(production.url);
      await signIn(admin, PEOPLE.admin.email);
      expect((await admin.get("/api/staff")).status).toBe(200);
      const { status, body } = await admin.json<ApiErrorBody>("/api/dev/mail");
      expect(status).toBe(404);
      expect(body.error.code).toBe("not_found");
    } finally {
      await production.close();
    }
  });
});
