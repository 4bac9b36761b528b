import { createHash, randomBytes } from "node:crypto";
import { and, asc, eq, or, sql } from "drizzle-orm";
import type { z } from "zod";
import { ParamError, RIGS, parseParams, type RigId } from "../../sim";
import { recordAudit } from "../audit/audit.repository";
import { classForActor } from "../classes/classes.access";
import { isUniqueViolation } from "../classes/classes.repository";
import { DEFAULT_QUESTIONS, QUESTION_QUANTITIES, quantityOf } from "../contracts/lesson-questions";
import { DISPLAY_UNITS, LESSON_LIMITS, ROUND_PHASE, canMoveTrialPhase, type Round, type TrialPhase } from "../contracts/lesson-rules";
import type {
  LessonLookup,
  PupilSession,
  Question,
  TheoryValues,
  addTrialInputSchema,
  explanationInputSchema,
  joinLessonInputSchema,
  movePhaseInputSchema,
  predictionInputSchema,
  tallyInputSchema,
  trialResultInputSchema,
  trialSetupSchema,
} from "../contracts/lessons";
import type { FieldErrors } from "../contracts/errors";
import type { Db } from "../db/client";
import { explanations, lessonParticipants, lessons, predictions, rosterEntries, trials } from "../db/schema";
import { refreshTrialSummaries } from "../department/trial-summary";
import { AppError, forbidden, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { planForStart } from "../lesson-plans/lesson-plans.access";
import { newLessonCode } from "./lesson-code";
import * as repo from "./lessons.repository";
import { publicLesson, type ExplanationRow, type PredictionRow, type TrialRow } from "./lessons.views";

/** Who is on the other end of a socket: a signed-in member of staff, a joined pupil's device, or neither yet. */
export interface SocketWho {
  staffId: string | null;
  /** `displayName` as joined, kept on the socket so an answer needs no extra query for it. */
  participant: { id: string; lessonId: string; displayName?: string } | null;
}

async function participantName(db: Db, participantId: string): Promise<string> {
  const [p] = await db.select({ displayName: lessonParticipants.displayName }).from(lessonParticipants).where(eq(lessonParticipants.id, participantId));
  return p?.displayName ?? "";
}

/**
 * A refused attempt: answered `forbidden` and written to the audit log (the school is known
 * from the lesson, so the row can be filed under it).
 */
export class RefusedError extends AppError {
  constructor(
    readonly schoolId: string,
    readonly lessonId: string,
    readonly reason: string,
    message = "Only the lesson's teacher can do that.",
  ) {
    super("forbidden", message);
  }
}

const validation = (fields: FieldErrors, message = "Some of the details need correcting.") =>
  new AppError("validation_failed", message, fields);
const lessonEnded = () => new AppError("lesson_ended", "This lesson has ended.");
const lessonNotFound = () => notFound("That lesson");
const trialNotFound = () => notFound("That trial");

export const hashResumeToken = (token: string) => createHash("sha256").update(token).digest("hex");

// ---- Set-ups: rig parameters and questions ----

export function defaultQuestion(rig: RigId): Question {
  return { kind: "number", ...DEFAULT_QUESTIONS[rig], askReason: true, askExplanation: true, revote: true };
}

export function defaultParams(rig: RigId): Record<string, unknown> {
  return parseParams(RIGS[rig].schema, {}) as Record<string, unknown>;
}

/** Checks a set-up against the rig's own schema and the rig's askable quantities; returns what to store. */
export function checkSetup(setup: z.output<typeof trialSetupSchema>): { rig: RigId; params: Record<string, unknown>; question: Question } {
  const fields: FieldErrors = {};
  let params: Record<string, unknown> = {};
  try {
    params = parseParams(RIGS[setup.rig].schema, setup.params) as Record<string, unknown>;
  } catch (error) {
    if (!(error instanceof ParamError)) throw error;
    for (const problem of error.problems) {
      const split = problem.indexOf(": ");
      const key = split > 0 ? problem.slice(0, split) : "";
      const message = split > 0 ? problem.slice(split + 2) : problem;
      (fields[key && key !== "(parameters)" ? `params.${key}` : "params"] ??= []).push(message);
    }
  }
  const question = setup.question;
  const quantity = quantityOf(setup.rig, question.quantity);
  if (!quantity) {
    const allowed = QUESTION_QUANTITIES[setup.rig].map((q) => q.key).join(", ");
    fields["question.quantity"] = [`This rig can be asked about: ${allowed}.`];
  } else if (!DISPLAY_UNITS[quantity.siUnit]?.some((u) => u.unit === question.unit)) {
    const units = (DISPLAY_UNITS[quantity.siUnit] ?? []).map((u) => u.unit || "(no unit)").join(", ");
    fields["question.unit"] = [`Answers to this question can be in: ${units}.`];
  }
  if (Object.keys(fields).length) throw validation(fields);
  return { rig: setup.rig, params, question };
}

// ---- Theory: worked out on the server, never trusted from a client ----

const theoryCache = new Map<string, TheoryValues>();
const THEORY_CACHE_SIZE = 200;

/** The closed-form values for a set-up (SI). Building a rig costs ~100 ms, so results are kept per set-up. */
export function theoryFor(rig: RigId, params: Record<string, unknown>, seed: number): TheoryValues {
  const key = `${rig}:${JSON.stringify(params)}`;
  const cached = theoryCache.get(key);
  if (cached) return cached;
  const definition = RIGS[rig] as unknown as { create(p: unknown, seed: number): { theory(): Record<string, number> } };
  const all = definition.create(params, seed).theory();
  // NaN and infinities cannot travel as JSON: leave them out.
  const values: TheoryValues = Object.fromEntries(Object.entries(all).filter(([, v]) => Number.isFinite(v)));
  if (theoryCache.size >= THEORY_CACHE_SIZE) theoryCache.delete(theoryCache.keys().next().value!);
  theoryCache.set(key, values);
  return values;
}

// ---- HTTP: start, list, end ----

type TrialSetup = { rig: string; params: Record<string, unknown>; question: Question };

type FromPlan = { planId: string; planTitle: string } | null;

async function insertLessonOnce(db: Db, actor: Actor, classId: string, showNames: boolean, setups: TrialSetup[], plan: FromPlan) {
  return db.transaction(async (tx) => {
    const [lesson] = await tx
      .insert(lessons)
      .values({ classId, teacherId: actor.id, code: newLessonCode(), showNames, planId: plan?.planId ?? null, planTitle: plan?.planTitle ?? null })
      .returning();
    const made = await tx
      .insert(trials)
      .values(setups.map((setup, i) => ({ lessonId: lesson!.id, position: i + 1, ...setup, phase: "setup" as const })))
      .returning({ id: trials.id, position: trials.position });
    const first = made.find((t) => t.position === 1)!;
    await tx.update(lessons).set({ currentTrialId: first.id }).where(eq(lessons.id, lesson!.id));
    return { lessonId: lesson!.id, code: lesson!.code };
  });
}

/**
 * The trials a new lesson starts with: a fountain trial with its defaults, or the set-ups of one
 * of this teacher's earlier lessons (any class), in order, ready to run again.
 */
async function startingSetups(db: Db, actor: Actor, fromLessonId: string | null): Promise<TrialSetup[]> {
  if (!fromLessonId) return [{ rig: "fountain", params: defaultParams("fountain"), question: defaultQuestion("fountain") }];
  const head = await repo.findLessonWithClass(db, fromLessonId);
  if (!head || head.lesson.teacherId !== actor.id) throw new AppError("not_found", "That earlier lesson was not found among yours.");
  const earlier = await db.select().from(trials).where(eq(trials.lessonId, fromLessonId)).orderBy(asc(trials.position));
  if (earlier.length === 0) return startingSetups(db, actor, null);
  return earlier.map((t) => ({ rig: t.rig, params: t.params, question: t.question }));
}

export async function startLesson(
  db: Db,
  actor: Actor,
  classId: string,
  input: { showNames: boolean; fromLessonId: string | null; planId: string | null },
) {
  const row = await classForActor(db, actor, classId, "write");
  if (row.archivedAt) throw new AppError("bad_request", "This class is archived: restore it to start a lesson.");
  let plan: FromPlan = null;
  let setups: TrialSetup[];
  if (input.planId) {
    // The plan's set-ups, in its order; the title is kept on the lesson in case the plan goes.
    const found = await planForStart(db, actor, input.planId);
    plan = { planId: found.id, planTitle: found.title };
    setups = found.trials.map((t) => ({ rig: t.rig, params: t.params, question: t.question }));
  } else setups = await startingSetups(db, actor, input.fromLessonId);
  // A code already in use by an open lesson: draw another (64 million codes, so this is rare).
  for (let attempt = 1; ; attempt++) {
    try {
      return await insertLessonOnce(db, actor, classId, input.showNames, setups, plan);
    } catch (error) {
      if (!isUniqueViolation(error, "lessons_open_code_key") || attempt >= 10) throw error;
    }
  }
}

export async function listLessons(db: Db, actor: Actor, classId: string) {
  await classForActor(db, actor, classId, "read");
  const rows = await repo.lessonsOfClass(db, classId);
  return rows.map((r) => ({ ...r, startedAt: r.startedAt.toISOString(), endedAt: r.endedAt?.toISOString() ?? null }));
}

export async function openLessons(db: Db, actor: Actor) {
  const rows = await repo.openLessonsOfTeacher(db, actor.id);
  return rows.map((r) => ({ ...r, startedAt: r.startedAt.toISOString() }));
}

/** Ends a lesson: its code is free again (the unique index covers open lessons only). Ending twice is fine. */
async function markEnded(db: Db, lessonId: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    // Lock first, count after: joins in flight hold a share lock, so the count below (a new
    // statement, so a new snapshot) sees every pupil who got in, and no one gets in later.
    const open = await tx.execute(sql`select 1 from ${lessons} where ${lessons.id} = ${lessonId} and ${lessons.status} = 'open' for update`);
    if (open.rows.length === 0) return false;
    await tx
      .update(lessons)
      // Pupils cannot join an ended lesson: count them once, for the department overview.
      .set({ status: "ended", endedAt: new Date(), participantCount: sql`(select count(*) from ${lessonParticipants} where ${lessonParticipants.lessonId} = ${lessonId})` })
      .where(eq(lessons.id, lessonId));
    return true;
  });
}

