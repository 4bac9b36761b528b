/**
 * Live lessons' pupil data (names pupils joined with, predictions with reasons, explanations)
 * goes with the retention purge once its lesson started before the school's cutoff, and at once
 * with "delete this class's pupil data now". So do photos of real runs (they may show pupils):
 * rows and files, while the runs measured on them keep their numbers.
 */
import { randomUUID } from "node:crypto";
import { existsSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { eq, inArray } from "drizzle-orm";
import { PNG } from "pngjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BenchPhoto, BenchRun } from "../../server/contracts/bench";
import type { PupilDataDeletion } from "../../server/contracts/retention";
import type { TeacherLesson } from "../../server/contracts/lessons";
import { benchPhotos, explanations, lessonParticipants, lessons, predictions, trials } from "../../server/db/schema";
import { createPhotoStore } from "../../server/bench/photo-store";
import { runPurge } from "../../server/retention/retention.purge";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, joinAs, ok } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacherA: HttpAgent;

beforeAll(async () => {
  teacherA = new HttpAgent(ctx.stack.url);
  await signIn(teacherA, PEOPLE.teacherA.email);
});
afterAll(() => pool.closeAll());

/** A lesson with two pupils, each with a prediction and an explanation. */
async function lessonWithAnswers(names: [string, string]) {
  const started = await teacherA.json<{ lessonId: string; code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
  const { lessonId, code } = started.body;
  const board = await pool.open({ agent: teacherA });
  const trialId = (await ok<TeacherLesson>(board, "lesson:watch", { lessonId })).currentTrialId!;
  const pupils = await Promise.all(names.map((n) => joinAs(pool, code, n)));
  await ok(board, "trial:phase", { trialId, phase: "predict" });
  for (const p of pupils) await ok(p.socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 5, reason: "A reason" });
  await ok(board, "trial:phase", { trialId, phase: "observe" });
  await ok(board, "trial:phase", { trialId, phase: "explain" });
  for (const p of pupils) await ok(p.socket, "explanation:submit", { trialId, clientId: randomUUID(), text: "Because it is pushed." });
  await ok(board, "lesson:end", { lessonId });
  return lessonId;
}

async function countsFor(lessonId: string) {
  const db = ctx.database.db;
  const trialIds = (await db.select({ id: trials.id }).from(trials).where(eq(trials.lessonId, lessonId))).map((t) => t.id);
  return {
    names: (await db.select().from(lessonParticipants).where(eq(lessonParticipants.lessonId, lessonId))).length,
    predictions: (await db.select().from(predictions).where(inArray(predictions.trialId, trialIds))).length,
    explanations: (await db.select().from(explanations).where(inArray(explanations.trialId, trialIds))).length,
  };
}

describe("live lessons' pupil data and retention", () => {
  it("the purge deletes names, predictions and explanations of lessons started before the cutoff, and keeps newer ones", async () => {
    const old = await lessonWithAnswers(["Ola A.", "Pim B."]);
    const recent = await lessonWithAnswers(["Quin C.", "Rae D."]);
    // The old lesson was a year ago; the school keeps data until the end of the school year.
    await ctx.database.db.update(lessons).set({ startedAt: new Date(Date.now() - 400 * 24 * 60 * 60 * 1000) }).where(eq(lessons.id, old));

    const result = await runPurge(ctx.database.db, { trigger: "manual", photos: createPhotoStore(ctx.stack.uploadsDir) });
    const mine = result.deletions.filter((d) => d.schoolId === ctx.fixture.schoolId);
    expect(Object.fromEntries(mine.map((d) => [d.kind, d.count]))).toEqual({
      roster_names: 0,
      lesson_predictions: 2,
      lesson_explanations: 2,
      lesson_names: 2,
      run_photos: 0,
    });
    expect(await countsFor(old)).toEqual({ names: 0, predictions: 0, explanations: 0 });
    expect(await countsFor(recent)).toEqual({ names: 2, predictions: 2, explanations: 2 });
    // The lesson itself (code, trials, what was measured) stays: it names no pupil.
    expect(await ctx.database.db.select().from(trials).where(eq(trials.lessonId, old))).toHaveLength(1);
  });

  it("deleting a class's pupil data now takes its lessons' names and answers too", async () => {
    const lessonId = await lessonWithAnswers(["Sol E.", "Tia F."]);
    const { status, body } = await teacherA.json<PupilDataDeletion>(`/api/classes/${ctx.fixture.classA}/pupil-data`, { method: "DELETE" });
    expect(status).toBe(200);
    // This lesson and the recent one from the test before: 4 pupils, 4 predictions, 4 explanations.
    expect(body.deleted).toEqual([
      { kind: "roster_names", count: 3 },
      { kind: "lesson_predictions", count: 4 },
      { kind: "lesson_explanations", count: 4 },
      { kind: "lesson_names", count: 4 },
      { kind: "run_photos", count: 0 },
    ]);
    expect(await countsFor(lessonId)).toEqual({ names: 0, predictions: 0, explanations: 0 });
  });
});

