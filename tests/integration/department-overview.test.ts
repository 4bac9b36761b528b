/**
 * The head of department's overview against real Postgres: a handful of lessons in two
 * departments, built row by row, with results recorded through the lesson service (as the board
 * does), so the stored per-trial summaries are the ones the app writes. Every expected figure is
 * worked out by hand in the comments.
 */
import { readFileSync } from "node:fs";
import { eq, inArray, isNotNull, sql } from "drizzle-orm";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import type { DepartmentOverview } from "../../server/contracts/department-overview";
import type { ApiErrorBody } from "../../server/contracts/errors";
import type { Question } from "../../server/contracts/lessons";
import type { Db } from "../../server/db/client";
import { auditEvents, classes, lessonParticipants, lessons, predictions, trials } from "../../server/db/schema";
import { overviewCsvHeader } from "../../server/department/department-overview.service";
import { defaultParams, endLesson, recordResult } from "../../server/lessons/lessons.service";
import { projectPath } from "../../server/paths";
import { PEOPLE, seedFixture, type Fixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

const number = (quantity: string, unit: string): Question => ({
  kind: "number",
  prompt: "How much?",
  quantity,
  unit,
  askReason: true,
  askExplanation: true,
  revote: true,
});
const choice: Question = {
  kind: "choice",
  prompt: "More or less than the weight?",
  quantity: "readingRatio",
  unit: "",
  choices: [
    { label: "Less", min: null, max: 1 },
    { label: "More", min: 1, max: null },
  ],
  askReason: true,
  askExplanation: true,
  revote: true,
};

const PUPILS = ["Iris P.", "Jude K.", "Kofi M.", "Lumi R.", "Oona T.", "Pax W.", "Quill S.", "Rue D."];
const REASONS = ["It bounces off the pot, said Iris", "Heavier chains go higher, Jude thinks", "Because of the pile, says Pax"];
/** Answers with unusual decimals, so finding one in the JSON would mean an answer leaked. */
const ANSWER_VALUES = [21.75, 31.25, 18.5, 2093.5, 1212.5, 10.875, 0.9375, 44.125];

interface Made {
  fixture: Fixture;
  mathsClass: string;
  trialT1: string;
  runTrials: string[];
  lessonIds: Record<string, string>;
}
const made = {} as Made;

async function seed(db: Db): Promise<Fixture> {
  const f = await seedFixture(db);
  made.fixture = f;
  const [maths] = await db
    .insert(classes)
    .values({ schoolId: f.schoolId, departmentId: f.mathsId, teacherId: f.staffIds.otherHead, name: "9M Maths", yearGroup: "Year 9", subject: "Maths" })
    .returning({ id: classes.id });
  made.mathsClass = maths!.id;
  return f;
}

const ctx = useTestStack(seed);

let codeCounter = 0;
/** A lesson (left open so results can be recorded) with its pupils; returns the participant ids. */
async function addLesson(db: Db, key: string, classId: string, teacherId: string, startedAt: string, pupils: string[]) {
  const code = `CCCCC${"ACEFHJKMNPRTWXY"[codeCounter++]}`;
  const [lesson] = await db.insert(lessons).values({ classId, teacherId, code, startedAt: new Date(startedAt) }).returning({ id: lessons.id });
  made.lessonIds[key] = lesson!.id;
  const ids: string[] = [];
  for (const [i, displayName] of pupils.entries()) {
    const [p] = await db
      .insert(lessonParticipants)
      .values({ lessonId: lesson!.id, displayName, resumeTokenHash: `${code}-${i}` })
      .returning({ id: lessonParticipants.id });
    ids.push(p!.id);
  }
  return { lessonId: lesson!.id, pupils: ids };
}

async function addTrial(db: Db, lessonId: string, position: number, rig: "fountain" | "heap" | "scale", question: Question) {
  const [trial] = await db
    .insert(trials)
    .values({ lessonId, position, rig, params: defaultParams(rig), question, phase: "observe" })
    .returning({ id: trials.id });
  return trial!.id;
}

async function answer(db: Db, trialId: string, participantId: string, round: 1 | 2, value: number | null, choiceIndex: number | null = null, reason = "") {
  await db.insert(predictions).values({ trialId, participantId, round, clientId: crypto.randomUUID(), value, choice: choiceIndex, reason });
}

const run = (staffId: string, trialId: string, measured: Record<string, { value: number; unit: string }>) =>
  recordResult(
    ctx.database.db,
    { staffId, participant: null },
    {
      trialId,
      seed: 7,
      measured: Object.fromEntries(Object.entries(measured).map(([k, v]) => [k, { ...v, uncertainty: 0.001, basis: "test" }])),
      run: { dt: 0.001, steps: 10, simulatedSeconds: 0.01, wallSeconds: null },
    },
  );

const agents = {} as Record<"head" | "otherHead" | "teacherA" | "teacherB" | "admin", HttpAgent>;
const RANGE = "from=2026-11-02&to=2026-11-29";

beforeAll(async () => {
  const db = ctx.database.db;
  const f = ctx.fixture;
  made.lessonIds = {};
  made.runTrials = [];
  for (const key of ["head", "otherHead", "teacherA", "teacherB", "admin"] as const) {
    agents[key] = new HttpAgent(ctx.stack.url);
    await signIn(agents[key], PEOPLE[key].email);
  }
  // A class name a spreadsheet would run as a formula; class names allow it.
  const created = await agents.teacherB.post("/api/classes", { name: "=1+1", yearGroup: "Year 10", subject: "Physics" });
  expect(created.status).toBe(201);
  const formulaClass = ((await created.json()) as { id: string }).id;

  // L1, Monday 2 Nov (week of 2 Nov): teacher A, 11X, three pupils, three trials (two run).
  const l1 = await addLesson(db, "L1", f.classA, f.staffIds.teacherA, "2026-11-02T09:00:00Z", PUPILS.slice(0, 3));
  // T1: fountain rise in cm; result 0.20 m = 20 cm. 21.75 (8.75 % off, within), 31.25 (56.25 %), 18.5 (7.5 %, within).
  made.trialT1 = await addTrial(db, l1.lessonId, 1, "fountain", number("rise", "cm"));
  await answer(db, made.trialT1, l1.pupils[0]!, 1, 21.75, null, REASONS[0]);
  await answer(db, made.trialT1, l1.pupils[1]!, 1, 31.25, null, REASONS[1]);
  await answer(db, made.trialT1, l1.pupils[2]!, 1, 18.5);
  await answer(db, made.trialT1, l1.pupils[1]!, 2, 44.125); // a re-vote: not counted
  await run(f.staffIds.teacherA, made.trialT1, { rise: { value: 0.2, unit: "m" } });
  // T2: heap force in mN; result 2 N = 2000 mN. 2093.5 (4.675 %, within), 1212.5 (39.375 %).
  const t2 = await addTrial(db, l1.lessonId, 2, "heap", number("force", "mN"));
  await answer(db, t2, l1.pupils[0]!, 1, 2093.5);
  await answer(db, t2, l1.pupils[2]!, 1, 1212.5);
  await run(f.staffIds.teacherA, t2, { force: { value: 2, unit: "N" } });
  // T3: set up, never run.
  await addTrial(db, l1.lessonId, 3, "fountain", number("rise", "cm"));

  // L2, Sunday 8 Nov 23:30 UTC (still the week of 2 Nov): teacher B, 11Y, two pupils, a choice question run.
  const l2 = await addLesson(db, "L2", f.classB, f.staffIds.teacherB, "2026-11-08T23:30:00Z", PUPILS.slice(3, 5));
  const t4 = await addTrial(db, l2.lessonId, 1, "scale", choice);
  await answer(db, t4, l2.pupils[0]!, 1, null, 1, REASONS[2]);
  await run(f.staffIds.teacherB, t4, { readingRatio: { value: 3, unit: "" } });

  // L3, Monday 9 Nov 00:10 UTC (week of 9 Nov): teacher B, "=1+1", one pupil. Result 10 cm; 10.875 (8.75 %, within).
  const l3 = await addLesson(db, "L3", formulaClass, f.staffIds.teacherB, "2026-11-09T00:10:00Z", PUPILS.slice(5, 6));
  const t5 = await addTrial(db, l3.lessonId, 1, "fountain", number("rise", "cm"));
  await answer(db, t5, l3.pupils[0]!, 1, 10.875, null, REASONS[2]);
  await run(f.staffIds.teacherB, t5, { rise: { value: 0.1, unit: "m" } });

  // L4, week of 23 Nov: teacher A, 11X, nobody joined, no trials.
  await addLesson(db, "L4", f.classA, f.staffIds.teacherA, "2026-11-25T10:00:00Z", []);

  // Outside the range: the minute before it starts and the first minute after it ends.
  const before = await addLesson(db, "before", f.classA, f.staffIds.teacherA, "2026-11-01T23:59:00Z", PUPILS.slice(6, 8));
  const tb = await addTrial(db, before.lessonId, 1, "fountain", number("rise", "cm"));
  await answer(db, tb, before.pupils[0]!, 1, 0.9375);
  await run(f.staffIds.teacherA, tb, { rise: { value: 0.01, unit: "m" } });
  await addLesson(db, "after", f.classA, f.staffIds.teacherA, "2026-11-30T00:00:00Z", PUPILS.slice(6, 8));

  // The Mathematics department: one lesson, four pupils, one trial run.
  const m = await addLesson(db, "maths", made.mathsClass, f.staffIds.otherHead, "2026-11-10T11:00:00Z", ["Sol A.", "Tam B.", "Uma C.", "Vic D."]);
  const tm = await addTrial(db, m.lessonId, 1, "fountain", number("rise", "cm"));
  await answer(db, tm, m.pupils[0]!, 1, 12);
  await run(f.staffIds.otherHead, tm, { rise: { value: 0.12, unit: "m" } });

  await db.update(lessons).set({ status: "ended" });
  made.runTrials = (await db.select({ id: trials.id }).from(trials).where(isNotNull(trials.ranAt))).map((r) => r.id);
});

const errorOf = (body: unknown) => (body as ApiErrorBody).error;

describe("department overview (JSON)", () => {
  it("gives the head their own department's totals, per week, by teacher and class", async () => {
    const { status, body } = await agents.head.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    expect(status).toBe(200);
    expect(body.from).toBe("2026-11-02");
    expect(body.to).toBe("2026-11-29");
    // The school's default zone; in November London keeps GMT, so its days are UTC days.
    expect(body.timeZone).toBe("Europe/London");
    expect(body.weeks).toEqual(["2026-11-02", "2026-11-09", "2026-11-16", "2026-11-23"]);
    // L1–L4; trials run 2 + 1 + 1; pupils 3 + 2 + 1 + 0; classes 11X, 11Y, =1+1; teachers A and B.
    expect(body.totals).toEqual({ lessons: 4, trialsRun: 4, pupilsTakingPart: 6, classesActive: 3, teachersActive: 2 });
    expect(body.lessonsByTeacher).toEqual([
      { id: ctx.fixture.staffIds.teacherA, name: PEOPLE.teacherA.name, perWeek: [1, 0, 0, 1], total: 2 },
      { id: ctx.fixture.staffIds.teacherB, name: PEOPLE.teacherB.name, perWeek: [1, 1, 0, 0], total: 2 },
    ]);
    const byClass = Object.fromEntries(body.lessonsByClass.map((c) => [c.name, [c.perWeek, c.teacherName]]));
    expect(byClass).toEqual({
      "11X Physics": [[1, 0, 0, 1], PEOPLE.teacherA.name],
      "11Y Physics": [[1, 0, 0, 0], PEOPLE.teacherB.name],
      "=1+1": [[0, 1, 0, 0], PEOPLE.teacherB.name],
    });
    expect(body.pupilsPerWeek).toEqual([5, 1, 0, 0]);
    expect(body.trialsByRig).toEqual([
      { rig: "fountain", trialsRun: 2 },
      { rig: "heap", trialsRun: 1 },
      { rig: "scale", trialsRun: 1 },
    ]);
  });

  it("shows how close class predictions were, per week, from round-1 number answers only", async () => {
    const { body } = await agents.head.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    const [w1, w2, w3, w4] = body.closeness;
    // Week of 2 Nov: T1 (3 answers, 2 within, median error 0.0875) and T2 (2 answers, 1 within,
    // median (0.04675 + 0.39375) / 2 = 0.22025); the choice trial is not compared.
    // Share 3/5; median over the two trials (0.0875 + 0.22025) / 2 = 0.153875.
    expect(w1).toMatchObject({ week: "2026-11-02", trialsCompared: 2, predictions: 5 });
    expect(w1!.shareWithin10).toBeCloseTo(0.6, 12);
    expect(w1!.medianRelativeError).toBeCloseTo(0.153875, 12);
    // Week of 9 Nov: one answer, 8.75 % off.
    expect(w2).toMatchObject({ week: "2026-11-09", trialsCompared: 1, predictions: 1, shareWithin10: 1 });
    expect(w2!.medianRelativeError).toBeCloseTo(0.0875, 12);
    expect(w3).toEqual({ week: "2026-11-16", trialsCompared: 0, predictions: 0, shareWithin10: null, medianRelativeError: null });
    expect(w4).toEqual({ week: "2026-11-23", trialsCompared: 0, predictions: 0, shareWithin10: null, medianRelativeError: null });
  });

  it("never contains a pupil's name, answer, reason or id", async () => {
    const { body } = await agents.head.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    const text = JSON.stringify(body);
    for (const name of PUPILS) expect(text).not.toContain(name);
    for (const reason of REASONS) expect(text).not.toContain(reason);
    for (const value of ANSWER_VALUES) expect(text).not.toContain(String(value));
    const participantIds = (await ctx.database.db.select({ id: lessonParticipants.id }).from(lessonParticipants)).map((p) => p.id);
    expect(participantIds.length).toBeGreaterThan(0);
    for (const id of participantIds) expect(text).not.toContain(id);
    const keys = new Set<string>();
    const walk = (v: unknown) => {
      if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === "object") for (const [k, inner] of Object.entries(v)) keys.add(k), walk(inner);
    };
    walk(body);
    for (const forbidden of ["displayName", "participantId", "participants", "reason", "value", "choice", "explanation", "answers"])
      expect(keys).not.toContain(forbidden);
  });

  it("shows another head only their own department", async () => {
    const { status, body } = await agents.otherHead.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    expect(status).toBe(200);
    expect(body.totals).toEqual({ lessons: 1, trialsRun: 1, pupilsTakingPart: 4, classesActive: 1, teachersActive: 1 });
    expect(body.lessonsByClass.map((c) => c.name)).toEqual(["9M Maths"]);
  });

  it("refuses teachers and the school admin", async () => {
    for (const who of ["teacherA", "teacherB", "admin"] as const) {
      const { status, body } = await agents[who].json(`/api/department/overview?${RANGE}`);
      expect(status).toBe(403);
      expect(errorOf(body).code).toBe("forbidden");
      expect((await agents[who].get(`/api/department/overview.csv?${RANGE}`)).status).toBe(403);
    }
    expect((await new HttpAgent(ctx.stack.url).get(`/api/department/overview?${RANGE}`)).status).toBe(401);
  });

  it("answers a bad range with 400 and a message on the field", async () => {
    const backwards = await agents.head.json("/api/department/overview?from=2026-11-30&to=2026-11-01");
    expect(backwards.status).toBe(400);
    expect(errorOf(backwards.body).fields).toEqual({ to: ["The end date must be on or after the start date."] });
    const notADay = await agents.head.json("/api/department/overview?from=2026-02-30");
    expect(notADay.status).toBe(400);
    expect(errorOf(notADay.body).fields?.from?.[0]).toMatch(/real day/);
    const tooLong = await agents.head.json("/api/department/overview?from=2020-01-01&to=2026-11-29");
    expect(tooLong.status).toBe(400);
    expect(errorOf(tooLong.body).fields?.from?.[0]).toMatch(/at most 731 days/);
    // A lone start far back is checked against today as the end.
    expect((await agents.head.json("/api/department/overview?from=2019-01-01")).status).toBe(400);
    expect((await agents.head.get("/api/department/overview.csv?to=nonsense")).status).toBe(400);
  });

  it("defaults to the last 12 weeks", async () => {
    const { status, body } = await agents.head.json<DepartmentOverview>("/api/department/overview");
    expect(status).toBe(200);
    expect(body.weeks).toHaveLength(12);
    expect(body.to).toBe(new Date().toISOString().slice(0, 10));
  });
});

