/**
 * Running a lesson again: a new lesson can start with the trials of one of the teacher's earlier
 * lessons — set-ups and questions in order, no answers — and nobody else's.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, ok } from "../support/lesson-client";
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

async function watch(agent: HttpAgent, lessonId: string) {
  const board = await pool.open({ agent });
  return { board, view: await ok<TeacherLesson>(board, "lesson:watch", { lessonId }) };
}

describe("starting a lesson with an earlier lesson's trials", () => {
  it("copies the set-ups and questions in order, with no answers, and only from the teacher's own lessons", async () => {
    const first = await teacherA.json<{ lessonId: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
    const { board, view } = await watch(teacherA, first.body.lessonId);
    const question = { kind: "number", prompt: "How high above the rim?", quantity: "rise", unit: "mm", askReason: false, askExplanation: false, revote: true };
    await ok(board, "trial:setup", { trialId: view.currentTrialId, rig: "fountain", params: { potHeight: 1.5 }, question });
    await ok(board, "trial:add", {
      lessonId: first.body.lessonId,
      setup: { rig: "hanging", params: { span: 1 }, question: { kind: "number", prompt: "How far will it sag?", quantity: "sag", unit: "cm" } },
    });
    await ok(board, "trial:phase", { trialId: view.currentTrialId, phase: "predict" });
    await ok(board, "lesson:end", { lessonId: first.body.lessonId });

    // Another teacher cannot start from it, even for their own class; a bad id is refused.
    const theirs = await teacherB.json(`/api/classes/${ctx.fixture.classB}/lessons`, { method: "POST", json: { fromLessonId: first.body.lessonId } });
    expect(theirs.status).toBe(404);
    const bad = await teacherA.json(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: { fromLessonId: "nope" } });
    expect(bad.status).toBe(400);

    const again = await teacherA.json<{ lessonId: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, {
      method: "POST",
      json: { fromLessonId: first.body.lessonId },
    });
    expect(again.status).toBe(201);
    const { view: copy } = await watch(teacherA, again.body.lessonId);
    expect(copy.trials.map((t) => [t.position, t.rig, t.phase])).toEqual([
      [1, "fountain", "setup"],
      [2, "hanging", "setup"],
    ]);
    expect(copy.trials[0]!.params.potHeight).toBe(1.5);
    // The explanation and re-vote flags are copied as given (here: no explanation asked).
    expect(copy.trials[0]!.question).toEqual(question);
    expect(copy.trials[1]!.params.span).toBe(1);
    expect(copy.trials.every((t) => t.predictions.length === 0 && t.result === null && t.seed === null)).toBe(true);
    expect(copy.currentTrialId).toBe(copy.trials[0]!.id);
    expect(copy.code).not.toBe(view.code);
  });
});
