import { afterEach, describe, expect, it, vi } from "vitest";
import type { PublicLesson, PupilSession } from "@contracts/lessons";
import type { AckReply } from "@contracts/socket-events";
import { ACK_TIMEOUT_MS, PupilClient, RETRY_MS, type PupilSocket } from "./pupil-client";
import { readStoredLesson } from "./pupil-storage";

const CODE = "CEK7XA";
const TRIAL_ID = "0d6f5a2c-1b1e-4c55-8d7a-3e1f2a9b6c40";

const lesson: PublicLesson = {
  id: "9e0c1b5a-6f43-4f0e-9b1d-2c3a4d5e6f70",
  code: CODE,
  className: "8B Science",
  status: "open",
  joinedCount: 1,
  trialCount: 1,
  trial: null,
};

type Handler = (payload: unknown) => AckReply<unknown> | "no-reply";

/**
 * A stand-in for the socket: the test decides when it connects and drops, and answers each
 * request with a handler (or no reply, which the timeout turns into an error, as socket.io does).
 */
function fakeSocket(handlers: Record<string, Handler>) {
  const listeners = new Map<string, ((...args: unknown[]) => void)[]>();
  const sent: { event: string; payload: unknown }[] = [];
  const socket = {
    connected: false,
    on(event: string, fn: (...args: unknown[]) => void) {
      listeners.set(event, [...(listeners.get(event) ?? []), fn]);
      return socket;
    },
    timeout(ms: number) {
      return {
        emitWithAck(event: string, payload: unknown) {
          sent.push({ event, payload });
          const reply = handlers[event]?.(payload) ?? "no-reply";
          if (reply === "no-reply") return new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), ms));
          return Promise.resolve(reply);
        },
      };
    },
  };
  const fire = (event: string, ...args: unknown[]) => listeners.get(event)?.forEach((fn) => fn(...args));
  return {
    socket: socket as unknown as PupilSocket,
    sent,
    connect() {
      socket.connected = true;
      fire("connect");
    },
    drop() {
      socket.connected = false;
      fire("disconnect", "transport close");
    },
    fire,
  };
}

function memoryStore() {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k: string) => map.get(k) ?? null,
    setItem: (k: string, v: string) => void map.set(k, v),
    removeItem: (k: string) => void map.delete(k),
  };
}

const session = (mine: PupilSession["mine"] = { predictions: [], explanations: [] }): PupilSession => ({
  lesson,
  participant: { id: "p-1", displayName: "Noor B.", resumeToken: "t".repeat(40) },
  mine,
});

afterEach(() => {
  vi.useRealTimers();
});

