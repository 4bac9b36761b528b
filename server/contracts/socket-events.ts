import { z } from "zod";
import type { ErrorCode } from "./error-codes";
import type {
  ExplanationInput,
  LessonLookup,
  PredictionInput,
  PublicLesson,
  PupilSession,
  TallyInput,
  TeacherExplanation,
  TeacherLesson,
  TeacherPrediction,
  TrialResultInput,
  TrialSetupInput,
  JoinLessonInput,
} from "./lessons";
import type { BoardControl, Round, TrialPhase } from "./lesson-rules";

/**
 * The one map of socket.io events, used as generics on both ends:
 * `Server<ClientToServerEvents, ServerToClientEvents, …>` and `Socket<ServerToClientEvents, ClientToServerEvents>`.
 * Requests are `entity:verb` and always acknowledged; broadcasts are past tense. Every payload is
 * checked with the zod schema in `lessons.ts` on the server. Bump PROTOCOL_VERSION on any breaking change.
 */
export { PROTOCOL_VERSION } from "./protocol";

export const handshakeAuthSchema = z.object({
  protocol: z.number().int(),
});
export type HandshakeAuth = z.infer<typeof handshakeAuthSchema>;

export type AckReply<T> = { data: T } | { error: { code: ErrorCode; message: string; fields?: Record<string, string[]> } };
export type Ack<T> = (reply: AckReply<T>) => void;

export interface ServerToClientEvents {
  /** This browser's staff session ended (signed out here or elsewhere, or access removed). */
  "session:ended": (payload: { reason: "signed_out" | "signed_out_everywhere" | "access_changed" }) => void;
  /** This member of staff's role or details changed: fetch the session again. */
  "session:changed": () => void;

  // To everyone in a lesson (pupils, board, remote): no names, no answers before the run.
  /** The lesson's public state changed (set-up, phase, result, shown explanations, ended). */
  "lesson:changed": (lesson: PublicLesson) => void;
  /** Another answer arrived: counts only. */
  "answers:counted": (payload: { trialId: string; round: Round; count: number }) => void;
  /** A pupil joined or left. */
  "participants:counted": (payload: { lessonId: string; count: number }) => void;

  // To the lesson's teacher only (board and remote).
  /** The full teacher view changed (anything but a single new answer). */
  "lesson:teacher-changed": (lesson: TeacherLesson) => void;
  /** One new or changed prediction. */
  "prediction:added": (payload: { trialId: string; prediction: TeacherPrediction }) => void;
  /** One new explanation, for the teacher to choose whether to show. */
  "explanation:added": (payload: { trialId: string; explanation: TeacherExplanation }) => void;
  /** The remote asked the board's player to play or pause, change speed, or replay. */
  "board:controlled": (payload: { lessonId: string; action: BoardControl }) => void;
}

export interface ClientToServerEvents {
  /** Who this connection is, as the server sees it. */
  "session:whoami": (ack: Ack<{ staffId: string | null }>) => void;

  // Pupils (no account).
  /** Before joining: is this code open, and is there a roster to pick from? */
  "lesson:lookup": (payload: { code: string }, ack: Ack<LessonLookup>) => void;
  /** Join (or rejoin with a resume token) as a participant. */
  "lesson:join": (payload: JoinLessonInput, ack: Ack<PupilSession>) => void;
  /** Acknowledged only once stored; a resend with the same clientId is stored once. */
  "prediction:submit": (payload: PredictionInput, ack: Ack<{ clientId: string; storedAt: string }>) => void;
  "explanation:submit": (payload: ExplanationInput, ack: Ack<{ clientId: string; storedAt: string }>) => void;

  // The lesson's teacher (board and remote). Refused for anyone else.
  /** Open the teacher view of a lesson and receive its updates. */
  "lesson:watch": (payload: { lessonId: string }, ack: Ack<TeacherLesson>) => void;
  "trial:add": (
    payload: { lessonId: string; copyOf?: string | null; setup?: TrialSetupInput | null },
    ack: Ack<{ trialId: string }>,
  ) => void;
  /** Change a trial's rig, parameters or question (phase "set up" only). */
  "trial:setup": (payload: TrialSetupInput & { trialId: string }, ack: Ack<{ trialId: string }>) => void;
  /** Make a trial the one everybody sees. */
  "trial:show": (payload: { lessonId: string; trialId: string }, ack: Ack<{ trialId: string }>) => void;
  "trial:phase": (payload: { trialId: string; phase: TrialPhase }, ack: Ack<{ phase: TrialPhase }>) => void;
  /** The board's simulation finished: record what it measured. */
  "trial:result": (payload: TrialResultInput, ack: Ack<{ trialId: string }>) => void;
  "trial:tally": (payload: TallyInput, ack: Ack<{ trialId: string }>) => void;
  "explanation:show": (payload: { explanationId: string; shown: boolean }, ack: Ack<{ explanationId: string }>) => void;
  "lesson:settings": (payload: { lessonId: string; showNames: boolean }, ack: Ack<{ showNames: boolean }>) => void;
  "lesson:end": (payload: { lessonId: string }, ack: Ack<{ lessonId: string }>) => void;
  /** From the remote: passed to the lesson's board (its teacher's devices only). */
  "board:control": (payload: { lessonId: string; action: BoardControl }, ack: Ack<{ action: BoardControl }>) => void;
}

export interface SocketData {
  staffId: string | null;
  sessionId: string | null;
  /** Set once a pupil's device has joined a lesson. */
  participant: { id: string; lessonId: string; displayName: string } | null;
}

/** Rooms: a staff connection joins its session and staff rooms; lessons have a public and a teacher room. */
export const rooms = {
  session: (sessionId: string) => `session:${sessionId}`,
  staff: (staffId: string) => `staff:${staffId}`,
  lesson: (lessonId: string) => `lesson:${lessonId}`,
  lessonTeacher: (lessonId: string) => `lesson-teacher:${lessonId}`,
} as const;
