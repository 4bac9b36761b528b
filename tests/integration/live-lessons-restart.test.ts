/**
 * A server restart in the middle of a prediction round: everything is in Postgres, so devices
 * reconnect on their own, rejoin with their resume tokens, find their acknowledged answers still
 * there, and keep answering.
 */
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { PupilSession, TeacherLesson } from "../../server/contracts/lessons";
import { predictions } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, ok, type ClientSocket } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacherA: HttpAgent;

beforeAll(async () => {
  teacherA = new HttpAgent(ctx.stack.url);
  await signIn(teacherA, PEOPLE.teacherA.email);
});
afterAll(() => pool.closeAll());

/** Resolves with `run()`'s result the next time the socket connects again. */
const onNextConnect = <T>(socket: ClientSocket, run: () => Promise<T>) =>
  new Promise<T>((resolve, reject) => socket.once("connect", () => run().then(resolve, reject)));

describe("a server restart mid-predict", () => {
  it("devices reconnect by themselves, rejoin with their resume tokens, keep every acknowledged prediction, and answer after the restart", async () => {
    const started = await teacherA.json<{ lessonId: string; code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
    const { lessonId, code } = started.body;
    const board = await pool.open({ agent: teacherA, reconnection: true });
    const view = await ok<TeacherLesson>(board, "lesson:watch", { lessonId });
    const trialId = view.currentTrialId!;
    await ok(board, "trial:phase", { trialId, phase: "predict" });

    const pupils = await Promise.all(
      Array.from({ length: 8 }, async (_, i) => {
        const socket = await pool.open({ reconnection: true });
        const session = await ok<PupilSession>(socket, "lesson:join", { code, name: `Pupil ${i + 1}` });
        return { socket, session, clientId: randomUUID() };
      }),
    );
    // Half answer before the restart.
    const before = pupils.slice(0, 4);
    const acks = await Promise.all(
      before.map((p, i) => ok<{ clientId: string; storedAt: string }>(p.socket, "prediction:submit", { trialId, round: 1, clientId: p.clientId, value: 10 + i })),
    );

    const rejoined = pupils.map((p) =>
      onNextConnect(p.socket, () => ok<PupilSession>(p.socket, "lesson:join", { code, resumeToken: p.session.participant.resumeToken })),
    );
    const rewatched = onNextConnect(board, () => ok<TeacherLesson>(board, "lesson:watch", { lessonId }));
    await ctx.stack.restartApp({ abrupt: true });

    const sessions = await Promise.all(rejoined);
    sessions.forEach((s, i) => expect(s.participant.id).toBe(pupils[i]!.session.participant.id));
    // Each device sees its own acknowledged answer, kept through the restart.
    sessions.slice(0, 4).forEach((s, i) =>
      expect(s.mine.predictions).toEqual([{ trialId, round: 1, clientId: before[i]!.clientId, value: 10 + i, choice: null, reason: "" }]),
    );
    sessions.slice(4).forEach((s) => expect(s.mine.predictions).toEqual([]));
    expect(sessions[0]!.lesson.trial).toMatchObject({ id: trialId, phase: "predict", answered: { 1: 4, 2: 0 } });
    const boardView = await rewatched;
    expect(boardView.trials[0]!.predictions).toHaveLength(4);

    // Resends of answers made before the restart are acknowledged as stored; new ones are taken.
    const resent = await Promise.all(
      before.map((p, i) => ok<{ clientId: string; storedAt: string }>(p.socket, "prediction:submit", { trialId, round: 1, clientId: p.clientId, value: 10 + i })),
    );
    expect(resent).toEqual(acks);
    await Promise.all(
      pupils.slice(4).map((p, i) => ok(p.socket, "prediction:submit", { trialId, round: 1, clientId: p.clientId, value: 20 + i })),
    );

    const rows = await ctx.database.db.select().from(predictions).where(eq(predictions.trialId, trialId));
    expect(rows).toHaveLength(8);
    expect(new Set(rows.map((r) => r.participantId))).toEqual(new Set(pupils.map((p) => p.session.participant.id)));
    expect(new Set(rows.map((r) => r.clientId))).toEqual(new Set(pupils.map((p) => p.clientId)));

    // The board still runs the lesson.
    expect(await ok(board, "trial:phase", { trialId, phase: "observe" })).toEqual({ phase: "observe" });
  });
});
