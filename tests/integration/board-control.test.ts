/**
 * The remote works the board's player: a request from the lesson's teacher reaches every one of
 * that teacher's devices on the lesson; a pupil's device or another teacher is refused.
 */
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { auditEvents } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, call, codeOf, joinAs, nextEvent, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacherA: HttpAgent;
let teacherB: HttpAgent;

beforeAll(async () => {
  teacherA = new HttpAgent(ctx.stack.url);
  teacherB = new HttpAgent(ctx.stack.url);
  await signIn(teacherA, PEOPLE.teacherA.email);
  await signIn(teacherB, PEOPLE.teacherB.email);
});
afterAll(() => pool.closeAll());

describe("playback on the board from the remote", () => {
  it("reaches the board from the lesson's teacher only; a pupil's device is refused and audited", async () => {
    const started = await teacherA.json<{ lessonId: string; code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
    const { lessonId, code } = started.body;
    const board = await pool.open({ agent: teacherA });
    const remote = await pool.open({ agent: teacherA });
    await ok<TeacherLesson>(board, "lesson:watch", { lessonId });
    await ok<TeacherLesson>(remote, "lesson:watch", { lessonId });
    const { socket: pupil } = await joinAs(pool, code, "Vera P.");

    let pupilHeard = false;
    pupil.on("board:controlled", () => (pupilHeard = true));
    const heard = nextEvent(board, "board:controlled");
    expect(await ok(remote, "board:control", { lessonId, action: "toggle-slow" })).toEqual({ action: "toggle-slow" });
    const [event] = await heard;
    expect(event).toEqual({ lessonId, action: "toggle-slow" });

    expect(codeOf(await call(pupil, "board:control", { lessonId, action: "replay" }))).toBe("forbidden");
    const other = await pool.open({ agent: teacherB });
    expect(codeOf(await call(other, "board:control", { lessonId, action: "replay" }))).toBe("forbidden");
    expect(codeOf(await call(remote, "board:control", { lessonId, action: "rewind-everything" }))).toBe("validation_failed");
    const refused = await ctx.database.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.action, "lesson.refused"), eq(auditEvents.subjectId, lessonId)));
    expect(refused.map((r) => (r.detail as { event: string }).event)).toEqual(["board:control", "board:control"]);
    // Pupils' devices never hear the board's controls.
    await new Promise((r) => setTimeout(r, 200));
    expect(pupilHeard).toBe(false);
  });
});
