import { Cron } from "croner";
import type { Db } from "../db/client";
import type { Mailer } from "../mail/mailer";
import { sendWeeklyDigests } from "./digest.service";

/** Mondays at 07:00, server time: before the school day. */
export const DEFAULT_DIGEST_SCHEDULE = "0 7 * * 1";

export interface DigestSchedule {
  stop(): Promise<void>;
}

/** Sends the weekly digests on a croner schedule; a run missed while the server was off is sent at the next one (same week). */
export function startDigestSchedule(
  db: Db,
  options: { pattern?: string; mailer: Pick<Mailer, "send">; publicUrl: string; log: (message: string, error?: unknown) => void },
): DigestSchedule {
  let running: Promise<unknown> | null = null;
  const cron = new Cron(options.pattern ?? DEFAULT_DIGEST_SCHEDULE, { protect: true }, () => {
    running = sendWeeklyDigests(db, { mailer: options.mailer, publicUrl: options.publicUrl, log: options.log })
      .then((r) => options.log(`[digest] sent ${r.sent}, quiet week ${r.quiet}, already done ${r.skipped}, failed ${r.failed}`))
      .catch((error) => options.log("[digest] run failed", error));
  });
  return {
    async stop() {
      cron.stop();
      await running;
    },
  };
}
