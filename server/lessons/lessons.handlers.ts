import { z } from "zod";
import { fieldErrorsFromIssues } from "../contracts/errors";
import {
  addTrialInputSchema,
  boardControlInputSchema,
  currentTrialInputSchema,
  explanationInputSchema,
  joinLessonInputSchema,
  lessonCodeSchema,
  lessonIdInputSchema,
  lessonSettingsInputSchema,
  movePhaseInputSchema,
  predictionInputSchema,
  showExplanationInputSchema,
  tallyInputSchema,
  trialResultInputSchema,
  trialSetupUpdateSchema,
} from "../contracts/lessons";
import { rooms, type AckReply } from "../contracts/socket-events";
import type { Db } from "../db/client";
import { AppError } from "../http/app-error";
import type { IoServer } from "../realtime/realtime";
import * as repo from "./lessons.repository";
import * as service from "./lessons.service";
import { publicLesson, teacherExplanation, teacherLesson, teacherPrediction } from "./lessons.views";

const lessonCodeLookupSchema = z.object({ code: lessonCodeSchema });

type IoSocket = Parameters<Parameters<IoServer["on"]>[1]>[0];
type Ack = (reply: AckReply<unknown>) => void;
/** What a handler returns: the acknowledgement's data, and what to broadcast once it has been sent. */
type Outcome = { data: unknown; after?: () => Promise<void> };

/** Joins and departures within this window share one rebuilt teacher view. */
const TEACHER_VIEW_COALESCE_MS = 150;

/** At most this many refusal rows per socket: a misbehaving device cannot flood the audit log. */
const AUDIT_ROWS_PER_SOCKET = 20;

export interface LessonLiveOptions {
  io: IoServer;
  db: Db;
  publicUrl: string;
  log: (message: string, error?: unknown) => void;
  /** Called once when a lesson ends (socket or HTTP), e.g. to send the teacher's summary. */
  onEnded?: (lessonId: string) => void;
}

/**
 * Live lessons over socket.io: the request handlers and the broadcasts. All state is in
 * Postgres, so after a restart clients simply join (resume token) or watch again.
 */