export async function endLessonByActor(db: Db, actor: Actor, lessonId: string) {
  const head = await repo.findLessonWithClass(db, lessonId);
  if (!head || head.schoolId !== actor.schoolId) throw lessonNotFound();
  if (head.lesson.teacherId !== actor.id) {
    // Someone who may read the class (its head of department) learns they cannot end it; others learn nothing.
    await classForActor(db, actor, head.lesson.classId, "read").catch(() => {
      throw lessonNotFound();
    });
    throw forbidden("Only the lesson's teacher can end it.");
  }
  const justEnded = await markEnded(db, lessonId);
  const after = await repo.findLessonWithClass(db, lessonId);
  return { lessonId, status: after!.lesson.status, endedAt: after!.lesson.endedAt?.toISOString() ?? null, justEnded };
}

// ---- Socket: authorisation ----

/** The lesson, if `who` is its teacher; otherwise a refusal (audited) or not found. */
export async function lessonForTeacher(db: Db, who: SocketWho, lessonId: string, intent: "read" | "write") {
  const head = await repo.findLessonWithClass(db, lessonId);
  if (!head) throw lessonNotFound();
  if (!who.staffId || who.staffId !== head.lesson.teacherId) {
    throw new RefusedError(head.schoolId, lessonId, who.staffId ? "not_the_lessons_teacher" : who.participant ? "pupil_device" : "not_signed_in");
  }
  if (intent === "write" && head.lesson.status !== "open") throw lessonEnded();
  return head;
}

