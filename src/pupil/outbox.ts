/**
 * Answers waiting for the server's word that it stored them. Each entry carries an id made on the
 * device, so sending it again (after a timeout, a reconnect or a reload) is stored once. An entry
 * leaves only when the server acknowledges it, or refuses it for good (e.g. predictions closed);
 * on no reply it stays and is sent again later.
 */
import type { ErrorCode } from "@contracts/error-codes";
import type { OutboxEntry } from "./pupil-storage";

export type SendOutcome =
  | { kind: "stored"; storedAt: string }
  | { kind: "refused"; code: ErrorCode; message: string }
  /** Timed out, or the connection dropped before the reply. */
  | { kind: "no-reply" };

/**
 * Refusals worth trying again: the device has not rejoined yet, or the server had a passing fault.
 * Any other refusal would be refused again, so the entry is dropped and the pupil told why.
 */
const RETRYABLE: readonly ErrorCode[] = ["unauthenticated", "forbidden", "internal_error"];

export interface OutboxDeps {
  send(entry: OutboxEntry): Promise<SendOutcome>;
  /** Called with the entries after every change, to keep them in localStorage. */
  persist(entries: OutboxEntry[]): void;
  onStored(entry: OutboxEntry, storedAt: string): void;
  onDropped(entry: OutboxEntry, message: string): void;
}

/** The message shown when an answer arrives too late; the server's own words win if it gives some. */
export function refusalMessage(entry: OutboxEntry, code: ErrorCode, message: string): string {
  if (message) return message;
  if (code === "phase_closed")
    return entry.kind === "prediction" ? "Predictions for this trial are closed." : "Explanations for this trial are closed.";
  return "Your answer could not be stored.";
}

/** Two entries answer the same thing (a changed answer replaces one not yet sent). */
function sameSlot(a: OutboxEntry, b: OutboxEntry): boolean {
  if (a.kind === "prediction" && b.kind === "prediction")
    return a.payload.trialId === b.payload.trialId && a.payload.round === b.payload.round;
  if (a.kind === "explanation" && b.kind === "explanation") return a.payload.trialId === b.payload.trialId;
  return false;
}

export interface FlushResult {
  /** Some entry got no reply (or a passing refusal): try again later. */
  stalled: boolean;
  left: number;
}

export class Outbox {
  private entries: OutboxEntry[];
  private running: Promise<FlushResult> | null = null;
  private again = false;

  constructor(
    entries: OutboxEntry[],
    private readonly deps: OutboxDeps,
  ) {
    this.entries = [...entries];
  }

  list(): readonly OutboxEntry[] {
    return this.entries;
  }

  has(clientId: string): boolean {
    return this.entries.some((e) => e.clientId === clientId);
  }

  /** Queues an answer; an unsent earlier answer to the same question is replaced. */
  add(entry: OutboxEntry): void {
    this.entries = [...this.entries.filter((e) => !sameSlot(e, entry)), entry];
    this.deps.persist(this.entries);
  }

  private remove(clientId: string): void {
    const before = this.entries.length;
    this.entries = this.entries.filter((e) => e.clientId !== clientId);
    if (this.entries.length !== before) this.deps.persist(this.entries);
  }

  /**
   * Sends every entry, oldest first, one at a time (so a changed answer reaches the server after
   * the one it replaces). A call while a flush runs makes that flush go round once more.
   */
  flush(): Promise<FlushResult> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = this.run().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  private async run(): Promise<FlushResult> {
    let stalled = false;
    do {
      this.again = false;
      stalled = false;
      for (const entry of [...this.entries]) {
        // Replaced while an earlier entry was on its way.
        if (!this.has(entry.clientId)) continue;
        const outcome = await this.deps.send(entry);
        if (outcome.kind === "stored") {
          this.remove(entry.clientId);
          this.deps.onStored(entry, outcome.storedAt);
        } else if (outcome.kind === "refused" && !RETRYABLE.includes(outcome.code)) {
          this.remove(entry.clientId);
          this.deps.onDropped(entry, refusalMessage(entry, outcome.code, outcome.message));
        } else {
          // No reply: the connection is likely poor, so stop here and keep the order for the retry.
          stalled = true;
          break;
        }
      }
    } while (this.again && !stalled);
    return { stalled, left: this.entries.length };
  }
}
