/**
 * Live lessons against the real server and Postgres, through socket.io-client: every pupil's
 * answer stored exactly once, closed phases and other people's lessons refused (and audited),
 * malformed payloads stored nowhere, and the HTTP routes that start, list and end lessons.
 */
import { randomUUID } from "node:crypto";
import { and, count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { RIGS } from "../../sim";
import { LESSON_CODE_ALPHABET, LESSON_LIMITS, isLessonCode } from "../../server/contracts/lesson-rules";
import type { LessonLookup, PublicLesson, PupilSession, TeacherLesson } from "../../server/contracts/lessons";
import { auditEvents, classes, explanations, lessonParticipants, lessons, predictions, trials } from "../../server/db/schema";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { SocketPool, call, codeOf, eventually, joinAs, nextEvent, ok, type ClientSocket } from "../support/lesson-client";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);
const pool = new SocketPool(() => ctx.stack.url);
let teacherA: HttpAgent;
let teacherB: HttpAgent;
let head: HttpAgent;
let admin: HttpAgent;

beforeAll(async () => {
  teacherA = new HttpAgent(ctx.stack.url);
  teacherB = new HttpAgent(ctx.stack.url);
  head = new HttpAgent(ctx.stack.url);
  admin = new HttpAgent(ctx.stack.url);
  await signIn(teacherA, PEOPLE.teacherA.email);
  await signIn(teacherB, PEOPLE.teacherB.email);
  await signIn(head, PEOPLE.head.email);
  await signIn(admin, PEOPLE.admin.email);
});
afterAll(() => pool.closeAll());

interface Started {
  lessonId: string;
  code: string;
  trialId: string;
  teacher: ClientSocket;
}

/** Starts a lesson over HTTP and opens the teacher's board on it. */
async function startLesson(agent = teacherA, classId = ctx.fixture.classA): Promise<Started> {
  const res = await agent.json<{ lessonId: string; code: string }>(`/api/classes/${classId}/lessons`, { method: "POST", json: {} });
  expect(res.status).toBe(201);
  const teacher = await pool.open({ agent });
  const view = await ok<TeacherLesson>(teacher, "lesson:watch", { lessonId: res.body.lessonId });
  return { ...res.body, trialId: view.currentTrialId!, teacher };
}

const predictionRows = (trialId: string) => ctx.database.db.select().from(predictions).where(eq(predictions.trialId, trialId));
const refusals = (lessonId: string) =>
  ctx.database.db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.action, "lesson.refused"), eq(auditEvents.subjectId, lessonId)));