async function trialForTeacher(db: Db, who: SocketWho, trialId: string) {
  const trial = await repo.findTrial(db, trialId);
  if (!trial) throw trialNotFound();
  const head = await lessonForTeacher(db, who, trial.lessonId, "write");
  return { trial, head };
}

// ---- Socket: the teacher's events ----

export async function addTrial(db: Db, who: SocketWho, input: z.output<typeof addTrialInputSchema>) {
  await lessonForTeacher(db, who, input.lessonId, "write");
  let setup: { rig: RigId; params: Record<string, unknown>; question: Question };
  if (input.setup) setup = checkSetup(input.setup);
  else if (input.copyOf) {
    const source = await repo.findTrial(db, input.copyOf);
    if (!source || source.lessonId !== input.lessonId) throw trialNotFound();
    setup = { rig: source.rig as RigId, params: source.params, question: source.question };
  } else setup = { rig: "fountain", params: defaultParams("fountain"), question: defaultQuestion("fountain") };

  for (let attempt = 1; ; attempt++) {
    const { next, count } = await repo.nextTrialPosition(db, input.lessonId);
    if (count >= LESSON_LIMITS.trialsPerLesson) {
      throw new AppError("bad_request", `A lesson can have up to ${LESSON_LIMITS.trialsPerLesson} trials.`);
    }
    try {
      const [row] = await db
        .insert(trials)
        .values({ lessonId: input.lessonId, position: next, ...setup, phase: "setup" })
        .returning({ id: trials.id });
      return { trialId: row!.id };
    } catch (error) {
      // Two adds at once took the same position: take the next one.
      if (!isUniqueViolation(error, "trials_lesson_position_key") || attempt >= 5) throw error;
    }
  }
}

