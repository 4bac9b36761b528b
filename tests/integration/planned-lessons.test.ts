/**
 * The teacher's diary: planned lessons on home, each started in one request with its class and
 * plan; recent lessons across classes. Only the teacher's own entries, classes and usable plans.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TeacherLesson } from "../../server/contracts/lessons";
import type { PlannedLessonItem, RecentLessonItem } from "../../server/contracts/planned-lessons";
import { lessonPlans } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacherA: HttpAgent;
let teacherB: HttpAgent;
let otherHead: HttpAgent;

const inHours = (h: number) => new Date(Date.now() + h * 3600_000).toISOString();
const fountain = (potHeight: number) => ({
  rig: "fountain",
  params: { potHeight, linkShape: "rod" },
  question: { kind: "number", prompt: "How high above the rim?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: false },
});

beforeAll(async () => {
  teacherA = new HttpAgent(ctx.stack.url);
  teacherB = new HttpAgent(ctx.stack.url);
  otherHead = new HttpAgent(ctx.stack.url);
  await signIn(teacherA, PEOPLE.teacherA.email);
  await signIn(teacherB, PEOPLE.teacherB.email);
  await signIn(otherHead, PEOPLE.otherHead.email);
});
afterAll(() => pool.closeAll());

async function addPlan(owner: "teacherA" | "teacherB" | "otherHead", title: string, shared: boolean, departmentId: string) {
  const [row] = await ctx.database.db
    .insert(lessonPlans)
    .values({ schoolId: ctx.fixture.schoolId, departmentId, ownerId: ctx.fixture.staffIds[owner], title, trials: [fountain(0.8), fountain(1.6)] as never, shared })
    .returning({ id: lessonPlans.id });
  return row!.id;
}

describe("planned lessons", () => {
  it("are checked: own current class, a usable plan, a time from today on", async () => {
    const past = await teacherA.json<{ error: { fields: Record<string, string[]> } }>("/api/planned-lessons", {
      method: "POST",
      json: { classId: ctx.fixture.classA, plannedFor: new Date(Date.now() - 3 * 86_400_000).toISOString() },
    });
    expect(past.status).toBe(400);
    expect(past.body.error.fields.plannedFor?.[0]).toMatch(/passed/);

    const noTime = await teacherA.json<{ error: { fields: Record<string, string[]> } }>("/api/planned-lessons", { method: "POST", json: { classId: ctx.fixture.classA } });
    expect(noTime.status).toBe(400);
    expect(Object.keys(noTime.body.error.fields)).toEqual(["plannedFor"]);

    // Someone else's class is not found, as everywhere else.
    const theirs = await teacherA.json("/api/planned-lessons", { method: "POST", json: { classId: ctx.fixture.classB, plannedFor: inHours(20) } });
    expect(theirs.status).toBe(404);

    // A colleague's unshared plan, and a plan shared in another department, cannot be used.
    const unshared = await addPlan("teacherB", "B's own", false, ctx.fixture.departmentId);
    const elsewhere = await addPlan("otherHead", "Maths plan", true, ctx.fixture.mathsId);
    for (const planId of [unshared, elsewhere]) {
      const res = await teacherA.json<{ error: { fields: Record<string, string[]> } }>("/api/planned-lessons", {
        method: "POST",
        json: { classId: ctx.fixture.classA, planId, plannedFor: inHours(20) },
      });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.planId?.[0]).toMatch(/not found/);
    }
  });

  it("are listed soonest first for their teacher only, and start with the plan's trials in one request", async () => {
    const sharedPlan = await addPlan("teacherB", "Rise against height", true, ctx.fixture.departmentId);
    const later = await teacherA.json<PlannedLessonItem>("/api/planned-lessons", {
      method: "POST",
      json: { classId: ctx.fixture.classA, plannedFor: inHours(50) },
    });
    const sooner = await teacherA.json<PlannedLessonItem>("/api/planned-lessons", {
      method: "POST",
      json: { classId: ctx.fixture.classA, planId: sharedPlan, plannedFor: inHours(2) },
    });
    expect(later.status).toBe(201);
    expect(sooner.body).toMatchObject({ planTitle: "Rise against height", trialCount: 2, className: expect.any(String) });

    const list = await teacherA.json<PlannedLessonItem[]>("/api/planned-lessons");
    expect(list.body.map((p) => p.id)).toEqual([sooner.body.id, later.body.id]);
    expect((await teacherB.json<PlannedLessonItem[]>("/api/planned-lessons")).body).toEqual([]);

    // Nobody else can start or remove it.
    expect((await teacherB.json(`/api/planned-lessons/${sooner.body.id}/start`, { method: "POST" })).status).toBe(404);
    expect((await teacherB.json(`/api/planned-lessons/${sooner.body.id}`, { method: "DELETE" })).status).toBe(404);

    const started = await teacherA.json<{ lessonId: string; code: string }>(`/api/planned-lessons/${sooner.body.id}/start`, { method: "POST" });
    expect(started.status).toBe(201);
    const board = await pool.open({ agent: teacherA });
    const view = await ok<TeacherLesson>(board, "lesson:watch", { lessonId: started.body.lessonId });
    expect(view.trials.map((t) => [t.position, t.rig, t.params.potHeight])).toEqual([
      [1, "fountain", 0.8],
      [2, "fountain", 1.6],
    ]);
    expect(view.trials[0]!.question).toMatchObject({ unit: "cm", revote: false });

    // Started: gone from next lessons, cannot be started twice, and listed among recent lessons with the plan.
    expect((await teacherA.json<PlannedLessonItem[]>("/api/planned-lessons")).body.map((p) => p.id)).toEqual([later.body.id]);
    const again = await teacherA.json<{ error: { code: string } }>(`/api/planned-lessons/${sooner.body.id}/start`, { method: "POST" });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("already_started");
    const recent = await teacherA.json<RecentLessonItem[]>("/api/lessons/recent");
    expect(recent.body[0]).toMatchObject({ id: started.body.lessonId, status: "open", planTitle: "Rise against height", trialsRun: 0, participantCount: 0 });
    expect((await teacherB.json<RecentLessonItem[]>("/api/lessons/recent")).body.map((l) => l.id)).not.toContain(started.body.lessonId);

    // Removing takes it off the list.
    expect((await teacherA.json(`/api/planned-lessons/${later.body.id}`, { method: "DELETE" })).status).toBe(204);
    expect((await teacherA.json<PlannedLessonItem[]>("/api/planned-lessons")).body).toEqual([]);
  });

  it("a planned lesson whose plan was deleted starts with one fountain trial", async () => {
    const planId = await addPlan("teacherA", "Soon gone", false, ctx.fixture.departmentId);
    const planned = await teacherA.json<PlannedLessonItem>("/api/planned-lessons", {
      method: "POST",
      json: { classId: ctx.fixture.classA, planId, plannedFor: inHours(4) },
    });
    await ctx.database.db.delete(lessonPlans);
    const listed = await teacherA.json<PlannedLessonItem[]>("/api/planned-lessons");
    expect(listed.body.find((p) => p.id === planned.body.id)).toMatchObject({ planId: null, planTitle: null });
    const started = await teacherA.json<{ lessonId: string }>(`/api/planned-lessons/${planned.body.id}/start`, { method: "POST" });
    expect(started.status).toBe(201);
    const board = await pool.open({ agent: teacherA });
    const view = await ok<TeacherLesson>(board, "lesson:watch", { lessonId: started.body.lessonId });
    expect(view.trials.map((t) => t.rig)).toEqual(["fountain"]);
  });
});