describe("department overview (CSV)", () => {
  it("parses back with a header carrying units, one row per week × teacher × class, formulas neutralised", async () => {
    const res = await agents.head.get(`/api/department/overview.csv?${RANGE}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe("attachment; filename=department-overview-2026-11-02-to-2026-11-29.csv");
    const text = await res.text();
    const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(overviewCsvHeader("Europe/London"));
    expect(parsed.meta.fields![0]).toBe("Week starting (Monday, Europe/London)");
    expect(parsed.meta.fields).toContain("Within 10 % of result (%)");
    expect(parsed.meta.fields).toContain("Median relative error (%)");
    const rows = parsed.data.map((r) => Object.values(r));
    expect(rows).toEqual([
      // L1: 2 trials run, 3 pupils, 5 answers, 3/5 within, median over trials 15.3875 %.
      ["2026-11-02", PEOPLE.teacherA.name, "11X Physics", "1", "2", "3", "5", "60.0", "15.4"],
      // L2: a choice question only: nothing to compare.
      ["2026-11-02", PEOPLE.teacherB.name, "11Y Physics", "1", "1", "2", "0", "", ""],
      ["2026-11-09", PEOPLE.teacherB.name, "'=1+1", "1", "1", "1", "1", "100.0", "8.8"],
      ["2026-11-23", PEOPLE.teacherA.name, "11X Physics", "1", "0", "0", "0", "", ""],
    ]);
    for (const name of PUPILS) expect(text).not.toContain(name);
    for (const reason of REASONS) expect(text).not.toContain(reason);
  });
});

describe("per-trial summaries", () => {
  it("the migration's back-fill works out the same figures as the service", async () => {
    const db = ctx.database.db;
    const columns = { id: trials.id, n: trials.summaryPredictions, within: trials.summaryWithin10, median: trials.summaryMedianRelError };
    const written = await db.select(columns).from(trials).where(inArray(trials.id, made.runTrials));
    expect(written.filter((t) => t.n !== null)).toHaveLength(5); // the choice trial has no summary
    // As before migration 0006: no summaries anywhere. Then the migration's own UPDATE.
    await db.update(trials).set({ summaryPredictions: null, summaryWithin10: null, summaryMedianRelError: null });
    const migration = readFileSync(projectPath("drizzle", "0006_department_overview.sql"), "utf8");
    const backfill = migration.split("--> statement-breakpoint").find((s) => s.includes('UPDATE "trials"'));
    expect(backfill).toBeDefined();
    await ctx.database.pool.query(backfill!);
    const filled = await db.select(columns).from(trials).where(inArray(trials.id, made.runTrials));
    const byId = new Map(filled.map((t) => [t.id, t]));
    for (const row of written) {
      const again = byId.get(row.id)!;
      expect([again.n, again.within]).toEqual([row.n, row.within]);
      if (row.median === null) expect(again.median).toBeNull();
      else expect(again.median).toBeCloseTo(row.median, 12);
    }
  });

  it("a result recorded again replaces the trial's summary", async () => {
    const db = ctx.database.db;
    await db.update(lessons).set({ status: "open" }).where(eq(lessons.id, made.lessonIds.L1!));
    // T1 again with 0.30 m = 30 cm: 21.75 (27.5 %), 31.25 (4.17 %, within), 18.5 (38.3 %): median 0.275.
    await run(ctx.fixture.staffIds.teacherA, made.trialT1, { rise: { value: 0.3, unit: "m" } });
    const [t1] = await db.select().from(trials).where(eq(trials.id, made.trialT1));
    expect(t1!.summaryPredictions).toBe(3);
    expect(t1!.summaryWithin10).toBe(1);
    expect(t1!.summaryMedianRelError).toBeCloseTo(0.275, 12);
    const { body } = await agents.head.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    // Week of 2 Nov now: 2 of 5 within; median over trials (0.275 + 0.22025) / 2 = 0.247625.
    expect(body.closeness[0]!.shareWithin10).toBeCloseTo(0.4, 12);
    expect(body.closeness[0]!.medianRelativeError).toBeCloseTo(0.247625, 12);
  });

  it("a lesson ended by its teacher keeps its count of pupils, even once their names are purged", async () => {
    const db = ctx.database.db;
    const lessonId = made.lessonIds.maths!;
    await db.update(lessons).set({ status: "open" }).where(eq(lessons.id, lessonId));
    await endLesson(db, { staffId: ctx.fixture.staffIds.otherHead, participant: null }, lessonId);
    const [ended] = await db.select().from(lessons).where(eq(lessons.id, lessonId));
    expect(ended!.participantCount).toBe(4);
    // What the retention purge does to a lesson's pupils: the names (and their answers) go.
    await db.delete(lessonParticipants).where(eq(lessonParticipants.lessonId, lessonId));
    const { body } = await agents.otherHead.json<DepartmentOverview>(`/api/department/overview?${RANGE}`);
    expect(body.totals.pupilsTakingPart).toBe(4);
    expect(body.closeness[1]).toMatchObject({ trialsCompared: 1, predictions: 1, shareWithin10: 1 });
  });
});

describe("the school's time zone", () => {
  // British Summer Time is UTC+1 from 29 March to 25 October 2026 (the IANA tz database, Europe/London).
  it("counts days and weeks in it: a lesson at 00:30 on a summer Monday in London is in that Monday's week", async () => {
    const db = ctx.database.db;
    const f = ctx.fixture;
    // Sunday 7 June 23:30 UTC = Monday 8 June 00:30 BST; Sunday 14 June 23:30 UTC = Monday 15 June 00:30 BST.
    await addLesson(db, "summer1", f.classA, f.staffIds.teacherA, "2026-06-07T23:30:00Z", []);
    await addLesson(db, "summer2", f.classA, f.staffIds.teacherA, "2026-06-14T23:30:00Z", []);
    const june = "from=2026-06-08&to=2026-06-21";

    const london = await agents.head.json<DepartmentOverview>(`/api/department/overview?${june}`);
    expect(london.body.timeZone).toBe("Europe/London");
    expect(london.body.weeks).toEqual(["2026-06-08", "2026-06-15"]);
    expect(london.body.lessonsByTeacher).toEqual([{ id: f.staffIds.teacherA, name: PEOPLE.teacherA.name, perWeek: [1, 1], total: 2 }]);

    // The admin sets the school to UTC: the first lesson is now on Sunday 7 June, before the range,
    // and the second on Sunday 14 June, in the first week.
    const changed = await agents.admin.json<{ timeZone: string }>("/api/school/time-zone", { method: "PUT", json: { timeZone: "utc" } });
    expect(changed).toEqual({ status: 200, body: { timeZone: "UTC" } });
    const utc = await agents.head.json<DepartmentOverview>(`/api/department/overview?${june}`);
    expect(utc.body.timeZone).toBe("UTC");
    expect(utc.body.lessonsByTeacher).toEqual([{ id: f.staffIds.teacherA, name: PEOPLE.teacherA.name, perWeek: [1, 0], total: 1 }]);
    const csv = await agents.head.get(`/api/department/overview.csv?${june}`);
    expect((await csv.text()).split("\r\n")[0]).toContain("Week starting (Monday, UTC)");
    const session = await agents.head.json<{ user: { school: { timeZone: string } } }>("/api/session");
    expect(session.body.user.school.timeZone).toBe("UTC");

    const [audit] = await db.select().from(auditEvents).where(eq(auditEvents.action, "school.time_zone_changed"));
    expect(audit).toMatchObject({ actorStaffId: f.staffIds.admin, detail: { from: "Europe/London", to: "UTC" } });
    expect((await agents.admin.json("/api/school/time-zone", { method: "PUT", json: { timeZone: "Europe/London" } })).status).toBe(200);
  });

  it("is the admin's to set, and only to a zone that exists", async () => {
    const bad = await agents.admin.json<ApiErrorBody>("/api/school/time-zone", { method: "PUT", json: { timeZone: "Mars/Olympus" } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields?.timeZone).toEqual(["Choose a time zone from the list."]);
    expect((await agents.head.json("/api/school/time-zone", { method: "PUT", json: { timeZone: "UTC" } })).status).toBe(403);
    expect((await agents.teacherA.json("/api/school/time-zone", { method: "PUT", json: { timeZone: "UTC" } })).status).toBe(403);
    expect((await new HttpAgent(ctx.stack.url).json("/api/school/time-zone", { method: "PUT", json: { timeZone: "UTC" } })).status).toBe(401);
    // Every zone the picker offers is one Postgres knows (so none can pass the form and fail the query).
    const known = await ctx.database.db.execute<{ name: string }>(sql`select name from pg_timezone_names`);
    const names = new Set(known.rows.map((r) => r.name.toLowerCase()));
    const missing = Intl.supportedValuesOf("timeZone").filter((z) => !names.has(z.toLowerCase()));
    expect(missing).toEqual([]);
  });
});
