import { Router } from "express";
import type { CapturedMail } from "../contracts/captured-mail";
import { actorOf, requireStaff } from "../auth/guards";
import { readCapturedMail } from "../devstack/mail-catcher";
import { notFound } from "../http/app-error";

/** How many of the newest messages the page lists. */
const LIMIT = 100;

/**
 * The messages the demo's local SMTP server caught, for school admins. Mounted only in demo
 * mode; for anyone but an admin the page does not exist (404), as in production.
 */
export function devMailRoutes(mailDir: string) {
  const router = Router();
  router.get("/api/dev/mail", requireStaff, async (req, res) => {
    if (actorOf(req).role !== "admin") throw notFound("That page");
    const messages = await readCapturedMail(mailDir, LIMIT);
    const body: CapturedMail[] = messages.map(({ id, receivedAt, from, to, subject, text }) => ({ id, receivedAt, from, to, subject, text }));
    res.set("Cache-Control", "no-store").json(body);
  });
  return router;
}