export async function setUpTrial(db: Db, who: SocketWho, input: z.output<typeof trialSetupSchema> & { trialId: string }) {
  const { trial } = await trialForTeacher(db, who, input.trialId);
  const setup = checkSetup(input);
  const [updated] = await db
    .update(trials)
    .set(setup)
    .where(and(eq(trials.id, trial.id), eq(trials.phase, "setup")))
    .returning({ id: trials.id });
  if (!updated) throw new AppError("bad_request", "A trial can only be changed while it is being set up: add a new trial instead.");
  return { trialId: trial.id, lessonId: trial.lessonId };
}

export async function showTrial(db: Db, who: SocketWho, input: { lessonId: string; trialId: string }) {
  await lessonForTeacher(db, who, input.lessonId, "write");
  const trial = await repo.findTrial(db, input.trialId);
  if (!trial || trial.lessonId !== input.lessonId) throw trialNotFound();
  await db.update(lessons).set({ currentTrialId: trial.id }).where(eq(lessons.id, input.lessonId));
  return { trialId: trial.id };
}

export async function movePhase(db: Db, who: SocketWho, input: z.output<typeof movePhaseInputSchema>) {
  const { trial } = await trialForTeacher(db, who, input.trialId);
  if (!canMoveTrialPhase(trial.phase, input.phase, trial.question)) {
    const skipped =
      (input.phase === "explain" && trial.question.askExplanation === false) || (input.phase === "revote" && trial.question.revote === false);
    throw new AppError(
      "bad_request",
      skipped ? `This trial's question leaves out "${input.phase}".` : `A trial cannot go from "${trial.phase}" to "${input.phase}".`,
    );
  }
  // Only from the phase we checked: a concurrent move cannot be overwritten.
  const [updated] = await db
    .update(trials)
    .set({ phase: input.phase })
    .where(and(eq(trials.id, trial.id), eq(trials.phase, trial.phase)))
    .returning({ phase: trials.phase });
  if (!updated) throw new AppError("bad_request", "The trial's phase changed meanwhile: try again.");
  return { phase: updated.phase, lessonId: trial.lessonId };
}