const photosPath = () => `/api/classes/${ctx.fixture.classA}/bench-photos`;
async function uploadPhoto(): Promise<BenchPhoto> {
  const png = new PNG({ width: 40, height: 30 });
  png.data.fill(180);
  const form = new FormData();
  form.append("photo", new Blob([new Uint8Array(PNG.sync.write(png))], { type: "image/png" }), "run.png");
  const res = await teacherA.request(photosPath(), { method: "POST", body: form });
  expect(res.status).toBe(201);
  return (await res.json()) as BenchPhoto;
}
const storedNameOf = async (photoId: string) =>
  (await ctx.database.db.select({ storedName: benchPhotos.storedName }).from(benchPhotos).where(eq(benchPhotos.id, photoId)))[0]?.storedName;
const fileExists = (name: string) => existsSync(join(ctx.stack.uploadsDir, name));

describe("photos of real runs and retention", () => {
  it("the purge deletes photos uploaded before the cutoff, rows and files, and keeps newer ones and the runs' numbers", async () => {
    const old = await uploadPhoto();
    const recent = await uploadPhoto();
    const oldFile = (await storedNameOf(old.id))!;
    const recentFile = (await storedNameOf(recent.id))!;
    expect([fileExists(oldFile), fileExists(recentFile)]).toEqual([true, true]);
    // A run measured on the old photo (0.5 m over 200 px; rim 400 px above the floor = 1 m; crest 56 px above = 0.14 m).
    const marks = { rim: { x: 10, y: 500 }, crest: { x: 12, y: 444 }, floor: { x: 10, y: 900 }, referenceStart: { x: 100, y: 700 }, referenceEnd: { x: 220, y: 860 } };
    const run = await teacherA.json<BenchRun>(`${photosPath()}/${old.id}/measurements`, { method: "POST", json: { marks, referenceLength: 50, referenceUnit: "cm" } });
    expect(run.status).toBe(201);
    await ctx.database.db.update(benchPhotos).set({ createdAt: new Date(Date.now() - 400 * 24 * 60 * 60 * 1000) }).where(eq(benchPhotos.id, old.id));

    const result = await runPurge(ctx.database.db, { trigger: "manual", photos: createPhotoStore(ctx.stack.uploadsDir) });
    expect(result.deletions.find((d) => d.schoolId === ctx.fixture.schoolId && d.kind === "run_photos")?.count).toBe(1);
    expect(await storedNameOf(old.id)).toBeUndefined();
    expect(fileExists(oldFile)).toBe(false);
    expect(await storedNameOf(recent.id)).toBe(recentFile);
    expect(fileExists(recentFile)).toBe(true);
    const runs = (await teacherA.json<BenchRun[]>(`/api/classes/${ctx.fixture.classA}/bench-runs`)).body;
    expect(runs.find((r) => r.id === run.body.id)).toMatchObject({ photoId: null, potHeightM: 1, riseM: 0.14 });
  });

  it("deleting a class's pupil data now takes every photo of the class, rows and files", async () => {
    const another = await uploadPhoto();
    const names = (await ctx.database.db.select({ storedName: benchPhotos.storedName }).from(benchPhotos).where(eq(benchPhotos.classId, ctx.fixture.classA))).map((r) => r.storedName);
    expect(names).toHaveLength(2); // the recent one from the test before, and this one
    const { status, body } = await teacherA.json<PupilDataDeletion>(`/api/classes/${ctx.fixture.classA}/pupil-data`, { method: "DELETE" });
    expect(status).toBe(200);
    expect(body.deleted.find((d) => d.kind === "run_photos")).toEqual({ kind: "run_photos", count: 2 });
    expect(names.filter(fileExists)).toEqual([]);
    expect(readdirSync(ctx.stack.uploadsDir)).toEqual([]);
    expect((await teacherA.request(another.url)).status).toBe(404);
  });
});
