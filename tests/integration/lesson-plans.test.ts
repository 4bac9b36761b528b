/**
 * Lesson plans: saving with the board's own set-up checks, who sees and changes a plan (the
 * owner changes it; department colleagues read and duplicate it once shared; nobody else sees
 * it), and a live lesson started from a plan.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { LessonPlan, LessonPlanInput, LessonPlanListItem, PlanPreview } from "../../server/contracts/lesson-plans";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { lessons } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, call, codeOf, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
const agents: Record<"teacherA" | "teacherB" | "head" | "otherHead" | "elsewhere", HttpAgent> = {} as never;

beforeAll(async () => {
  for (const key of ["teacherA", "teacherB", "head", "otherHead", "elsewhere"] as const) {
    agents[key] = new HttpAgent(ctx.stack.url);
    await signIn(agents[key], PEOPLE[key].email);
  }
});
afterAll(() => pool.closeAll());

const riseQuestion = (extra: Record<string, unknown> = {}) => ({
  kind: "number",
  prompt: "How high above the rim will it rise?",
  quantity: "rise",
  unit: "cm",
  ...extra,
});

const twoTrialPlan = (extra: Partial<LessonPlanInput> = {}): LessonPlanInput => ({
  title: "  Fountain   heights ",
  summary: "Two drops.",
  shared: false,
  trials: [
    { rig: "fountain", params: { potHeight: 0.5 }, question: riseQuestion({ askExplanation: false, revote: false }) as never },
    { rig: "fountain", params: { potHeight: 1.5, linkShape: "bead-thread" }, question: riseQuestion() as never },
  ],
  ...extra,
});

async function create(agent: HttpAgent, input: unknown) {
  return agent.json<LessonPlan & ApiErrorBody>("/api/lesson-plans", { method: "POST", json: input });
}

describe("saving a plan", () => {
  it("stores the trials in order with the rig's defaults filled in, and gives each its theory value in the question's unit", async () => {
    const made = await create(agents.teacherA, twoTrialPlan());
    expect(made.status).toBe(201);
    expect(made.body.title).toBe("Fountain heights");
    expect(made.body.mine).toBe(true);
    expect(made.body.shared).toBe(false);
    expect(made.body.trials.map((t) => [t.params.potHeight, t.params.linkShape])).toEqual([
      [0.5, "rod"],
      [1.5, "bead-thread"],
    ]);
    // Defaults from the rig's schema, as the board stores a set-up.
    expect(made.body.trials[0]!.params.links).toBe(1000);
    expect(made.body.trials[0]!.question.askExplanation).toBe(false);
    expect(made.body.trials[1]!.question.askExplanation).toBe(true);
    // Steady fountain: h2/h1 = α/(1 − α − β) above the pile (Biggins & Warner, Proc. R. Soc. A 470:
    // 20130689, 2014); with the rig's default α = 0.12, β = 0 a 0.5 m drop gives 0.5 × 0.12/0.88 m
    // = 6.82 cm, less the 3 mm the rig's rim stands above the pile (sim/rigs/fountain.ts).
    const [low, high] = made.body.trials.map((t) => t.theory);
    expect(low?.unit).toBe("cm");
    expect(low!.value).toBeCloseTo((0.5 * 0.12 * 100) / 0.88 - 0.3, 6);
    expect(high!.value).toBeCloseTo((1.5 * 0.12 * 100) / 0.88 - 0.3, 6);
  });

  it("refuses a bad title, a plan with no trials, and a parameter out of range, keyed by field", async () => {
    const noTitle = await create(agents.teacherA, twoTrialPlan({ title: "   " }));
    expect(noTitle.status).toBe(400);
    expect(Object.keys(noTitle.body.error.fields!)).toEqual(["title"]);

    const longTitle = await create(agents.teacherA, twoTrialPlan({ title: "x".repeat(81) }));
    expect(longTitle.body.error.fields!.title).toBeDefined();

    const noTrials = await create(agents.teacherA, twoTrialPlan({ trials: [] }));
    expect(noTrials.status).toBe(400);
    expect(noTrials.body.error.fields!.trials).toEqual(["Add at least one trial."]);

    const bad = twoTrialPlan();
    bad.trials[1] = { ...bad.trials[1]!, params: { potHeight: 9 } };
    const badParam = await create(agents.teacherA, bad);
    expect(badParam.status).toBe(400);
    expect(Object.keys(badParam.body.error.fields!)).toEqual(["trials.1.params.potHeight"]);

    const wrongUnit = twoTrialPlan();
    wrongUnit.trials[0] = { ...wrongUnit.trials[0]!, question: riseQuestion({ unit: "N" }) as never };
    const badUnit = await create(agents.teacherA, wrongUnit);
    expect(Object.keys(badUnit.body.error.fields!)).toEqual(["trials.0.question.unit"]);
  });

  it("lets the owner reorder, change and delete a plan", async () => {
    const made = await create(agents.teacherA, twoTrialPlan({ title: "To reorder" }));
    const [first, second] = made.body.trials;
    const reordered = await agents.teacherA.json<LessonPlan>(`/api/lesson-plans/${made.body.id}`, {
      method: "PUT",
      json: { title: "Reordered", summary: "", shared: true, trials: [second, first] },
    });
    expect(reordered.status).toBe(200);
    expect(reordered.body.title).toBe("Reordered");
    expect(reordered.body.trials.map((t) => t.params.potHeight)).toEqual([1.5, 0.5]);
    expect(reordered.body.shared).toBe(true);

    const invalid = await agents.teacherA.json<ApiErrorBody>(`/api/lesson-plans/${made.body.id}`, {
      method: "PUT",
      json: { title: "Reordered", trials: [{ ...first, params: { links: 5 } }] },
    });
    expect(invalid.status).toBe(400);
    expect(Object.keys(invalid.body.error.fields!)).toEqual(["trials.0.params.links"]);

    const removed = await agents.teacherA.request(`/api/lesson-plans/${made.body.id}`, { method: "DELETE" });
    expect(removed.status).toBe(204);
    expect((await agents.teacherA.get(`/api/lesson-plans/${made.body.id}`)).status).toBe(404);
  });

  it("previews the theory for an unsaved trial, and keys its errors as the board does", async () => {
    const low = await agents.teacherA.json<PlanPreview>("/api/lesson-plans/preview", {
      method: "POST",
      json: { rig: "fountain", params: { potHeight: 1 }, question: riseQuestion() },
    });
    const high = await agents.teacherA.json<PlanPreview>("/api/lesson-plans/preview", {
      method: "POST",
      json: { rig: "fountain", params: { potHeight: 2 }, question: riseQuestion({ unit: "m" }) },
    });
    expect(low.status).toBe(200);
    expect(high.body.theory!.unit).toBe("m");
    // The same closed form (above), in the unit each question asks for.
    expect(low.body.theory!.value).toBeCloseTo((1 * 0.12 * 100) / 0.88 - 0.3, 6);
    expect(high.body.theory!.value).toBeCloseTo((2 * 0.12) / 0.88 - 0.003, 8);
    expect(low.body.shownParams.find((p) => p.key === "potHeight")?.value).toBe(1);
    const bad = await agents.teacherA.json<ApiErrorBody>("/api/lesson-plans/preview", {
      method: "POST",
      json: { rig: "fountain", params: { potHeight: 0 }, question: riseQuestion() },
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields!)).toEqual(["params.potHeight"]);
  });
});

describe("sharing", () => {
  it("a shared plan: colleagues in the department read and duplicate it but cannot change or delete it; another department cannot see it", async () => {
    const shared = await create(agents.teacherA, twoTrialPlan({ title: "Shared heights", shared: true }));
    const path = `/api/lesson-plans/${shared.body.id}`;

    const read = await agents.teacherB.json<LessonPlan>(path);
    expect(read.status).toBe(200);
    expect(read.body.mine).toBe(false);
    expect(read.body.ownerName).toBe(PEOPLE.teacherA.name);
    const listed = await agents.teacherB.json<LessonPlanListItem[]>("/api/lesson-plans");
    const item = listed.body.find((p) => p.id === shared.body.id)!;
    expect(item).toMatchObject({ mine: false, ownerName: PEOPLE.teacherA.name, trialCount: 2, rigs: ["Fountain rig"], shared: true });
    expect(item.trials[1]!.theory!.unit).toBe("cm");

    const change = await agents.teacherB.json<ApiErrorBody>(path, { method: "PUT", json: twoTrialPlan({ title: "Mine now" }) });
    expect(change.status).toBe(403);
    expect(change.body.error.code).toBe("forbidden");
    expect((await agents.teacherB.request(path, { method: "DELETE" })).status).toBe(403);
    expect((await agents.head.request(path, { method: "DELETE" })).status).toBe(403);
    expect((await agents.teacherA.json<LessonPlan>(path)).body.title).toBe("Shared heights");

    const copy = await agents.teacherB.json<LessonPlan>(`${path}/duplicate`, { method: "POST" });
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ title: "Shared heights (copy)", mine: true, shared: false, ownerName: PEOPLE.teacherB.name, copiedFromId: shared.body.id });
    expect(copy.body.trials.map((t) => t.params)).toEqual(shared.body.trials.map((t) => t.params));
    // The copy is teacher B's to change; teacher A does not see it (not shared).
    const edited = await agents.teacherB.json<LessonPlan>(`/api/lesson-plans/${copy.body.id}`, { method: "PUT", json: twoTrialPlan({ title: "Bram's heights" }) });
    expect(edited.status).toBe(200);
    expect((await agents.teacherA.get(`/api/lesson-plans/${copy.body.id}`)).status).toBe(404);

    // Another department of the same school, and another school: not found, not listed, not copyable.
    for (const outsider of [agents.otherHead, agents.elsewhere]) {
      const seen = await outsider.json<ApiErrorBody>(path);
      expect(seen.status).toBe(404);
      expect(JSON.stringify(seen.body)).not.toContain("Shared heights");
      expect((await outsider.json<LessonPlanListItem[]>("/api/lesson-plans")).body.map((p) => p.id)).not.toContain(shared.body.id);
      expect((await outsider.request(`${path}/duplicate`, { method: "POST" })).status).toBe(404);
      expect((await outsider.request(path, { method: "PUT", json: twoTrialPlan() })).status).toBe(404);
    }
  });

  it("an unshared plan is invisible to colleagues, even the head of department", async () => {
    const own = await create(agents.teacherA, twoTrialPlan({ title: "Private heights" }));
    const path = `/api/lesson-plans/${own.body.id}`;
    for (const colleague of [agents.teacherB, agents.head]) {
      expect((await colleague.get(path)).status).toBe(404);
      expect((await colleague.request(`${path}/duplicate`, { method: "POST" })).status).toBe(404);
      expect((await colleague.json<LessonPlanListItem[]>("/api/lesson-plans")).body.map((p) => p.id)).not.toContain(own.body.id);
    }
    const mine = await agents.teacherA.json<LessonPlanListItem[]>("/api/lesson-plans");
    expect(mine.body.find((p) => p.id === own.body.id)).toMatchObject({ mine: true, shared: false });
  });
});

describe("starting a lesson from a plan", () => {
  it("copies the plan's trials in order, records the plan, and the board cannot open steps the question leaves out", async () => {
    const plan = await create(agents.teacherB, twoTrialPlan({ title: "Bram's shared plan", shared: true }));
    // Teacher A starts it (shared in the department) for their own class.
    const started = await agents.teacherA.json<{ lessonId: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, {
      method: "POST",
      json: { planId: plan.body.id },
    });
    expect(started.status).toBe(201);
    const [row] = await ctx.database.db.select().from(lessons).where(eq(lessons.id, started.body.lessonId));
    expect(row).toMatchObject({ planId: plan.body.id, planTitle: "Bram's shared plan" });

    const board = await pool.open({ agent: agents.teacherA });
    const view = await ok<TeacherLesson>(board, "lesson:watch", { lessonId: started.body.lessonId });
    expect(view.trials.map((t) => [t.position, t.rig, t.params.potHeight, t.params.linkShape, t.phase])).toEqual([
      [1, "fountain", 0.5, "rod", "setup"],
      [2, "fountain", 1.5, "bead-thread", "setup"],
    ]);
    expect(view.trials.map((t) => t.question)).toEqual(plan.body.trials.map((t) => t.question));
    expect(view.currentTrialId).toBe(view.trials[0]!.id);

    // Trial 1 asks for no explanation and offers no re-vote: after the run it goes nowhere.
    const first = view.trials[0]!.id;
    await ok(board, "trial:phase", { trialId: first, phase: "predict" });
    await ok(board, "trial:phase", { trialId: first, phase: "observe" });
    expect(codeOf(await call(board, "trial:phase", { trialId: first, phase: "explain" }))).toBe("bad_request");
    expect(codeOf(await call(board, "trial:phase", { trialId: first, phase: "revote" }))).toBe("bad_request");
    // Trial 2 asks for both, as before.
    const second = view.trials[1]!.id;
    for (const phase of ["predict", "observe", "explain", "revote"]) await ok(board, "trial:phase", { trialId: second, phase });
  });

  it("refuses a plan the teacher cannot see, and a plan together with an earlier lesson", async () => {
    const own = await create(agents.teacherA, twoTrialPlan({ title: "Not for Bram" }));
    const refused = await agents.teacherB.json(`/api/classes/${ctx.fixture.classB}/lessons`, { method: "POST", json: { planId: own.body.id } });
    expect(refused.status).toBe(404);
    const both = await agents.teacherA.json<ApiErrorBody>(`/api/classes/${ctx.fixture.classA}/lessons`, {
      method: "POST",
      json: { planId: own.body.id, fromLessonId: own.body.id },
    });
    expect(both.status).toBe(400);
    expect(both.body.error.fields!.planId).toBeDefined();
  });
});