const RESULT_PHASES: readonly TrialPhase[] = ["observe", "explain", "revote"];

export async function recordResult(db: Db, who: SocketWho, input: z.output<typeof trialResultInputSchema>) {
  const { trial } = await trialForTeacher(db, who, input.trialId);
  if (!RESULT_PHASES.includes(trial.phase)) throw new AppError("bad_request", "Record a run once the trial is in observe.");
  const theory = theoryFor(trial.rig as RigId, trial.params, input.seed);
  // The department overview reads the class's closeness from the trial: keep it in step with the result.
  await db.transaction(async (tx) => {
    await tx
      .update(trials)
      .set({ seed: input.seed, measured: input.measured, run: input.run, theory, ranAt: new Date() })
      .where(eq(trials.id, trial.id));
    await refreshTrialSummaries(tx, [trial.id]);
  });
  return { trialId: trial.id, lessonId: trial.lessonId };
}

export async function recordTally(db: Db, who: SocketWho, input: z.output<typeof tallyInputSchema>) {
  const { trial } = await trialForTeacher(db, who, input.trialId);
  if (trial.phase === "setup") throw new AppError("bad_request", "Take a show of hands once the question is asked.");
  const question = trial.question;
  if (question.kind === "choice") {
    if (!input.counts || input.counts.length !== question.choices.length) {
      throw validation({ counts: [`Give one count for each of the ${question.choices.length} choices.`] });
    }
  } else if (!input.values) throw validation({ values: ["Give the numbers the class suggested."] });
  const tally = { counts: question.kind === "choice" ? input.counts : null, values: question.kind === "number" ? input.values : null };
  await db
    .update(trials)
    .set(input.round === 1 ? { tallyFirst: tally } : { tallySecond: tally })
    .where(eq(trials.id, trial.id));
  return { trialId: trial.id, lessonId: trial.lessonId };
}

export async function showExplanation(db: Db, who: SocketWho, input: { explanationId: string; shown: boolean }) {
  const [row] = await db.select().from(explanations).where(eq(explanations.id, input.explanationId));
  if (!row) throw notFound("That explanation");
  const { trial } = await trialForTeacher(db, who, row.trialId);
  await db
    .update(explanations)
    .set({ shownAt: input.shown ? new Date() : null })
    .where(eq(explanations.id, row.id));
  return { explanationId: row.id, lessonId: trial.lessonId };
}

export async function changeSettings(db: Db, who: SocketWho, input: { lessonId: string; showNames: boolean }) {
  await lessonForTeacher(db, who, input.lessonId, "write");
  await db.update(lessons).set({ showNames: input.showNames }).where(eq(lessons.id, input.lessonId));
  return { showNames: input.showNames };
}

export async function endLesson(db: Db, who: SocketWho, lessonId: string) {
  await lessonForTeacher(db, who, lessonId, "write");
  return { lessonId, justEnded: await markEnded(db, lessonId) };
}

// ---- Socket: pupils ----

export async function lookUpLesson(db: Db, code: string): Promise<LessonLookup> {
  const found = await repo.findOpenLessonByCode(db, code);
  if (!found) {
    const latest = await repo.findLatestLessonByCode(db, code);
    if (latest?.status === "ended") throw lessonEnded();
    throw notFound("A lesson with that code");
  }
  const roster = await repo.rosterForLesson(db, found.lesson.classId, found.lesson.id);
  return { lessonId: found.lesson.id, className: found.className, roster: roster.length ? roster : null };
}