export function createLessonLive({ io, db, publicUrl, log, onEnded }: LessonLiveOptions) {
  const auditCounts = new WeakMap<IoSocket, number>();

  /** Pupils with at least one connected device in the lesson's room. */
  async function onlineParticipants(lessonId: string): Promise<Set<string>> {
    const sockets = await io.in(rooms.lesson(lessonId)).fetchSockets();
    return new Set(sockets.flatMap((s) => (s.data.participant ? [s.data.participant.id] : [])));
  }

  async function teacherView(lessonId: string) {
    const bundle = await repo.loadLessonBundle(db, lessonId);
    if (!bundle) throw new AppError("not_found", "That lesson was not found.");
    return teacherLesson(bundle, await onlineParticipants(lessonId), publicUrl);
  }

  /** After any change: the public view to everyone in the lesson, the full view to its teacher. */
  async function lessonChanged(lessonId: string) {
    const bundle = await repo.loadLessonBundle(db, lessonId);
    if (!bundle) return;
    io.to(rooms.lesson(lessonId)).emit("lesson:changed", publicLesson(bundle));
    io.to(rooms.lessonTeacher(lessonId)).emit(
      "lesson:teacher-changed",
      teacherLesson(bundle, await onlineParticipants(lessonId), publicUrl),
    );
  }

  /**
   * The teacher's list of who is here, after joins and departures. A class joining at once would
   * otherwise rebuild the whole view once per pupil: changes within a short window share one.
   */
  const pendingTeacherViews = new Set<string>();
  function refreshTeacherView(lessonId: string) {
    if (pendingTeacherViews.has(lessonId)) return;
    pendingTeacherViews.add(lessonId);
    setTimeout(() => {
      pendingTeacherViews.delete(lessonId);
      teacherView(lessonId)
        .then((view) => io.to(rooms.lessonTeacher(lessonId)).emit("lesson:teacher-changed", view))
        .catch((error) => log("[lessons] teacher view after joins failed", error));
    }, TEACHER_VIEW_COALESCE_MS);
  }

  async function participantsChanged(lessonId: string) {
    const count = await repo.countParticipants(db, lessonId);
    io.to(rooms.lesson(lessonId)).emit("participants:counted", { lessonId, count });
    refreshTeacherView(lessonId);
  }

  function register(socket: IoSocket) {
    const who = (): service.SocketWho => ({ staffId: socket.data.staffId, participant: socket.data.participant });
    const listen = socket as unknown as { on(event: string, listener: (...args: unknown[]) => void): void };

    function handle<S extends z.ZodType>(event: string, schema: S, run: (input: z.output<S>) => Promise<Outcome>) {
      listen.on(event, (...args: unknown[]) => {
        const ack = args[args.length - 1];
        if (typeof ack !== "function") return;
        const reply = ack as Ack;
        const payload = args.length > 1 ? args[0] : undefined;
        void (async () => {
          const parsed = schema.safeParse(payload);
          if (!parsed.success) {
            reply({
              error: { code: "validation_failed", message: "Some of the details need correcting.", fields: fieldErrorsFromIssues(parsed.error.issues) },
            });
            return;
          }
          let outcome: Outcome;
          try {
            outcome = await run(parsed.data);
          } catch (error) {
            reply(await failure(event, error));
            return;
          }
          reply({ data: outcome.data });
          await outcome.after?.().catch((error) => log(`[lessons] broadcast after ${event} failed`, error));
        })();
      });
    }

    async function failure(event: string, error: unknown): Promise<AckReply<unknown>> {
      if (error instanceof service.RefusedError) {
        const used = auditCounts.get(socket) ?? 0;
        if (used < AUDIT_ROWS_PER_SOCKET) {
          auditCounts.set(socket, used + 1);
          await service.auditRefusal(db, error, event, socket.data.staffId).catch((e) => log("[lessons] audit failed", e));
        }
      }
      if (error instanceof AppError) {
        return { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) } };
      }
      log(`[lessons] ${event} failed`, error);
      return { error: { code: "internal_error", message: "Something went wrong on our side. Please try again." } };
    }

    // ---- Pupils ----

    handle("lesson:lookup", lessonCodeLookupSchema, async ({ code }) => ({ data: await service.lookUpLesson(db, code) }));

    handle("lesson:join", joinLessonInputSchema, async (input) => {
      const { session, isNew } = await service.joinLesson(db, input);
      const lessonId = session.lesson.id;
      const previous = socket.data.participant;
      if (previous && previous.lessonId !== lessonId) await socket.leave(rooms.lesson(previous.lessonId));
      socket.data.participant = { id: session.participant.id, lessonId, displayName: session.participant.displayName };
      await socket.join(rooms.lesson(lessonId));
      return {
        data: session,
        after: async () => {
          if (isNew) await participantsChanged(lessonId);
          else refreshTeacherView(lessonId);
        },
      };
    });

    handle("prediction:submit", predictionInputSchema, async (input) => {
      const result = await service.submitPrediction(db, who(), input);
      return {
        data: result.stored,
        after: async () => {
          if (!result.row) return;
          const count = await repo.countAnswers(db, input.trialId, input.round);
          io.to(rooms.lesson(result.lessonId)).emit("answers:counted", { trialId: input.trialId, round: input.round, count });
          io.to(rooms.lessonTeacher(result.lessonId)).emit("prediction:added", {
            trialId: input.trialId,
            prediction: teacherPrediction(result.row, result.displayName ?? ""),
          });
        },
      };
    });

    handle("explanation:submit", explanationInputSchema, async (input) => {
      const result = await service.submitExplanation(db, who(), input);
      return {
        data: result.stored,
        after: async () => {
          if (!result.row) return;
          io.to(rooms.lessonTeacher(result.lessonId)).emit("explanation:added", {
            trialId: input.trialId,
            explanation: teacherExplanation(result.row, result.displayName ?? ""),
          });
        },
      };
    });

    // ---- The lesson's teacher ----

    handle("lesson:watch", lessonIdInputSchema, async ({ lessonId }) => {
      await service.lessonForTeacher(db, who(), lessonId, "read");
      await socket.join([rooms.lessonTeacher(lessonId), rooms.lesson(lessonId)]);
      return { data: await teacherView(lessonId) };
    });

    const changes = (lessonId: string) => () => lessonChanged(lessonId);

    handle("trial:add", addTrialInputSchema, async (input) => {
      const { trialId } = await service.addTrial(db, who(), input);
      return { data: { trialId }, after: changes(input.lessonId) };
    });

    handle("trial:setup", trialSetupUpdateSchema, async (input) => {
      const { trialId, lessonId } = await service.setUpTrial(db, who(), input);
      return { data: { trialId }, after: changes(lessonId) };
    });

    handle("trial:show", currentTrialInputSchema, async (input) => {
      const data = await service.showTrial(db, who(), input);
      return { data, after: changes(input.lessonId) };
    });

    handle("trial:phase", movePhaseInputSchema, async (input) => {
      const { phase, lessonId } = await service.movePhase(db, who(), input);
      return { data: { phase }, after: changes(lessonId) };
    });

    handle("trial:result", trialResultInputSchema, async (input) => {
      const { trialId, lessonId } = await service.recordResult(db, who(), input);
      return { data: { trialId }, after: changes(lessonId) };
    });

    handle("trial:tally", tallyInputSchema, async (input) => {
      const { trialId, lessonId } = await service.recordTally(db, who(), input);
      return { data: { trialId }, after: changes(lessonId) };
    });

    handle("explanation:show", showExplanationInputSchema, async (input) => {
      const { explanationId, lessonId } = await service.showExplanation(db, who(), input);
      return { data: { explanationId }, after: changes(lessonId) };
    });

    handle("lesson:settings", lessonSettingsInputSchema, async (input) => {
      const data = await service.changeSettings(db, who(), input);
      return { data, after: changes(input.lessonId) };
    });

    handle("lesson:end", lessonIdInputSchema, async ({ lessonId }) => {
      const { justEnded } = await service.endLesson(db, who(), lessonId);
      if (justEnded) onEnded?.(lessonId);
      return { data: { lessonId }, after: changes(lessonId) };
    });

    handle("board:control", boardControlInputSchema, async ({ lessonId, action }) => {
      await service.lessonForTeacher(db, who(), lessonId, "write");
      return {
        data: { action },
        after: async () => void io.to(rooms.lessonTeacher(lessonId)).emit("board:controlled", { lessonId, action }),
      };
    });

    socket.on("disconnect", () => {
      const participant = socket.data.participant;
      if (!participant) return;
      // The teacher's list shows who is online; the public count is of everyone who joined.
      refreshTeacherView(participant.lessonId);
    });
  }

  io.on("connection", register);

  return {
    /** Tell everyone in the lesson that it changed (used by the HTTP routes too). */
    lessonChanged,
    /** A lesson was just ended over HTTP. */
    ended: (lessonId: string) => onEnded?.(lessonId),
  };
}
export type LessonLive = ReturnType<typeof createLessonLive>;