describe("starting, listing and ending lessons over HTTP", () => {
  it("only the class's own teacher starts a lesson: 401 signed out, 403 for an admin or the head of department, 404 for another teacher", async () => {
    const url = `/api/classes/${ctx.fixture.classA}/lessons`;
    expect((await new HttpAgent(ctx.stack.url).json(url, { method: "POST", json: {} })).status).toBe(401);
    expect((await admin.json(url, { method: "POST", json: {} })).status).toBe(403);
    expect((await head.json(url, { method: "POST", json: {} })).status).toBe(403);
    expect((await teacherB.json(url, { method: "POST", json: {} })).status).toBe(404);
    expect((await teacherA.json(`/api/classes/${randomUUID()}/lessons`, { method: "POST", json: {} })).status).toBe(404);
    expect((await teacherA.json(`/api/classes/not-an-id/lessons`, { method: "POST", json: {} })).status).toBe(404);
    expect((await teacherA.json(url, { method: "POST", json: { showNames: "yes" } })).status).toBe(400);
    expect(await ctx.database.db.select().from(lessons)).toHaveLength(0);

    const started = await teacherA.json<{ lessonId: string; code: string }>(url, { method: "POST", json: {} });
    expect(started.status).toBe(201);
    expect(isLessonCode(started.body.code)).toBe(true);
    const [row] = await ctx.database.db.select().from(lessons).where(eq(lessons.id, started.body.lessonId));
    expect(row).toMatchObject({ status: "open", code: started.body.code, teacherId: ctx.fixture.staffIds.teacherA, showNames: false });
    // A first trial, current, in set-up: the fountain with its default parameters stored in full.
    const [trial] = await ctx.database.db.select().from(trials).where(eq(trials.lessonId, row!.id));
    expect(row!.currentTrialId).toBe(trial!.id);
    expect(trial).toMatchObject({ rig: "fountain", phase: "setup", position: 1, params: RIGS.fountain.schema.parse({}) });
    expect(trial!.question).toEqual({ kind: "number", prompt: "How high above the rim will the chain rise?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true });
  });

  it("an archived class cannot start a lesson", async () => {
    const [archived] = await ctx.database.db
      .insert(classes)
      .values({
        schoolId: ctx.fixture.schoolId,
        departmentId: ctx.fixture.departmentId,
        teacherId: ctx.fixture.staffIds.teacherA,
        name: "10Q Physics (old)",
        yearGroup: "Year 10",
        subject: "Physics",
        archivedAt: new Date(),
      })
      .returning({ id: classes.id });
    const res = await teacherA.json(`/api/classes/${archived!.id}/lessons`, { method: "POST", json: {} });
    expect(res.status).toBe(400);
  });

  it("lists a class's lessons newest first for its teacher and the head of department, not for another teacher", async () => {
    const second = await teacherA.json<{ lessonId: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: { showNames: true } });
    const list = await teacherA.json<{ id: string; code: string; status: string; trialCount: number; participantCount: number; endedAt: string | null }[]>(
      `/api/classes/${ctx.fixture.classA}/lessons`,
    );
    expect(list.status).toBe(200);
    expect(list.body.length).toBeGreaterThanOrEqual(2);
    expect(list.body[0]!.id).toBe(second.body.lessonId);
    expect(list.body[0]).toMatchObject({ status: "open", trialCount: 1, participantCount: 0, endedAt: null });
    expect((await head.json(`/api/classes/${ctx.fixture.classA}/lessons`)).status).toBe(200);
    expect((await teacherB.json(`/api/classes/${ctx.fixture.classA}/lessons`)).status).toBe(404);
    expect((await new HttpAgent(ctx.stack.url).json(`/api/classes/${ctx.fixture.classA}/lessons`)).status).toBe(401);

    const open = await teacherA.json<{ id: string; classId: string; className: string }[]>("/api/lessons/open");
    expect(open.body.map((l) => l.id)).toContain(second.body.lessonId);
    expect(open.body.every((l) => l.className === "11X Physics" && l.classId === ctx.fixture.classA)).toBe(true);
    expect((await teacherB.json<unknown[]>("/api/lessons/open")).body).toEqual([]);
    expect((await new HttpAgent(ctx.stack.url).json("/api/lessons/open")).status).toBe(401);
  });

  it("only the lesson's teacher ends it; everyone in it is told, and its code is free again", async () => {
    const { lessonId, code, teacher } = await startLesson();
    const { socket: pupil } = await joinAs(pool, code, "Tam R.");
    const told = nextEvent(pupil, "lesson:changed", (l) => l.status === "ended");
    const boardTold = nextEvent(teacher, "lesson:teacher-changed", (l) => l.status === "ended");

    expect((await new HttpAgent(ctx.stack.url).json(`/api/lessons/${lessonId}/end`, { method: "POST" })).status).toBe(401);
    expect((await admin.json(`/api/lessons/${lessonId}/end`, { method: "POST" })).status).toBe(403);
    expect((await head.json(`/api/lessons/${lessonId}/end`, { method: "POST" })).status).toBe(403);
    expect((await teacherB.json(`/api/lessons/${lessonId}/end`, { method: "POST" })).status).toBe(404);
    expect((await teacherA.json(`/api/lessons/${randomUUID()}/end`, { method: "POST" })).status).toBe(404);
    expect((await teacherA.json(`/api/lessons/nope/end`, { method: "POST" })).status).toBe(404);
    const [still] = await ctx.database.db.select().from(lessons).where(eq(lessons.id, lessonId));
    expect(still!.status).toBe("open");

    const ended = await teacherA.json<{ status: string; endedAt: string }>(`/api/lessons/${lessonId}/end`, { method: "POST" });
    expect(ended.status).toBe(200);
    expect(ended.body.status).toBe("ended");
    const [[publicView]] = await Promise.all([told, boardTold]);
    expect(publicView.status).toBe("ended");
    // Still connected: nobody is thrown out, they are told.
    expect(pupil.connected).toBe(true);
    expect((await teacherA.json<{ id: string }[]>("/api/lessons/open")).body.map((l) => l.id)).not.toContain(lessonId);

    // Joining an ended lesson says so.
    const late = await pool.open();
    expect(codeOf(await call(late, "lesson:join", { code, name: "Uma S." }))).toBe("lesson_ended");
    // The code may be given to a new open lesson now.
    const [reused] = await ctx.database.db
      .insert(lessons)
      .values({ classId: ctx.fixture.classA, teacherId: ctx.fixture.staffIds.teacherA, code })
      .returning({ id: lessons.id });
    expect(reused).toBeDefined();
    await ctx.database.db.update(lessons).set({ status: "ended" }).where(eq(lessons.id, reused!.id));
  });
});

describe("lesson codes", () => {
  it("use only the alphabet and are unique among open lessons", async () => {
    const codes: string[] = [];
    for (let i = 0; i < 25; i++) {
      const res = await teacherA.json<{ code: string }>(`/api/classes/${ctx.fixture.classA}/lessons`, { method: "POST", json: {} });
      codes.push(res.body.code);
    }
    for (const code of codes) for (const ch of code) expect(LESSON_CODE_ALPHABET).toContain(ch);
    const open = await ctx.database.db.select({ code: lessons.code }).from(lessons).where(eq(lessons.status, "open"));
    expect(new Set(open.map((l) => l.code)).size).toBe(open.length);
    // The database itself refuses a second open lesson with a code in use.
    await expect(
      ctx.database.db.insert(lessons).values({ classId: ctx.fixture.classA, teacherId: ctx.fixture.staffIds.teacherA, code: codes[0]! }),
    ).rejects.toMatchObject({ cause: { constraint: "lessons_open_code_key" } });
  });
});

describe("pupils joining", () => {
  it("look up a code, see the roster with names already taken, pick or type a name, and a name in use is refused", async () => {
    const { code, lessonId } = await startLesson();
    const first = await pool.open();
    const lookup = await ok<LessonLookup>(first, "lesson:lookup", { code: code.toLowerCase() });
    expect(lookup.lessonId).toBe(lessonId);
    expect(lookup.className).toBe("11X Physics");
    expect(lookup.roster!.map((r) => [r.displayName, r.taken])).toEqual([
      ["Iris P.", false],
      ["Jude K.", false],
      ["Kofi M.", false],
    ]);
    const iris = lookup.roster![0]!.id;
    const session = await ok<PupilSession>(first, "lesson:join", { code, rosterEntryId: iris });
    expect(session.participant.displayName).toBe("Iris P.");
    expect(session.participant.resumeToken).toMatch(/^[A-Za-z0-9_-]{32}$/);
    // Only the token's hash is stored.
    const [row] = await ctx.database.db.select().from(lessonParticipants).where(eq(lessonParticipants.id, session.participant.id));
    expect(row!.resumeTokenHash).not.toContain(session.participant.resumeToken);
    expect(row!.resumeTokenHash).toMatch(/^[0-9a-f]{64}$/);

    const second = await pool.open();
    const again = await ok<LessonLookup>(second, "lesson:lookup", { code });
    expect(again.roster!.map((r) => [r.displayName, r.taken])).toEqual([
      ["Iris P.", true],
      ["Jude K.", false],
      ["Kofi M.", false],
    ]);
    expect(codeOf(await call(second, "lesson:join", { code, rosterEntryId: iris }))).toBe("name_taken");
    expect(codeOf(await call(second, "lesson:join", { code, name: "iris p." }))).toBe("name_taken");
    expect(codeOf(await call(second, "lesson:join", { code, name: "someone@example.com" }))).toBe("validation_failed");
    expect(codeOf(await call(second, "lesson:lookup", { code: "AAAAAA" }))).toBe("not_found");
    expect(codeOf(await call(second, "lesson:lookup", { code: "O0O0O0" }))).toBe("validation_failed");

    // The same device, with its token, is the same participant.
    const rejoined = await ok<PupilSession>(second, "lesson:join", { code, resumeToken: session.participant.resumeToken });
    expect(rejoined.participant.id).toBe(session.participant.id);
    const [{ n }] = (await ctx.database.db.select({ n: count() }).from(lessonParticipants).where(eq(lessonParticipants.lessonId, lessonId))) as [{ n: number }];
    expect(n).toBe(1);
  });
});

describe("predictions", () => {
  it("30 pupils join one lesson and predict: all 30 are stored exactly once, and the board hears of each", async () => {
    const { code, trialId, teacher } = await startLesson();
    const pupils = await Promise.all(Array.from({ length: 30 }, (_, i) => joinAs(pool, code, `Pupil ${String(i + 1).padStart(2, "0")}`)));
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });

    const added: string[] = [];
    teacher.on("prediction:added", ({ prediction }) => added.push(prediction.participantId));
    const lastCount = nextEvent(pupils[0]!.socket, "answers:counted", (p) => p.count === 30, 10_000);

    const clientIds = pupils.map(() => randomUUID());
    const acks = await Promise.all(
      pupils.map(({ socket }, i) =>
        ok<{ clientId: string; storedAt: string }>(socket, "prediction:submit", {
          trialId,
          round: 1,
          clientId: clientIds[i],
          value: 20 + i,
          reason: "The links push up off the pile.",
        }),
      ),
    );
    expect(acks.map((a) => a.clientId)).toEqual(clientIds);
    // Every device sends its answer again (say its acknowledgement was slow): still stored once, same acknowledgement.
    const resent = await Promise.all(
      pupils.map(({ socket }, i) => ok<{ clientId: string; storedAt: string }>(socket, "prediction:submit", { trialId, round: 1, clientId: clientIds[i], value: 20 + i })),
    );
    expect(resent).toEqual(acks);

    const rows = await predictionRows(trialId);
    expect(rows).toHaveLength(30);
    expect(new Set(rows.map((r) => r.participantId)).size).toBe(30);
    expect(rows.map((r) => r.value).sort((a, b) => a! - b!)).toEqual(Array.from({ length: 30 }, (_, i) => 20 + i));
    await lastCount;
    await eventually(async () => added.length === 30);
    expect(new Set(added)).toEqual(new Set(pupils.map((p) => p.session.participant.id)));
  });

  it("answering again replaces the pupil's answer for that round; the earlier one is gone", async () => {
    const { code, trialId, teacher } = await startLesson();
    const { socket, session } = await joinAs(pool, code, "Vic T.");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    await ok(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 10 });
    const second = randomUUID();
    await ok(socket, "prediction:submit", { trialId, round: 1, clientId: second, value: 15, reason: "Changed my mind." });
    const rows = await predictionRows(trialId);
    expect(rows.map((r) => [r.participantId, r.clientId, r.value, r.reason])).toEqual([[session.participant.id, second, 15, "Changed my mind."]]);
  });

  it("a late resend of a replaced answer is acknowledged and leaves the newer answer in place", async () => {
    const { code, trialId, teacher } = await startLesson();
    const { socket } = await joinAs(pool, code, "Wren A.");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    const first = randomUUID();
    const second = randomUUID();
    await ok(socket, "prediction:submit", { trialId, round: 1, clientId: first, value: 10 });
    const newer = await ok<{ clientId: string; storedAt: string }>(socket, "prediction:submit", { trialId, round: 1, clientId: second, value: 15, reason: "Changed my mind." });
    // The first answer arrives again (a resend from a device that never saw its acknowledgement).
    const ack = await ok<{ clientId: string; storedAt: string }>(socket, "prediction:submit", { trialId, round: 1, clientId: first, value: 10 });
    expect(ack).toEqual(newer);
    const rows = await predictionRows(trialId);
    expect(rows.map((r) => [r.clientId, r.value, r.reason])).toEqual([[second, 15, "Changed my mind."]]);
    // A third answer still replaces it; both earlier ids are now remembered.
    const third = randomUUID();
    await ok(socket, "prediction:submit", { trialId, round: 1, clientId: third, value: 12 });
    expect(await ok(socket, "prediction:submit", { trialId, round: 1, clientId: second, value: 15 })).toMatchObject({ clientId: third });
    expect((await predictionRows(trialId)).map((r) => [r.clientId, r.value])).toEqual([[third, 12]]);
  });

  it("a pupil whose socket drops before the acknowledgement resends with the same clientId after reconnecting: stored once", async () => {
    const { code, trialId, teacher } = await startLesson();
    const { socket, session } = await joinAs(pool, code, "Wren U.");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    const clientId = randomUUID();
    // Hold the trial row from another connection, so the server is mid-way through storing
    // the answer (waiting for the row) when the device drops off.
    const blocker = await ctx.database.pool.connect();
    let firstAck = false;
    try {
      await blocker.query("begin");
      await blocker.query("select 1 from trials where id = $1 for update", [trialId]);
      socket.emit("prediction:submit", { trialId, round: 1, clientId, value: 42, reason: "" }, () => {
        firstAck = true;
      });
      await eventually(async () => {
        const waiting = await ctx.database.pool.query("select count(*)::int as n from pg_stat_activity where wait_event_type = 'Lock'");
        return waiting.rows[0].n > 0;
      });
      socket.disconnect();
      await blocker.query("commit");
    } finally {
      blocker.release();
    }
    // The server stored it after the device had gone; the device never heard back.
    await eventually(async () => (await predictionRows(trialId)).length === 1);
    expect(firstAck).toBe(false);

    const device = await pool.open();
    const rejoined = await ok<PupilSession>(device, "lesson:join", { code, resumeToken: session.participant.resumeToken });
    expect(rejoined.participant.id).toBe(session.participant.id);
    expect(rejoined.mine.predictions).toEqual([{ trialId, round: 1, clientId, value: 42, choice: null, reason: "" }]);
    const ack = await ok<{ clientId: string }>(device, "prediction:submit", { trialId, round: 1, clientId, value: 42, reason: "" });
    expect(ack.clientId).toBe(clientId);
    expect(await predictionRows(trialId)).toHaveLength(1);
  });

  it("a late prediction, after the phase moved to observe, is refused with phase_closed; a resend of a stored one is still acknowledged", async () => {
    const { code, trialId, teacher } = await startLesson();
    const { socket } = await joinAs(pool, code, "Xan V.");
    const late = await joinAs(pool, code, "Yus W.");
    // Not yet open in set-up either.
    const early = await call(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 1 });
    expect(codeOf(early)).toBe("phase_closed");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    const onTime = randomUUID();
    const stored = await ok<{ storedAt: string }>(socket, "prediction:submit", { trialId, round: 1, clientId: onTime, value: 30 });
    await ok(teacher, "trial:phase", { trialId, phase: "observe" });

    const refused = await call(late.socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 31 });
    expect(refused).toEqual({ error: { code: "phase_closed", message: "Predictions for this trial are closed." } });
    // A resend of an answer that was stored in time gets its acknowledgement.
    expect(await ok(socket, "prediction:submit", { trialId, round: 1, clientId: onTime, value: 30 })).toEqual({ clientId: onTime, storedAt: stored.storedAt });
    // …but a changed answer is not taken any more.
    expect(codeOf(await call(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 99 }))).toBe("phase_closed");
    expect((await predictionRows(trialId)).map((r) => r.value)).toEqual([30]);
    // Round 2 only in the re-vote.
    expect(codeOf(await call(socket, "prediction:submit", { trialId, round: 2, clientId: randomUUID(), value: 33 }))).toBe("phase_closed");
  });

  it("malformed payloads get an error acknowledgement and nothing is stored", async () => {
    const { code, trialId, teacher } = await startLesson();
    const { socket, session } = await joinAs(pool, code, "Zed X.");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    const good = { trialId, round: 1, clientId: randomUUID(), value: 12, reason: "" };
    const bad: [string, unknown][] = [
      ["no payload", undefined],
      ["empty object", {}],
      ["a string", "hello"],
      ["missing clientId", { ...good, clientId: undefined }],
      ["missing trialId", { ...good, trialId: undefined }],
      ["a non-uuid clientId", { ...good, clientId: "12345" }],
      ["a string value", { ...good, value: "12" }],
      ["round 3", { ...good, round: 3 }],
      ["a round as text", { ...good, round: "1" }],
      ["both value and choice", { ...good, choice: 1 }],
      ["neither value nor choice", { ...good, value: null }],
      ["an extra-long reason", { ...good, reason: "x".repeat(LESSON_LIMITS.reason + 1) }],
      ["a choice on a number question", { ...good, value: null, choice: 0 }],
    ];
    for (const [label, payload] of bad) {
      const reply = await call(socket, "prediction:submit", payload);
      expect(codeOf(reply), label).toBe("validation_failed");
    }
    const long = await call(socket, "prediction:submit", { ...good, reason: "x".repeat(LESSON_LIMITS.reason + 1) });
    expect("error" in long && long.error.fields?.reason).toEqual([`Keep your reason to ${LESSON_LIMITS.reason} characters or fewer.`]);
    expect(await predictionRows(trialId)).toEqual([]);
    // Other events too.
    expect(codeOf(await call(socket, "lesson:join", { code: 12 }))).toBe("validation_failed");
    expect(codeOf(await call(socket, "explanation:submit", { trialId, clientId: randomUUID(), text: "" }))).toBe("validation_failed");
    expect(codeOf(await call(teacher, "trial:phase", { trialId, phase: "later" }))).toBe("validation_failed");
    // An event without an acknowledgement function is ignored, and stores nothing.
    socket.emit("prediction:submit", good as never, undefined as never);
    // The well-formed answer is still taken afterwards.
    await ok(socket, "prediction:submit", good);
    expect((await predictionRows(trialId)).map((r) => r.participantId)).toEqual([session.participant.id]);
  });
});

