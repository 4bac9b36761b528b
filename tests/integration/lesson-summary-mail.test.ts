/**
 * When a lesson ends, its teacher gets one summary e-mail through the real local SMTP server:
 * class totals and the median beside the result and the theory, never a pupil's name or answer.
 */
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, joinAs, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacher: HttpAgent;

beforeAll(async () => {
  teacher = new HttpAgent(ctx.stack.url);
  await signIn(teacher, PEOPLE.teacherA.email);
});
afterAll(() => pool.closeAll());

describe("lesson summary e-mail", () => {
  it("is sent once when the lesson ends, with totals and the class median, and no pupil names or reasons", async () => {
    const started = await teacher.json<{ lessonId: string; code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
    const { lessonId, code } = started.body;
    const board = await pool.open({ agent: teacher });
    const view = await ok<TeacherLesson>(board, "lesson:watch", { lessonId });
    const trialId = view.currentTrialId!;
    await ok(board, "trial:phase", { trialId, phase: "predict" });

    const pupils = [
      { name: "Quin V.", value: 10, reason: "a secret reason about chains" },
      { name: "Rosa W.", value: 12, reason: "" },
      { name: "Saul X.", value: 30, reason: "" },
    ];
    for (const p of pupils) {
      const { socket } = await joinAs(pool, code, p.name);
      await ok(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: p.value, choice: null, reason: p.reason });
    }
    await ok(board, "trial:phase", { trialId, phase: "observe" });
    // As the board's simulation would report it: a rise of 0.143 m.
    await ok(board, "trial:result", {
      trialId,
      seed: 7,
      measured: { rise: { value: 0.143, uncertainty: 0.008, unit: "m", basis: "test" } },
      run: { dt: 0.00025, steps: 1000, simulatedSeconds: 4, wallSeconds: 1.5 },
    });

    const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(PEOPLE.teacherA.email) && m.subject.startsWith("Lesson summary"));
    await ok(board, "lesson:end", { lessonId });
    const mail = await arrived;

    expect(mail.text).toContain("1 trial (1 run), 3 pupils took part");
    // Median of 10, 12 and 30 cm; simulation 0.143 m shown in the question's cm.
    expect(mail.text).toContain("3 answers; class median 12 cm; simulation 14.3 cm; theory");
    expect(mail.text).toContain(`${ctx.stack.url}/lessons/${lessonId}/review`);
    for (const p of pupils) {
      expect(mail.text).not.toContain(p.name);
      expect(mail.html).not.toContain(p.name);
    }
    expect(mail.text).not.toContain("secret reason");

    // Ending it again (over HTTP) sends nothing more.
    expect((await teacher.json(`/api/lessons/${lessonId}/end`, { method: "POST" })).status).toBe(200);
    await new Promise((r) => setTimeout(r, 500));
    const summaries = (await ctx.stack.mail.messages()).filter((m) => m.subject.startsWith("Lesson summary"));
    expect(summaries).toHaveLength(1);
  });
});