describe("pupil connection", () => {
  it("a reply lost on a dropped connection: rejoins with the resume token and resends the same id", async () => {
    vi.useFakeTimers();
    let predictionReplies = 0;
    const fake = fakeSocket({
      "lesson:lookup": () => ({ data: { lessonId: lesson.id, className: lesson.className, roster: null } }),
      "lesson:join": () => ({ data: session() }),
      "prediction:submit": (p) => (predictionReplies++ === 0 ? "no-reply" : { data: { clientId: (p as { clientId: string }).clientId, storedAt: "now" } }),
    });
    const store = memoryStore();
    const client = new PupilClient(fake.socket, store, CODE);
    fake.connect();
    await vi.waitFor(() => expect(client.getState().step).toBe("name"));
    await client.join({ name: "Noor B." });
    expect(client.getState().step).toBe("lesson");

    client.submitPrediction({ trialId: TRIAL_ID, round: 1, value: 12.5, choice: null, reason: "" });
    expect(readStoredLesson(store, CODE)?.outbox).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(ACK_TIMEOUT_MS + 10);
    fake.drop();
    expect(client.getState().connected).toBe(false);
    expect(client.getState().outbox).toHaveLength(1);

    fake.connect();
    await vi.advanceTimersByTimeAsync(0);
    const events = fake.sent.map((s) => s.event);
    expect(events).toEqual(["lesson:lookup", "lesson:join", "prediction:submit", "lesson:join", "prediction:submit"]);
    expect(fake.sent[3]!.payload).toEqual({ code: CODE, resumeToken: "t".repeat(40) });
    const ids = fake.sent.filter((s) => s.event === "prediction:submit").map((s) => (s.payload as { clientId: string }).clientId);
    expect(ids[0]).toBe(ids[1]);
    expect(client.getState().outbox).toEqual([]);
    expect(client.getState().mine.predictions.map((p) => p.value)).toEqual([12.5]);
    expect(readStoredLesson(store, CODE)?.mine.predictions).toHaveLength(1);
  });

  it("after a reload, rejoins without the name and sends what was left in the outbox", async () => {
    const store = memoryStore();
    const clientId = "5b0c2f3e-8a7d-4e61-b1c9-0d2e3f4a5b6c";
    store.setItem(
      `linkleap.pupil.${CODE}`,
      JSON.stringify({
        resumeToken: "t".repeat(40),
        participantId: "p-1",
        displayName: "Noor B.",
        mine: { predictions: [], explanations: [] },
        outbox: [{ kind: "prediction", clientId, payload: { trialId: TRIAL_ID, round: 1, clientId, value: 3, choice: null, reason: "" } }],
      }),
    );
    const fake = fakeSocket({
      "lesson:join": () => ({ data: session() }),
      "prediction:submit": () => ({ error: { code: "phase_closed", message: "" } }),
    });
    const client = new PupilClient(fake.socket, store, CODE);
    expect(client.getState().step).toBe("joining");
    expect(client.getState().me?.displayName).toBe("Noor B.");
    fake.connect();
    await vi.waitFor(() => expect(client.getState().notice).toBe("Predictions for this trial are closed."));
    expect(fake.sent.map((s) => s.event)).toEqual(["lesson:join", "prediction:submit"]);
    expect((fake.sent[1]!.payload as { clientId: string }).clientId).toBe(clientId);
    expect(client.getState().outbox).toEqual([]);
    expect(readStoredLesson(store, CODE)?.outbox).toEqual([]);
  });

  it("while a reply is missing but the connection holds, tries again after a pause", async () => {
    vi.useFakeTimers();
    let calls = 0;
    const fake = fakeSocket({
      "lesson:join": () => ({ data: session() }),
      "prediction:submit": (p) => (calls++ === 0 ? "no-reply" : { data: { clientId: (p as { clientId: string }).clientId, storedAt: "now" } }),
    });
    const store = memoryStore();
    store.setItem(`linkleap.pupil.${CODE}`, JSON.stringify({ resumeToken: "t".repeat(40), participantId: "p-1", displayName: "Noor B.", mine: {}, outbox: [] }));
    const client = new PupilClient(fake.socket, store, CODE);
    fake.connect();
    await vi.advanceTimersByTimeAsync(0);
    client.submitPrediction({ trialId: TRIAL_ID, round: 1, value: 7, choice: null, reason: "" });
    await vi.advanceTimersByTimeAsync(ACK_TIMEOUT_MS + 10);
    expect(client.getState().outbox).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(RETRY_MS + 10);
    expect(calls).toBe(2);
    expect(client.getState().outbox).toEqual([]);
  });

  it("when the lesson ends, shows the end and keeps nothing on the device", async () => {
    const fake = fakeSocket({ "lesson:join": () => ({ data: session() }) });
    const store = memoryStore();
    store.setItem(`linkleap.pupil.${CODE}`, JSON.stringify({ resumeToken: "t".repeat(40), participantId: "p-1", displayName: "Noor B.", mine: {}, outbox: [] }));
    const client = new PupilClient(fake.socket, store, CODE);
    fake.connect();
    await vi.waitFor(() => expect(client.getState().step).toBe("lesson"));
    fake.fire("lesson:changed", { ...lesson, status: "ended" });
    expect(client.getState().step).toBe("ended");
    expect(store.map.size).toBe(0);
  });
});