async function pupilSession(db: Db, lessonId: string, participant: { id: string; displayName: string }, resumeToken: string): Promise<PupilSession> {
  const bundle = await repo.loadLessonBundle(db, lessonId);
  if (!bundle) throw lessonNotFound();
  const mine = {
    predictions: bundle.predictions
      .filter((p) => p.participantId === participant.id)
      .map((p) => ({ trialId: p.trialId, round: p.round, clientId: p.clientId, value: p.value, choice: p.choice, reason: p.reason })),
    explanations: bundle.explanations
      .filter((e) => e.participantId === participant.id)
      .map((e) => ({ trialId: e.trialId, clientId: e.clientId, text: e.text })),
  };
  return { lesson: publicLesson(bundle), participant: { ...participant, resumeToken }, mine };
}

/**
 * Join or rejoin. A resume token finds the same participant (also after a server restart: it
 * is all in Postgres); otherwise a new participant with the typed or picked name.
 */
export async function joinLesson(db: Db, input: z.output<typeof joinLessonInputSchema>): Promise<{ session: PupilSession; isNew: boolean }> {
  if (input.resumeToken) {
    const [known] = await db
      .select({ participant: lessonParticipants, lesson: lessons })
      .from(lessonParticipants)
      .innerJoin(lessons, eq(lessons.id, lessonParticipants.lessonId))
      .where(eq(lessonParticipants.resumeTokenHash, hashResumeToken(input.resumeToken)));
    if (known && known.lesson.code === input.code) {
      if (known.lesson.status !== "open") throw lessonEnded();
      const { id, displayName } = known.participant;
      return { session: await pupilSession(db, known.lesson.id, { id, displayName }, input.resumeToken), isNew: false };
    }
    if (input.name === undefined && input.rosterEntryId === undefined) {
      throw notFound("Your place in this lesson");
    }
  }
  const found = await repo.findOpenLessonByCode(db, input.code);
  if (!found) {
    const latest = await repo.findLatestLessonByCode(db, input.code);
    if (latest?.status === "ended") throw lessonEnded();
    throw notFound("A lesson with that code");
  }
  const lesson = found.lesson;
  let displayName: string;
  let rosterEntryId: string | null = null;
  if (input.rosterEntryId) {
    const [entry] = await db
      .select()
      .from(rosterEntries)
      .where(and(eq(rosterEntries.id, input.rosterEntryId), eq(rosterEntries.classId, lesson.classId)));
    if (!entry) throw validation({ rosterEntryId: ["That name is not on this class's list."] });
    displayName = entry.displayName;
    rosterEntryId = entry.id;
  } else displayName = input.name!;

  const token = randomBytes(24).toString("base64url");
  try {
    const row = await db.transaction(async (tx) => {
      // Joined under a share lock on the still-open lesson: ending it waits for this join to be
      // counted, and a join that waited on an end finds the lesson ended.
      const open = await tx.execute(sql`select 1 from ${lessons} where ${lessons.id} = ${lesson.id} and ${lessons.status} = 'open' for share`);
      if (open.rows.length === 0) throw lessonEnded();
      const [inserted] = await tx
        .insert(lessonParticipants)
        .values({ lessonId: lesson.id, displayName, rosterEntryId, resumeTokenHash: hashResumeToken(token) })
        .returning({ id: lessonParticipants.id, displayName: lessonParticipants.displayName });
      return inserted!;
    });
    return { session: await pupilSession(db, lesson.id, row, token), isNew: true };
  } catch (error) {
    if (isUniqueViolation(error, "lesson_participants_name_key")) {
      throw new AppError("name_taken", "Someone in this lesson already uses that name: add an initial, or ask your teacher.", {
        name: ["Someone in this lesson already uses that name."],
      });
    }
    throw error;
  }
}

function requireParticipant(who: SocketWho) {
  if (!who.participant) throw forbidden("Join the lesson first.");
  return who.participant;
}