describe("who may do what", () => {
  it("a pupil's device cannot set up, move, show or record a trial: each attempt is refused and audited", async () => {
    const { code, lessonId, trialId } = await startLesson();
    const { socket } = await joinAs(pool, code, "Abe Y.");
    const attempts: [string, unknown][] = [
      ["trial:setup", { trialId, rig: "fountain", params: { potHeight: 2 }, question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm" } }],
      ["trial:phase", { trialId, phase: "predict" }],
      ["trial:result", { trialId, seed: 1, measured: {}, run: { dt: 0.0005, steps: 1, simulatedSeconds: 1, wallSeconds: null } }],
      ["trial:show", { lessonId, trialId }],
      ["lesson:end", { lessonId }],
      ["lesson:watch", { lessonId }],
    ];
    for (const [event, payload] of attempts) {
      const reply = await call(socket, event as never, payload);
      expect(codeOf(reply), event).toBe("forbidden");
    }
    const [trial] = await ctx.database.db.select().from(trials).where(eq(trials.id, trialId));
    expect(trial).toMatchObject({ phase: "setup", seed: null, ranAt: null });
    expect((trial!.params as { potHeight: number }).potHeight).toBe(1);
    const [lesson] = await ctx.database.db.select().from(lessons).where(eq(lessons.id, lessonId));
    expect(lesson!.status).toBe("open");

    const audit = await refusals(lessonId);
    expect(audit.map((a) => (a.detail as { event: string }).event).sort()).toEqual(attempts.map(([e]) => e).sort());
    expect(audit.every((a) => a.actorStaffId === null && a.schoolId === ctx.fixture.schoolId && a.subjectType === "lesson")).toBe(true);
    expect(audit.every((a) => (a.detail as { reason: string }).reason === "pupil_device")).toBe(true);
  });

  it("a device refused again and again writes at most 20 audit rows", async () => {
    const { code, lessonId, trialId } = await startLesson();
    const { socket } = await joinAs(pool, code, "Bea Z.");
    for (let i = 0; i < 30; i++) expect(codeOf(await call(socket, "trial:phase", { trialId, phase: "predict" }))).toBe("forbidden");
    expect(await refusals(lessonId)).toHaveLength(20);
  });

  it("a pupil of lesson A cannot answer into lesson B", async () => {
    const a = await startLesson();
    const b = await startLesson(teacherB, ctx.fixture.classB);
    await ok(b.teacher, "trial:phase", { trialId: b.trialId, phase: "predict" });
    await ok(a.teacher, "trial:phase", { trialId: a.trialId, phase: "predict" });
    const { socket } = await joinAs(pool, a.code, "Cai A.");
    const reply = await call(socket, "prediction:submit", { trialId: b.trialId, round: 1, clientId: randomUUID(), value: 5 });
    expect(codeOf(reply)).toBe("forbidden");
    expect(await predictionRows(b.trialId)).toEqual([]);
    const audit = await refusals(b.lessonId);
    expect(audit.map((x) => x.detail)).toEqual([{ event: "prediction:submit", reason: "other_lesson" }]);
    // Its own lesson is fine.
    await ok(socket, "prediction:submit", { trialId: a.trialId, round: 1, clientId: randomUUID(), value: 5 });
    // A socket that has not joined cannot answer anywhere.
    const stranger = await pool.open();
    expect(codeOf(await call(stranger, "prediction:submit", { trialId: a.trialId, round: 1, clientId: randomUUID(), value: 5 }))).toBe("forbidden");
    expect(await predictionRows(a.trialId)).toHaveLength(1);
  });

  it("another teacher, or the head of department, cannot watch or change the lesson", async () => {
    const { lessonId, trialId } = await startLesson();
    for (const agent of [teacherB, head]) {
      const socket = await pool.open({ agent });
      expect(codeOf(await call(socket, "lesson:watch", { lessonId }))).toBe("forbidden");
      expect(codeOf(await call(socket, "trial:phase", { trialId, phase: "predict" }))).toBe("forbidden");
      expect(codeOf(await call(socket, "lesson:settings", { lessonId, showNames: true }))).toBe("forbidden");
      expect(codeOf(await call(socket, "lesson:end", { lessonId }))).toBe("forbidden");
    }
    const [trial] = await ctx.database.db.select().from(trials).where(eq(trials.id, trialId));
    expect(trial!.phase).toBe("setup");
    const audit = await refusals(lessonId);
    expect(new Set(audit.map((a) => a.actorStaffId))).toEqual(new Set([ctx.fixture.staffIds.teacherB, ctx.fixture.staffIds.head]));
    expect(audit).toHaveLength(8);
    expect(codeOf(await call(await pool.open({ agent: teacherA }), "lesson:watch", { lessonId: randomUUID() }))).toBe("not_found");
  });
});

describe("a whole trial, as the board and the pupils see it", () => {
  it("set-up is checked against the rig, phases move forward only, the server works out the theory, and the public view never names a pupil", async () => {
    const { code, lessonId, trialId, teacher } = await startLesson();
    const { socket: pupil, session } = await joinAs(pool, code, "Dana B.");
    const other = await joinAs(pool, code, "Emil C.");

    // Bad parameters and questions are refused per field.
    const badParams = await call(teacher, "trial:setup", {
      trialId,
      rig: "fountain",
      params: { potHeight: 9 },
      question: { kind: "number", prompt: "How high?", quantity: "sag", unit: "cm" },
    });
    expect(codeOf(badParams)).toBe("validation_failed");
    expect("error" in badParams && Object.keys(badParams.error.fields ?? {}).sort()).toEqual(["params.potHeight", "question.quantity"]);
    const badUnit = await call(teacher, "trial:setup", {
      trialId,
      rig: "fountain",
      params: {},
      question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "N" },
    });
    expect("error" in badUnit && badUnit.error.fields).toHaveProperty(["question.unit"]);

    const changed = nextEvent(pupil, "lesson:changed", (l) => l.trial?.shownParams.some((p) => p.key === "potHeight" && p.value === 1.5) ?? false);
    await ok(teacher, "trial:setup", {
      trialId,
      rig: "fountain",
      params: { potHeight: 1.5 },
      question: { kind: "number", prompt: "How high above the rim?", quantity: "rise", unit: "mm" },
    });
    const [publicAfterSetup] = await changed;
    const shown = publicAfterSetup.trial!.shownParams;
    expect(shown.find((p) => p.key === "potHeight")).toEqual({ key: "potHeight", label: "Height of the pot above the floor", unit: "m", value: 1.5 });
    expect(shown.find((p) => p.key === "linkShape")).toEqual({ key: "linkShape", label: "Link shape", unit: "", value: "Rigid rods" });
    expect(shown.some((p) => p.key === "theoryAlpha")).toBe(true);
    expect(shown.some((p) => p.key === "dt")).toBe(false);

    expect(codeOf(await call(teacher, "trial:phase", { trialId, phase: "explain" }))).toBe("bad_request");
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    // Set-up is closed once the question is out.
    expect(codeOf(await call(teacher, "trial:setup", { trialId, rig: "fountain", params: {}, question: { kind: "number", prompt: "x", quantity: "rise", unit: "cm" } }))).toBe("bad_request");

    await ok(pupil, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 120, reason: "Secret reason" });
    await ok(other.socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 80 });
    // Before the run, answers are not public.
    const beforeRun = await ok<PupilSession>(await pool.open(), "lesson:join", { code, resumeToken: session.participant.resumeToken });
    expect(beforeRun.lesson.trial!.answers).toBeNull();
    expect(beforeRun.lesson.trial!.answered).toEqual({ 1: 2, 2: 0 });
    expect(beforeRun.mine.predictions.map((p) => p.value)).toEqual([120]);

    expect(codeOf(await call(teacher, "trial:result", { trialId, seed: 7, measured: {}, run: { dt: 0.0005, steps: 10, simulatedSeconds: 1, wallSeconds: null } }))).toBe("bad_request");
    await ok(teacher, "trial:phase", { trialId, phase: "observe" });
    await ok(teacher, "trial:tally", { trialId, round: 1, values: [100, 150] });
    const measured = { rise: { value: 0.09, uncertainty: 0.01, unit: "m", basis: "mean over the last second" } };
    // The client's theory is not asked for; a made-up one would be ignored as an unknown key.
    const ran = nextEvent(pupil, "lesson:changed", (l) => l.trial?.result !== null);
    await ok(teacher, "trial:result", { trialId, seed: 7, measured, run: { dt: 0.0005, steps: 4000, simulatedSeconds: 2, wallSeconds: 1.5 }, theory: { rise: 99 } });
    const [afterRun] = await ran;
    const trial = afterRun.trial!;
    expect(trial.result!.value).toBeCloseTo(90, 9);
    expect(trial.result).toMatchObject({ unit: "mm" });
    expect(trial.result!.uncertainty).toBeCloseTo(10, 9);
    const expectedRise = RIGS.fountain.create(RIGS.fountain.schema.parse({ potHeight: 1.5 }), 7).theory().rise!;
    expect(trial.theory!.value).toBeCloseTo(expectedRise * 1000, 6);
    expect(trial.answers!.map((a) => a.value).sort()).toEqual([100, 120, 150, 80]);

    // No names, ids or reasons of pupils anywhere in the public view.
    const text = JSON.stringify(afterRun);
    for (const secret of ["Dana B.", "Emil C.", session.participant.id, other.session.participant.id, "Secret reason"]) expect(text).not.toContain(secret);

    // Explanations: taken in explain, shown by the teacher without a name.
    const early = await call(pupil, "explanation:submit", { trialId, clientId: randomUUID(), text: "Too early" });
    expect(codeOf(early)).toBe("phase_closed");
    await ok(teacher, "trial:phase", { trialId, phase: "explain" });
    const heard = nextEvent(teacher, "explanation:added");
    const explanationClient = randomUUID();
    await ok(pupil, "explanation:submit", { trialId, clientId: explanationClient, text: "The pile kicks the chain upward." });
    await ok(pupil, "explanation:submit", { trialId, clientId: explanationClient, text: "The pile kicks the chain upward." });
    const [{ explanation }] = await heard;
    expect(explanation.participantName).toBe("Dana B.");
    expect(await ctx.database.db.select().from(explanations).where(eq(explanations.trialId, trialId))).toHaveLength(1);
    const shownToAll = nextEvent(other.socket, "lesson:changed", (l) => (l.trial?.shownExplanations.length ?? 0) > 0);
    await ok(teacher, "explanation:show", { explanationId: explanation.id, shown: true });
    const [withShown] = await shownToAll;
    expect(withShown.trial!.shownExplanations).toEqual([{ id: explanation.id, text: "The pile kicks the chain upward." }]);
    expect(JSON.stringify(withShown)).not.toContain("Dana B.");

    // The teacher's view has everything, with names, and who is online.
    const view = await ok<TeacherLesson>(teacher, "lesson:watch", { lessonId });
    expect(view.joinUrl).toBe(`${ctx.stack.url}/join/${code}`);
    const teacherTrial = view.trials.find((t) => t.id === trialId)!;
    expect(teacherTrial.predictions.map((p) => [p.participantName, p.value]).sort()).toEqual([
      ["Dana B.", 120],
      ["Emil C.", 80],
    ]);
    expect(teacherTrial.theoryValues!.rise).toBeCloseTo(expectedRise, 12);
    expect(teacherTrial.tally[1]).toEqual({ counts: null, values: [100, 150] });
    expect(view.participants.filter((p) => p.online).map((p) => p.displayName).sort()).toEqual(["Dana B.", "Emil C."]);

    // A second trial, copied, shown to everyone.
    const { trialId: next } = await ok<{ trialId: string }>(teacher, "trial:add", { lessonId, copyOf: trialId });
    const showing = nextEvent(pupil, "lesson:changed", (l: PublicLesson) => l.trial?.id === next);
    await ok(teacher, "trial:show", { lessonId, trialId: next });
    const [[publicNext]] = await Promise.all([showing]);
    expect(publicNext.trialCount).toBe(2);
    expect(publicNext.trial!).toMatchObject({ position: 2, phase: "setup", result: null, answers: null });
    expect(publicNext.trial!.params).toEqual(teacherTrial.params);
  });

  it("a trial added with its own set-up is checked against that rig; a choice question takes choices and counts that fit it", async () => {
    const { code, lessonId, teacher } = await startLesson();
    const { socket } = await joinAs(pool, code, "Fern G.");
    const question = {
      kind: "choice",
      prompt: "How far will it sag?",
      quantity: "sag",
      unit: "cm",
      choices: [{ label: "Less than 20 cm", max: 20 }, { label: "20 cm or more", min: 20 }],
    };
    const refused = await call(teacher, "trial:add", { lessonId, setup: { rig: "hanging", params: { span: 0.1 }, question } });
    expect(codeOf(refused)).toBe("validation_failed");
    expect("error" in refused && Object.keys(refused.error.fields ?? {})).toEqual(["params.span"]);
    expect(await ctx.database.db.select().from(trials).where(eq(trials.lessonId, lessonId))).toHaveLength(1);

    const { trialId } = await ok<{ trialId: string }>(teacher, "trial:add", { lessonId, setup: { rig: "hanging", params: { span: 1 }, question } });
    await ok(teacher, "trial:show", { lessonId, trialId });
    await ok(teacher, "trial:phase", { trialId, phase: "predict" });
    expect(codeOf(await call(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), value: 12 }))).toBe("validation_failed");
    expect(codeOf(await call(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), choice: 2 }))).toBe("validation_failed");
    await ok(socket, "prediction:submit", { trialId, round: 1, clientId: randomUUID(), choice: 1, reason: "Long chain." });
    expect(codeOf(await call(teacher, "trial:tally", { trialId, round: 1, counts: [3, 4, 5] }))).toBe("validation_failed");
    await ok(teacher, "trial:tally", { trialId, round: 1, counts: [3, 4] });
    const observed = nextEvent(socket, "lesson:changed", (l) => l.trial?.phase === "observe");
    await ok(teacher, "trial:phase", { trialId, phase: "observe" });
    const [view] = await observed;
    // The device's answer and the show of hands, all without names.
    const choices = view.trial!.answers!.map((a) => a.choice);
    expect(choices.filter((c) => c === 0)).toHaveLength(3);
    expect(choices.filter((c) => c === 1)).toHaveLength(5);
    const [row] = await ctx.database.db.select().from(trials).where(eq(trials.id, trialId));
    expect(row).toMatchObject({ rig: "hanging", position: 2 });
    expect((row!.params as { span: number; chainLength: number }).span).toBe(1);
  });
});
