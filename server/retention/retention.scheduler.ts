import { Cron } from "croner";
import type { PhotoStore } from "../bench/photo-store";
import type { Db } from "../db/client";
import { lastSuccessfulPurgeAt, runPurge, type PurgeTrigger } from "./retention.purge";

/** Every night at 02:30, server time: outside lessons. */
export const DEFAULT_PURGE_SCHEDULE = "30 2 * * *";
const DAY_MS = 24 * 60 * 60 * 1000;

export interface PurgeSchedule {
  nextRunAt(): Date | null;
  /** Stops the timer and waits for a run in progress to finish. */
  stop(): Promise<void>;
}

/**
 * Runs the retention purge on a croner schedule. If no run has succeeded in the last day (the
 * server was off at 02:30), one runs straight after start-up too, so deletion cannot be skipped
 * by a server that is only on in the daytime.
 */
export function startPurgeSchedule(
  db: Db,
  options: { pattern?: string; catchUp?: boolean; photos: PhotoStore; log: (message: string, error?: unknown) => void },
): PurgeSchedule {
  const inFlight = new Set<Promise<unknown>>();
  const track = <T>(promise: Promise<T>): Promise<T> => {
    inFlight.add(promise);
    void promise.finally(() => inFlight.delete(promise)).catch(() => {});
    return promise;
  };
  const run = (trigger: PurgeTrigger): Promise<void> =>
    track(
      runPurge(db, { trigger, photos: options.photos, log: options.log })
        .then((result) => {
          if (result.skipped) return;
          const total = result.deletions.reduce((sum, d) => sum + d.count, 0);
          options.log(`[purge] ${trigger} run deleted ${total} ${total === 1 ? "row" : "rows"} of pupil data past retention`);
        })
        .catch((error) => options.log("[purge] run failed", error)),
    );

  // `protect`: a run still going when the next is due is not started twice.
  const cron = new Cron(options.pattern ?? DEFAULT_PURGE_SCHEDULE, { protect: true }, () => run("schedule"));

  if (options.catchUp ?? true) {
    void track(
      lastSuccessfulPurgeAt(db)
        .then((last) => (last && Date.now() - last.getTime() < DAY_MS ? undefined : run("start-up")))
        .catch((error) => options.log("[purge] could not check the last run", error)),
    );
  }

  return {
    nextRunAt: () => cron.nextRun(),
    async stop() {
      cron.stop();
      while (inFlight.size) await Promise.allSettled([...inFlight]);
    },
  };
}
