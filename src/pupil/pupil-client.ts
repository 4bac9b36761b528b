/**
 * The pupil page's one connection and state: look up a lesson code, join (or rejoin with the
 * stored resume token), follow the lesson, and send answers through the outbox. React reads it
 * with useSyncExternalStore; nothing here touches the DOM.
 */
import type { Socket } from "socket.io-client";
import { v4 as uuidv4 } from "uuid";
import type { ErrorCode } from "@contracts/error-codes";
import type { LessonLookup, PublicLesson, PupilSession } from "@contracts/lessons";
import type { Round } from "@contracts/lesson-rules";
import type { AckReply, ClientToServerEvents, ServerToClientEvents } from "@contracts/socket-events";
import { Outbox, type SendOutcome } from "./outbox";
import {
  forgetStoredLesson,
  mergeMine,
  readStoredLesson,
  writeStoredLesson,
  type KeyValueStore,
  type OutboxEntry,
  type StoredLesson,
} from "./pupil-storage";

export type PupilSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** How long to wait for an acknowledgement before treating the answer as not sent. */
export const ACK_TIMEOUT_MS = 8000;
/** How soon to try again after no reply while still connected. */
export const RETRY_MS = 4000;

export type PupilStep = "code" | "name" | "joining" | "lesson" | "ended";

export interface PupilState {
  step: PupilStep;
  code: string | null;
  lookup: LessonLookup | null;
  lesson: PublicLesson | null;
  me: { id: string; displayName: string } | null;
  mine: PupilSession["mine"];
  outbox: readonly OutboxEntry[];
  connected: boolean;
  /** Connected at least once: a later drop shows "Reconnecting…" rather than "Connecting…". */
  everConnected: boolean;
  /** A request is on its way (lookup or join). */
  busy: boolean;
  /** Why the last lookup or join failed, for the form that asked. */
  error: { code: ErrorCode | "no_reply"; message: string } | null;
  /** A one-off message for the live region (e.g. an answer arrived too late). */
  notice: string | null;
}

type Reply<T> = { ok: true; data: T } | { ok: false; code: ErrorCode | "no_reply"; message: string };

const NO_REPLY_MESSAGE = "No reply from the lesson. Check your Wi-Fi and try again.";

export class PupilClient {
  private state: PupilState;
  private readonly listeners = new Set<() => void>();
  private outbox: Outbox | null = null;
  private stored: StoredLesson | null = null;
  /** This connection has rejoined the lesson, so answers may be sent on it. */
  private joinedOnThisConnection = false;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;

  constructor(
    private readonly socket: PupilSocket,
    private readonly store: KeyValueStore,
    initialCode: string | null,
  ) {
    this.state = {
      step: "code",
      code: null,
      lookup: null,
      lesson: null,
      me: null,
      mine: { predictions: [], explanations: [] },
      outbox: [],
      connected: socket.connected,
      everConnected: socket.connected,
      busy: false,
      error: null,
      notice: null,
    };
    socket.on("connect", () => this.onConnect());
    socket.on("disconnect", () => {
      this.joinedOnThisConnection = false;
      this.set({ connected: false });
    });
    socket.on("lesson:changed", (lesson) => this.onLessonChanged(lesson));
    socket.on("answers:counted", ({ trialId, round, count }) => this.onCounted(trialId, round, count));
    if (initialCode) this.openCode(initialCode);
  }

