/**
 * The lesson review and its CSV exports against the real server and Postgres: a small lesson is
 * run through the real socket flow (three pupils, two trials, a re-vote, explanations), then the
 * review and the exports are read back as its teacher and refused to everyone else.
 */
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { PlanPreview } from "../../server/contracts/lesson-plans";
import type { LessonReview } from "../../server/contracts/lesson-review";
import type { LessonListItem, TeacherLesson } from "../../server/contracts/lessons";
import { lessons } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, joinAs, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
const agents: Record<"teacherA" | "teacherB" | "head" | "admin" | "elsewhere", HttpAgent> = {} as never;
let lessonId = "";
const trialIds: string[] = [];

const rise = (m: number) => ({ rise: { value: m, uncertainty: 0.005, unit: "m", basis: "mean over the last second" } });
const run = { dt: 0.00025, steps: 8000, simulatedSeconds: 2, wallSeconds: 1.2 };

beforeAll(async () => {
  for (const key of Object.keys(PEOPLE) as (keyof typeof PEOPLE)[]) {
    if (key === "leaver" || key === "otherHead") continue;
    agents[key] = new HttpAgent(ctx.stack.url);
    await signIn(agents[key], PEOPLE[key].email);
  }
  const started = await agents.teacherA.json<{ lessonId: string; code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
  lessonId = started.body.lessonId;
  const code = started.body.code;
  // A lesson started from a plan keeps the plan's title (plans are another part; set it here).
  await ctx.database.db.update(lessons).set({ planTitle: "Fountain: rise against drop" }).where(eq(lessons.id, lessonId));
  const teacher = await pool.open({ agent: agents.teacherA });
  const view = await ok<TeacherLesson>(teacher, "lesson:watch", { lessonId });
  const first = view.currentTrialId!;
  trialIds.push(first);

  const ana = await joinAs(pool, code, "Ana B.");
  const ben = await joinAs(pool, code, "Ben C.");
  // A display name may start with "=" (checkDisplayName allows it): the export must neutralise it.
  const eq1 = await joinAs(pool, code, "=1+1");
  const predict = (p: { socket: typeof ana.socket }, trialId: string, round: 1 | 2, value: number, reason = "") =>
    ok(p.socket, "prediction:submit", { trialId, round, clientId: randomUUID(), value, reason });

  // Trial 1: pot at 1 m, asked in cm.
  await ok(teacher, "trial:setup", { trialId: first, rig: "fountain", params: { potHeight: 1 }, question: { kind: "number", prompt: "How high above the rim?", quantity: "rise", unit: "cm" } });
  await ok(teacher, "trial:phase", { trialId: first, phase: "predict" });
  await predict(ana, first, 1, 12, "=1+1");
  await predict(ben, first, 1, -0.5, "@it falls back in");
  await predict(eq1, first, 1, 15, "The pile pushes it up, \"like a spring\", I think");
  await ok(teacher, "trial:phase", { trialId: first, phase: "observe" });
  await ok(teacher, "trial:tally", { trialId: first, round: 1, values: [10, 20] });
  await ok(teacher, "trial:result", { trialId: first, seed: 3, measured: rise(0.143), run });
  await ok(teacher, "trial:phase", { trialId: first, phase: "explain" });
  await ok(ana.socket, "explanation:submit", { trialId: first, clientId: randomUUID(), text: "=1+1 is what the pile adds." });
  await ok(ben.socket, "explanation:submit", { trialId: first, clientId: randomUUID(), text: "The links are jerked up off the pile." });
  const full = await ok<TeacherLesson>(teacher, "lesson:watch", { lessonId });
  const benExplanation = full.trials[0]!.explanations.find((e) => e.participantName === "Ben C.")!;
  await ok(teacher, "explanation:show", { explanationId: benExplanation.id, shown: true });
  await ok(teacher, "trial:phase", { trialId: first, phase: "revote" });
  await predict(ana, first, 2, 14);

  // Trial 2: pot at 1.5 m, asked in mm.
  const { trialId: second } = await ok<{ trialId: string }>(teacher, "trial:add", { lessonId, copyOf: null });
  trialIds.push(second);
  await ok(teacher, "trial:setup", { trialId: second, rig: "fountain", params: { potHeight: 1.5 }, question: { kind: "number", prompt: "And now, in mm?", quantity: "rise", unit: "mm" } });
  await ok(teacher, "trial:show", { lessonId, trialId: second });
  await ok(teacher, "trial:phase", { trialId: second, phase: "predict" });
  await predict(ben, second, 1, 210, "Higher drop, higher rise");
  await ok(teacher, "trial:phase", { trialId: second, phase: "observe" });
  await ok(teacher, "trial:result", { trialId: second, seed: 4, measured: rise(0.2), run });
  // A pupil who joins late explains without having predicted.
  await ok(teacher, "trial:phase", { trialId: second, phase: "explain" });
  const dee = await joinAs(pool, code, "Dee F.");
  await ok(dee.socket, "explanation:submit", { trialId: second, clientId: randomUUID(), text: "It falls further, so it is faster." });

  // Trial 3: set up but never run.
  const { trialId: third } = await ok<{ trialId: string }>(teacher, "trial:add", { lessonId, copyOf: null });
  trialIds.push(third);
  await ok(teacher, "trial:setup", { trialId: third, rig: "fountain", params: { potHeight: 2 }, question: { kind: "number", prompt: "From 2 m?", quantity: "rise", unit: "cm" } });
  await ok(teacher, "lesson:end", { lessonId });
});
afterAll(() => pool.closeAll());

describe("the lesson review", () => {
  it("gives the lesson's teacher every prediction with names, results and theory in the question's unit, and how close each was", async () => {
    const { status, body } = await agents.teacherA.json<LessonReview>(`/api/lessons/${lessonId}/review`);
    expect(status).toBe(200);
    expect(body.lesson).toMatchObject({ id: lessonId, className: "11X Physics", status: "ended", planTitle: "Fountain: rise against drop" });
    expect(body.participants.map((p) => p.displayName)).toEqual(["Ana B.", "Ben C.", "=1+1", "Dee F."]);
    const [t1, t2, t3] = body.trials;
    expect(t1!.shownParams.find((p) => p.key === "potHeight")).toMatchObject({ value: 1, unit: "m" });
    expect(t1!.result!.value).toBeCloseTo(14.3, 9);
    expect(t1!.result!.unit).toBe("cm");
    expect(t1!.theory!.unit).toBe("cm");
    expect(t1!.theory!.value).toBeGreaterThan(0);
    expect(t1!.predictions.map((p) => [p.pupil, p.round, p.value, p.reason])).toEqual([
      ["Ana B.", 1, 12, "=1+1"],
      ["Ben C.", 1, -0.5, "@it falls back in"],
      ["=1+1", 1, 15, 'The pile pushes it up, "like a spring", I think'],
      ["Ana B.", 2, 14, ""],
    ]);
    // Relative error (p − r)/|r| against 14.3 cm.
    const ana = t1!.predictions[0]!.closeness!;
    expect(ana.signedRelativeError).toBeCloseTo((12 - 14.3) / 14.3, 12);
    expect(ana.within10).toBe(false);
    expect(t1!.predictions[2]!.closeness!.within10).toBe(true); // 15 is 4.9 % above 14.3
    expect(t1!.predictions[3]!.closeness!.within10).toBe(true);
    // Round 1 summary counts the devices and the show of hands: −0.5, 10, 12, 15, 20.
    expect(t1!.summary[1]).toMatchObject({ count: 5, median: 12, min: -0.5, max: 20, within10: 1 });
    expect(t1!.summary[2]).toMatchObject({ count: 1, median: 14, within10: 1 });
    expect(t1!.tally[1]).toEqual({ counts: null, values: [10, 20] });
    expect(t1!.explanations.map((e) => [e.pupil, e.shown])).toEqual([
      ["Ana B.", false],
      ["Ben C.", true],
    ]);
    expect(t2!.result).toMatchObject({ unit: "mm" });
    expect(t2!.result!.value).toBeCloseTo(200, 9);
    expect(t2!.predictions[0]!.closeness!.signedRelativeError).toBeCloseTo(0.05, 12);
    // A trial never run has no result, but the theory of its set-up, as the plan editor shows it.
    expect(t3!.ranAt).toBeNull();
    expect(t3!.result).toBeNull();
    const preview = await agents.teacherA.json<PlanPreview>("/api/lesson-plans/preview", {
      method: "POST",
      json: { rig: "fountain", params: { potHeight: 2 }, question: { kind: "number", prompt: "From 2 m?", quantity: "rise", unit: "cm" } },
    });
    expect(preview.status).toBe(200);
    expect(t3!.theory).toEqual(preview.body.theory);
    expect(t3!.theory!.value).toBeGreaterThan(t1!.theory!.value); // a longer drop, a higher rise

    const ben = body.pupils.find((p) => p.displayName === "Ben C.")!;
    expect(ben.predictions.map((p) => [p.position, p.round, p.value])).toEqual([
      [1, 1, -0.5],
      [2, 1, 210],
    ]);
    expect(ben).toMatchObject({ predictionCount: 2, explanationCount: 1, comparedCount: 2, within10Count: 1 });
    expect(body.pupils.find((p) => p.displayName === "Ana B.")).toMatchObject({ predictionCount: 2, explanationCount: 1 });
  });

  it("is refused to everyone but the lesson's teacher: another teacher, another school, the head of department, an admin, signed out", async () => {
    for (const path of ["review", "exports/predictions.csv", "exports/results.csv"]) {
      const url = `/api/lessons/${lessonId}/${path}`;
      const answers = {
        anonymous: (await new HttpAgent(ctx.stack.url).request(url)).status,
        teacherB: (await agents.teacherB.request(url)).status,
        elsewhere: (await agents.elsewhere.request(url)).status,
        head: (await agents.head.request(url)).status,
        admin: (await agents.admin.request(url)).status,
        unknown: (await agents.teacherA.request(`/api/lessons/${randomUUID()}/${path}`)).status,
      };
      expect(answers).toEqual({ anonymous: 401, teacherB: 404, elsewhere: 404, head: 403, admin: 403, unknown: 404 });
      // The refusals say nothing about the lesson.
      const refusal = await (await agents.head.request(url)).text();
      expect(refusal).not.toContain("Ana B.");
      expect(refusal).not.toContain("11X");
    }
  });

  it("lists the class's lessons with their plan, trials run and pupils taking part", async () => {
    const { body } = await agents.teacherA.json<LessonListItem[]>(`/api/classes/${ctx.fixture.classA}/lessons`);
    expect(body.find((l) => l.id === lessonId)).toMatchObject({ status: "ended", planTitle: "Fountain: rise against drop", trialCount: 3, trialsRun: 2, participantCount: 4 });
  });
});

describe("the CSV exports", () => {
  it("predictions: an attachment named after class and date, units in the header, parsing back to the review's rows", async () => {
    const res = await agents.teacherA.request(`/api/lessons/${lessonId}/exports/predictions.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="11X-Physics-\d{4}-\d{2}-\d{2}-predictions\.csv"$/);
    expect(res.headers.get("cache-control")).toContain("no-store");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // UTF-8 byte order mark
    const text = new TextDecoder().decode(bytes);
    const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(
      expect.arrayContaining(["pupil", "round", "prediction (cm)", "prediction (mm)", "result (cm)", "theory (cm)", "height of the pot above the floor (m)", "relative error (%)", "within 10 %"]),
    );
    const review = (await agents.teacherA.json<LessonReview>(`/api/lessons/${lessonId}/review`)).body;
    const expected = review.trials.flatMap((t) => t.predictions.map((p) => ({ trial: String(t.position), value: String(p.value), unit: t.question.unit, round: p.round })));
    // The last row is the late joiner's explanation, with no prediction.
    expect(parsed.data).toHaveLength(expected.length + 1);
    expect(parsed.data.at(-1)).toMatchObject({ trial: "2", pupil: "Dee F.", round: "", "prediction (mm)": "", explanation: "It falls further, so it is faster.", "result (mm)": "200" });
    parsed.data.slice(0, -1).forEach((row, i) => {
      expect(row.trial).toBe(expected[i]!.trial);
      expect(row[`prediction (${expected[i]!.unit})`]).toBe(expected[i]!.value);
      expect(row.round).toBe(expected[i]!.round === 1 ? "before the run" : "re-vote");
    });
    // Text starting with a formula character comes back neutralised; numbers stay numbers.
    expect(parsed.data.map((r) => r.pupil)).toEqual(["Ana B.", "Ben C.", "'=1+1", "Ana B.", "Ben C.", "Dee F."]);
    expect(parsed.data[0]!.reason).toBe("'=1+1");
    expect(parsed.data[1]!.reason).toBe("'@it falls back in");
    expect(parsed.data[1]!["prediction (cm)"]).toBe("-0.5");
    expect(text).toContain(",-0.5,");
    expect(parsed.data[2]!.reason).toBe('The pile pushes it up, "like a spring", I think');
    // Explanations are on their pupil's rows, neutralised too.
    expect(parsed.data.map((r) => r.explanation)).toEqual(["'=1+1 is what the pile adds.", "The links are jerked up off the pile.", "", "'=1+1 is what the pile adds.", "", "It falls further, so it is faster."]);
    expect(parsed.data[0]!["result (cm)"]).toBe("14.3");
    expect(parsed.data[0]!["relative error (%)"]).toBe("-16.1"); // (12 − 14.3)/14.3 = −16.08 %
    expect(parsed.data[4]!["prediction (mm)"]).toBe("210");
    expect(parsed.data[4]!["prediction (cm)"]).toBe("");
    expect(parsed.data[4]!["within 10 %"]).toBe("yes");
  });

  it("results: one row per trial with its set-up, result and theory in the question's unit", async () => {
    const res = await agents.teacherA.request(`/api/lessons/${lessonId}/exports/results.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/-results\.csv"$/);
    const parsed = Papa.parse<Record<string, string>>(await res.text(), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const review = (await agents.teacherA.json<LessonReview>(`/api/lessons/${lessonId}/review`)).body;
    expect(parsed.data.map((r) => [r.trial, r["height of the pot above the floor (m)"], r["result (cm)"], r["result (mm)"]])).toEqual([
      ["1", "1", "14.3", ""],
      ["2", "1.5", "", "200"],
      ["3", "2", "", ""],
    ]);
    expect(Number(parsed.data[0]!["theory (cm)"])).toBeCloseTo(review.trials[0]!.theory!.value, 3);
    expect(Number(parsed.data[1]!["theory (mm)"])).toBeCloseTo(review.trials[1]!.theory!.value, 2);
    expect(parsed.data[0]).toMatchObject({ "answers before the run": "5", "median before the run (cm)": "12", "within 10 % before the run": "1", "answers in the re-vote": "1", explanations: "2" });
    // Totals only: no pupil's name in the results export.
    const text = JSON.stringify(parsed.data);
    for (const name of ["Ana B.", "Ben C.", "=1+1", "Dee F."]) expect(text).not.toContain(name);
  });
});