/** The trial a pupil answers, refused (and audited) unless it belongs to the pupil's own lesson. */
async function trialForPupil(db: Db, who: SocketWho, trialId: string) {
  const participant = requireParticipant(who);
  const trial = await repo.findTrial(db, trialId);
  if (!trial) throw trialNotFound();
  if (trial.lessonId !== participant.lessonId) {
    const head = await repo.findLessonWithClass(db, trial.lessonId);
    throw new RefusedError(head!.schoolId, trial.lessonId, "other_lesson", "You can only answer in the lesson you joined.");
  }
  return { participant, trial };
}

/** Locks the trial and its lesson for this transaction, so a phase change waits for an answer in flight and vice versa. */
async function lockOpenTrial(tx: repo.Tx, trialId: string) {
  // One query locks both rows: answers arrive in bursts, and every round trip counts.
  const [row] = await tx
    .select({ trial: trials, lesson: lessons })
    .from(trials)
    .innerJoin(lessons, eq(lessons.id, trials.lessonId))
    .where(eq(trials.id, trialId))
    .for("share");
  if (!row) throw trialNotFound();
  if (row.lesson.status !== "open") throw lessonEnded();
  return row;
}

export type StoredAnswer = { clientId: string; storedAt: string };

/**
 * Exactly once: a resend with a client id already stored gets the stored row back (even after
 * the phase closed); a new answer replaces the pupil's earlier one for that trial and round.
 * Returns only after the row is committed.
 */
export async function submitPrediction(
  db: Db,
  who: SocketWho,
  input: z.output<typeof predictionInputSchema>,
): Promise<{ stored: StoredAnswer; row: PredictionRow | null; displayName: string | null; lessonId: string }> {
  const participant = requireParticipant(who);
  const stored = await findStoredPrediction(db, participant.id, input.clientId);
  if (stored) return { stored, row: null, displayName: null, lessonId: participant.lessonId };

  try {
    const row = await db.transaction(async (tx) => {
      // The trial is read under its lock: whose lesson it is, its question and its phase, at once.
      const locked = await lockOpenTrial(tx, input.trialId);
      const trial = locked.trial;
      if (trial.lessonId !== participant.lessonId) {
        const head = await repo.findLessonWithClass(tx, trial.lessonId);
        throw new RefusedError(head!.schoolId, trial.lessonId, "other_lesson", "You can only answer in the lesson you joined.");
      }
      checkAnswerFits(trial, input);
      if (locked.lesson.currentTrialId !== trial.id || locked.trial.phase !== ROUND_PHASE[input.round as Round]) {
        throw new AppError(
          "phase_closed",
          input.round === 1 ? "Predictions for this trial are closed." : "The re-vote for this trial is closed.",
        );
      }
      const now = new Date();
      const [saved] = await tx
        .insert(predictions)
        .values({
          trialId: trial.id,
          participantId: participant.id,
          round: input.round,
          clientId: input.clientId,
          value: input.value,
          choice: input.choice,
          reason: input.reason,
        })
        .onConflictDoUpdate({
          target: [predictions.trialId, predictions.participantId, predictions.round],
          set: {
            clientId: input.clientId,
            // Remember the answer being replaced (the last 50 are plenty for resends).
            replacedClientIds: sql`(array_append(${predictions.replacedClientIds}, ${predictions.clientId}))[greatest(cardinality(${predictions.replacedClientIds}) - 48, 1):]`,
            value: input.value,
            choice: input.choice,
            reason: input.reason,
            updatedAt: now,
          },
        })
        .returning();
      return saved!;
    });
    const displayName = participant.displayName ?? (await participantName(db, participant.id));
    return { stored: { clientId: row.clientId, storedAt: row.updatedAt.toISOString() }, row, displayName, lessonId: participant.lessonId };
  } catch (error) {
    // The same client id arrived twice at once: the other copy was stored.
    if (isUniqueViolation(error, "predictions_participant_client_key")) {
      const again = await findStoredPrediction(db, participant.id, input.clientId);
      if (again) return { stored: again, row: null, displayName: null, lessonId: participant.lessonId };
    }
    throw error;
  }
}