  // ---- for React ----
  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };
  getState = () => this.state;

  private set(patch: Partial<PupilState>) {
    this.state = { ...this.state, ...patch };
    for (const l of this.listeners) l();
  }

  // ---- requests with acknowledgements ----
  private async request<T>(send: (s: PupilSocket) => Promise<AckReply<T>>): Promise<Reply<T>> {
    try {
      const reply = await send(this.socket.timeout(ACK_TIMEOUT_MS) as unknown as PupilSocket);
      if ("data" in reply) return { ok: true, data: reply.data };
      return { ok: false, code: reply.error.code, message: reply.error.message };
    } catch {
      return { ok: false, code: "no_reply", message: NO_REPLY_MESSAGE };
    }
  }

  // ---- steps ----

  /** A code from the address or typed: rejoin if this device has been in that lesson, else look it up. */
  openCode(code: string) {
    this.stored = readStoredLesson(this.store, code);
    if (this.stored) {
      this.set({
        step: "joining",
        code,
        me: { id: this.stored.participantId, displayName: this.stored.displayName },
        mine: this.stored.mine,
        error: null,
      });
      this.outbox = this.makeOutbox(this.stored.outbox);
      this.set({ outbox: this.outbox.list() });
      if (this.socket.connected) void this.rejoin();
      return;
    }
    void this.lookup(code);
  }

  async lookup(code: string) {
    this.set({ code, busy: true, error: null });
    if (!this.socket.connected) await this.waitForConnection();
    const reply = await this.request<LessonLookup>((s) => s.emitWithAck("lesson:lookup", { code }));
    if (reply.ok) this.set({ step: "name", lookup: reply.data, busy: false });
    else if (reply.code === "lesson_ended") this.set({ step: "ended", busy: false });
    else this.set({ step: "code", busy: false, error: { code: reply.code, message: reply.message } });
  }

  /** Back to typing a code (e.g. the pupil typed the wrong one). */
  changeCode() {
    this.set({ step: "code", lookup: null, error: null });
  }

  async join(who: { name: string } | { rosterEntryId: string }) {
    const code = this.state.code;
    if (!code) return;
    this.set({ busy: true, error: null });
    const reply = await this.request<PupilSession>((s) => s.emitWithAck("lesson:join", { code, ...who }));
    if (!reply.ok) {
      if (reply.code === "lesson_ended") this.set({ step: "ended", busy: false });
      else this.set({ busy: false, error: { code: reply.code, message: reply.message } });
      return;
    }
    this.outbox = this.makeOutbox([]);
    this.acceptSession(reply.data, { predictions: [], explanations: [] });
    this.set({ busy: false });
  }

  private async rejoin() {
    const stored = this.stored;
    if (!stored) return;
    const reply = await this.request<PupilSession>((s) =>
      s.emitWithAck("lesson:join", { code: stored.code, resumeToken: stored.resumeToken }),
    );
    if (reply.ok) {
      this.acceptSession(reply.data, this.state.mine);
      this.joinedOnThisConnection = true;
      void this.flush();
      return;
    }
    if (reply.code === "no_reply") {
      // Keep everything; the next connection tries again.
      this.scheduleRetry(() => void this.rejoin());
      return;
    }
    if (reply.code === "lesson_ended") {
      this.end();
      return;
    }
    // The token is no longer known (e.g. the teacher removed pupil data): join again by name.
    forgetStoredLesson(this.store, stored.code);
    this.stored = null;
    this.outbox = null;
    this.set({ me: null, mine: { predictions: [], explanations: [] }, outbox: [], notice: reply.message });
    void this.lookup(stored.code);
  }

  private acceptSession(session: PupilSession, localMine: PupilSession["mine"]) {
    const mine = mergeMine(session.mine, localMine);
    this.stored = {
      code: session.lesson.code,
      resumeToken: session.participant.resumeToken,
      participantId: session.participant.id,
      displayName: session.participant.displayName,
      mine,
      outbox: [...(this.outbox?.list() ?? [])],
    };
    writeStoredLesson(this.store, this.stored);
    this.joinedOnThisConnection = this.socket.connected;
    if (session.lesson.status === "ended") {
      this.end();
      return;
    }
    this.set({
      step: "lesson",
      code: session.lesson.code,
      lesson: session.lesson,
      me: { id: session.participant.id, displayName: session.participant.displayName },
      mine,
    });
  }

  private end() {
    // Nothing more can be sent, and nothing about the pupil need stay on the device.
    if (this.state.code) forgetStoredLesson(this.store, this.state.code);
    this.stored = null;
    this.outbox = null;
    this.set({ step: "ended", outbox: [] });
  }

  // ---- events ----
  private onConnect() {
    this.set({ connected: true, everConnected: true });
    for (const resolve of this.connectWaiters.splice(0)) resolve();
    if (this.stored && (this.state.step === "joining" || this.state.step === "lesson")) void this.rejoin();
  }

  private connectWaiters: (() => void)[] = [];
  private waitForConnection(): Promise<void> {
    return new Promise((resolve) => this.connectWaiters.push(resolve));
  }

  private onLessonChanged(lesson: PublicLesson) {
    if (this.state.lesson && lesson.id !== this.state.lesson.id) return;
    if (lesson.status === "ended") {
      this.set({ lesson });
      this.end();
      return;
    }
    this.set({ lesson });
  }

  private onCounted(trialId: string, round: Round, count: number) {
    const lesson = this.state.lesson;
    if (!lesson?.trial || lesson.trial.id !== trialId) return;
    this.set({ lesson: { ...lesson, trial: { ...lesson.trial, answered: { ...lesson.trial.answered, [round]: count } } } });
  }

  // ---- answers ----
  submitPrediction(input: { trialId: string; round: Round; value: number | null; choice: number | null; reason: string }) {
    const clientId = uuidv4();
    this.queue({ kind: "prediction", clientId, payload: { ...input, clientId } });
  }

  submitExplanation(input: { trialId: string; text: string }) {
    const clientId = uuidv4();
    this.queue({ kind: "explanation", clientId, payload: { ...input, clientId } });
  }

  dismissNotice() {
    this.set({ notice: null });
  }

  private queue(entry: OutboxEntry) {
    if (!this.outbox) return;
    this.set({ notice: null });
    this.outbox.add(entry);
    void this.flush();
  }

  private async flush() {
    if (!this.outbox || !this.socket.connected || !this.joinedOnThisConnection) return;
    const result = await this.outbox.flush();
    if (result.stalled) this.scheduleRetry(() => void this.flush());
  }

  private scheduleRetry(run: () => void) {
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      if (this.socket.connected) run();
    }, RETRY_MS);
  }

  private makeOutbox(entries: OutboxEntry[]): Outbox {
    return new Outbox(entries, {
      send: (entry) => this.send(entry),
      persist: (list) => {
        this.set({ outbox: [...list] });
        if (this.stored) {
          this.stored = { ...this.stored, outbox: [...list] };
          writeStoredLesson(this.store, this.stored);
        }
      },
      onStored: (entry) => this.recordOwn(entry),
      onDropped: (_entry, message) => this.set({ notice: message }),
    });
  }

  private async send(entry: OutboxEntry): Promise<SendOutcome> {
    if (!this.socket.connected) return { kind: "no-reply" };
    const reply =
      entry.kind === "prediction"
        ? await this.request((s) => s.emitWithAck("prediction:submit", entry.payload))
        : await this.request((s) => s.emitWithAck("explanation:submit", entry.payload));
    if (reply.ok) return { kind: "stored", storedAt: reply.data.storedAt };
    if (reply.code === "no_reply") return { kind: "no-reply" };
    return { kind: "refused", code: reply.code, message: reply.message };
  }

  /** An acknowledged answer joins the pupil's own list (kept on the device for a reload). */
  private recordOwn(entry: OutboxEntry) {
    const mine = this.state.mine;
    const next: PupilSession["mine"] =
      entry.kind === "prediction"
        ? {
            ...mine,
            predictions: [
              ...mine.predictions.filter((p) => p.clientId !== entry.clientId),
              {
                trialId: entry.payload.trialId,
                round: entry.payload.round,
                clientId: entry.clientId,
                value: entry.payload.value ?? null,
                choice: entry.payload.choice ?? null,
                reason: entry.payload.reason ?? "",
              },
            ],
          }
        : {
            ...mine,
            explanations: [
              ...mine.explanations.filter((e) => e.clientId !== entry.clientId),
              { trialId: entry.payload.trialId, clientId: entry.clientId, text: entry.payload.text },
            ],
          };
    this.set({ mine: next });
    if (this.stored) {
      this.stored = { ...this.stored, mine: next };
      writeStoredLesson(this.store, this.stored);
    }
  }
}
