import { describe, expect, it } from "vitest";
import { Outbox, type SendOutcome } from "./outbox";
import type { OutboxEntry } from "./pupil-storage";

const TRIAL = "7d1f2a0e-4b7c-4f51-9a38-0c5e6a1d2b3f";

function prediction(clientId: string, value: number, round: 1 | 2 = 1): OutboxEntry {
  return { kind: "prediction", clientId, payload: { trialId: TRIAL, round, clientId, value, choice: null, reason: "" } };
}

/** An outbox whose server answers from a script of outcomes, recording every send. */
function harness(script: SendOutcome[], start: OutboxEntry[] = []) {
  const sent: string[] = [];
  const persisted: string[][] = [];
  const stored: string[] = [];
  const dropped: { clientId: string; message: string }[] = [];
  const outbox = new Outbox(start, {
    async send(entry) {
      sent.push(entry.clientId);
      return script.shift() ?? { kind: "no-reply" };
    },
    persist: (entries) => persisted.push(entries.map((e) => e.clientId)),
    onStored: (entry) => stored.push(entry.clientId),
    onDropped: (entry, message) => dropped.push({ clientId: entry.clientId, message }),
  });
  return { outbox, sent, persisted, stored, dropped };
}

describe("outbox", () => {
  it("keeps an answer that got no reply and resends it with the same id until it is acknowledged", async () => {
    const h = harness([{ kind: "no-reply" }, { kind: "no-reply" }, { kind: "stored", storedAt: "2026-12-02T09:00:00Z" }]);
    h.outbox.add(prediction("a1", 12.5));

    expect(await h.outbox.flush()).toEqual({ stalled: true, left: 1 });
    expect(h.outbox.has("a1")).toBe(true);
    expect(await h.outbox.flush()).toEqual({ stalled: true, left: 1 });
    expect(h.stored).toEqual([]);

    expect(await h.outbox.flush()).toEqual({ stalled: false, left: 0 });
    expect(h.sent).toEqual(["a1", "a1", "a1"]);
    expect(h.stored).toEqual(["a1"]);
    expect(h.outbox.has("a1")).toBe(false);
    // Kept in storage until the acknowledgement, then removed.
    expect(h.persisted).toEqual([["a1"], []]);
  });

  it("drops an answer refused because predictions closed, with the message", async () => {
    const h = harness([{ kind: "refused", code: "phase_closed", message: "" }]);
    h.outbox.add(prediction("late", 3));
    await h.outbox.flush();
    expect(h.outbox.list()).toEqual([]);
    expect(h.stored).toEqual([]);
    expect(h.dropped).toEqual([{ clientId: "late", message: "Predictions for this trial are closed." }]);
  });

  it("keeps an answer refused only because the device has not rejoined yet", async () => {
    const h = harness([{ kind: "refused", code: "unauthenticated", message: "Join the lesson first." }]);
    h.outbox.add(prediction("early", 3));
    expect(await h.outbox.flush()).toEqual({ stalled: true, left: 1 });
    expect(h.dropped).toEqual([]);
  });

  it("sends entries left from an earlier visit (a reload) oldest first with their stored ids", async () => {
    const explanation: OutboxEntry = { kind: "explanation", clientId: "e1", payload: { trialId: TRIAL, clientId: "e1", text: "Because." } };
    const h = harness(
      [
        { kind: "stored", storedAt: "t1" },
        { kind: "stored", storedAt: "t2" },
      ],
      [prediction("p1", 4), explanation],
    );
    await h.outbox.flush();
    expect(h.sent).toEqual(["p1", "e1"]);
    expect(h.stored).toEqual(["p1", "e1"]);
  });

  it("stops at the first entry without a reply, so the order is kept for the retry", async () => {
    const h = harness([{ kind: "no-reply" }], [prediction("r1", 1, 1), prediction("r2", 2, 2)]);
    await h.outbox.flush();
    expect(h.sent).toEqual(["r1"]);
    expect(h.outbox.list().map((e) => e.clientId)).toEqual(["r1", "r2"]);
  });

  it("a changed answer replaces an unsent one to the same question, but not the other round", () => {
    const h = harness([]);
    h.outbox.add(prediction("first", 10, 1));
    h.outbox.add(prediction("revote", 11, 2));
    h.outbox.add(prediction("changed", 12, 1));
    expect(h.outbox.list().map((e) => e.clientId)).toEqual(["revote", "changed"]);
  });

  it("a flush asked for during a flush goes round again and sends the new entry", async () => {
    let release!: () => void;
    const sent: string[] = [];
    const outbox = new Outbox([], {
      async send(entry) {
        sent.push(entry.clientId);
        if (entry.clientId === "slow") await new Promise<void>((r) => (release = r));
        return { kind: "stored", storedAt: "t" };
      },
      persist: () => {},
      onStored: () => {},
      onDropped: () => {},
    });
    outbox.add(prediction("slow", 1, 1));
    const first = outbox.flush();
    outbox.add(prediction("next", 2, 2));
    const second = outbox.flush();
    release();
    expect(await first).toEqual({ stalled: false, left: 0 });
    expect(await second).toEqual({ stalled: false, left: 0 });
    expect(sent).toEqual(["slow", "next"]);
  });
});