/**
 * The stored answer with this client id, or the newer answer that replaced it: a late resend of
 * a replaced answer is acknowledged (the device is done with it) and changes nothing.
 */
async function findStoredPrediction(db: Db, participantId: string, clientId: string): Promise<StoredAnswer | null> {
  const [row] = await db
    .select({ clientId: predictions.clientId, updatedAt: predictions.updatedAt })
    .from(predictions)
    .where(
      and(
        eq(predictions.participantId, participantId),
        or(eq(predictions.clientId, clientId), sql`${clientId}::uuid = any(${predictions.replacedClientIds})`),
      ),
    );
  return row ? { clientId: row.clientId, storedAt: row.updatedAt.toISOString() } : null;
}

function checkAnswerFits(trial: TrialRow, input: z.output<typeof predictionInputSchema>) {
  const question = trial.question;
  if (question.kind === "choice") {
    if (input.choice === null) throw validation({ choice: ["Pick one of the choices."] });
    if (input.choice >= question.choices.length) throw validation({ choice: ["Pick one of the choices shown."] });
  } else if (input.value === null) throw validation({ value: ["Type a number."] });
}

const EXPLAIN_PHASES: readonly TrialPhase[] = ["explain", "revote"];

export async function submitExplanation(
  db: Db,
  who: SocketWho,
  input: z.output<typeof explanationInputSchema>,
): Promise<{ stored: StoredAnswer; row: ExplanationRow | null; displayName: string | null; lessonId: string }> {
  const participant = requireParticipant(who);
  const existing = await findStoredExplanation(db, participant.id, input.clientId);
  if (existing) return { stored: existing, row: null, displayName: null, lessonId: participant.lessonId };
  const { trial } = await trialForPupil(db, who, input.trialId);
  const row = await db.transaction(async (tx) => {
    const locked = await lockOpenTrial(tx, trial.id);
    if (locked.lesson.currentTrialId !== trial.id || !EXPLAIN_PHASES.includes(locked.trial.phase)) {
      throw new AppError("phase_closed", "Explanations for this trial are closed.");
    }
    const [saved] = await tx
      .insert(explanations)
      .values({ trialId: trial.id, participantId: participant.id, clientId: input.clientId, text: input.text })
      .onConflictDoNothing({ target: [explanations.participantId, explanations.clientId] })
      .returning();
    return saved ?? null;
  });
  if (!row) {
    const again = await findStoredExplanation(db, participant.id, input.clientId);
    return { stored: again!, row: null, displayName: null, lessonId: participant.lessonId };
  }
  const [p] = await db
    .select({ displayName: lessonParticipants.displayName })
    .from(lessonParticipants)
    .where(eq(lessonParticipants.id, participant.id));
  return { stored: { clientId: row.clientId, storedAt: row.createdAt.toISOString() }, row, displayName: p?.displayName ?? "", lessonId: trial.lessonId };
}

async function findStoredExplanation(db: Db, participantId: string, clientId: string): Promise<StoredAnswer | null> {
  const [row] = await db
    .select({ clientId: explanations.clientId, createdAt: explanations.createdAt })
    .from(explanations)
    .where(and(eq(explanations.participantId, participantId), eq(explanations.clientId, clientId)));
  return row ? { clientId: row.clientId, storedAt: row.createdAt.toISOString() } : null;
}

/** Files a refused attempt under the lesson's school. */
export function auditRefusal(db: Db, refusal: RefusedError, event: string, actorStaffId: string | null) {
  return recordAudit(db, {
    schoolId: refusal.schoolId,
    actorStaffId,
    action: "lesson.refused",
    subjectType: "lesson",
    subjectId: refusal.lessonId,
    detail: { event, reason: refusal.reason },
  });
}
