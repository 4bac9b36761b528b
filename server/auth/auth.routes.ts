import { Router, type NextFunction, type Request, type Response } from "express";
import { sql } from "drizzle-orm";
import type { SessionInfo } from "../contracts/session";
import type { Me } from "../contracts/staff";
import type { Db } from "../db/client";
import type { Realtime } from "../realtime/realtime";
import type { Actor } from "../staff/staff.repository";
import { requireStaff, actorOf } from "./guards";
import type { AppPassport, SignInRefusal } from "./passport";
import { SESSION_COOKIE } from "./session";

export function toMe(actor: Actor): Me {
  return {
    id: actor.id,
    displayName: actor.displayName,
    email: actor.email,
    role: actor.role,
    school: { id: actor.schoolId, name: actor.schoolName, timeZone: actor.schoolTimeZone },
    department:
      actor.departmentId && actor.departmentName ? { id: actor.departmentId, name: actor.departmentName } : null,
  };
}

/** Only local paths: an open redirect after sign-in would hand a teacher to another site. */
export function safeReturnTo(value: unknown): string | undefined {
  if (typeof value !== "string" || value.length > 300) return undefined;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return undefined;
  if (value.startsWith("/auth/") || /[\u0000-\u001f]/.test(value)) return undefined;
  return value;
}

/**
 * Keeps a notice for the sign-in page and redirects there once it is stored: express-session
 * would otherwise send the redirect while still saving, and the next page could miss the notice.
 */
export function redirectWithNotice(
  req: Request,
  res: Response,
  next: NextFunction,
  notice: NonNullable<SessionInfo["notice"]>,
  to: string,
) {
  req.session.signInNotice = notice;
  req.session.save((error) => (error ? next(error) : res.redirect(to)));
}

interface AuthRouteDeps {
  db: Db;
  passport: AppPassport;
  realtime: Pick<Realtime, "endSession" | "endStaff">;
  demo: boolean;
  publicUrl: string;
  secureCookies: boolean;
  log: (msg: string, error?: unknown) => void;
}

export function authRoutes({ db, passport, realtime, demo, publicUrl, secureCookies, log }: AuthRouteDeps) {
  const router = Router();
  const publicHost = new URL(publicUrl).host;

  router.get("/auth/google", (req, res, next) => {
    // The provider returns to PUBLIC_URL; start from the same host, or the session cookie
    // that holds the state would not come back (localhost vs 127.0.0.1).
    if (req.headers.host !== publicHost) return res.redirect(`${publicUrl}${req.originalUrl}`);
    delete req.session.signInNotice;
    const returnTo = safeReturnTo(req.query.returnTo);
    if (returnTo) req.session.returnTo = returnTo;
    passport.authenticate("google", { prompt: "select_account" })(req, res, next);
  });

  router.get("/auth/google/callback", (req, res, next) => {
    if (typeof req.query.error === "string") {
      const kind = req.query.error === "access_denied" ? "sign_in_cancelled" : "sign_in_failed";
      return redirectWithNotice(req, res, next, { kind }, "/sign-in");
    }
    passport.authenticate("google", (error: unknown, user: Express.User | false, info?: SignInRefusal | { message?: string }) => {
      if (error || !user) {
        if (error) log("[auth] sign-in failed", error);
        if (info && "kind" in info && info.kind === "not_invited") {
          return redirectWithNotice(req, res, next, { kind: "not_invited", email: info.email }, "/sign-in/not-invited");
        }
        if (info && "kind" in info && (info.kind === "invitation_closed" || info.kind === "invitation_other_account")) {
          return redirectWithNotice(req, res, next, info, "/sign-in");
        }
        return redirectWithNotice(req, res, next, { kind: "sign_in_failed" }, "/sign-in");
      }
      const returnTo = req.session.returnTo;
      // req.logIn regenerates the session (no fixation); returnTo is read before that.
      req.logIn(user, (loginError) => {
        if (loginError) return next(loginError);
        res.redirect(returnTo ?? "/");
      });
    })(req, res, next);
  });

  const clearCookie = (res: Response) =>
    res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: "lax", secure: secureCookies, path: "/" });

  router.post("/auth/sign-out", (req, res, next) => {
    const sessionId = req.sessionID;
    req.session.destroy((error) => {
      if (error) return next(error);
      realtime.endSession(sessionId, "signed_out");
      clearCookie(res).status(204).end();
    });
  });

  router.post("/auth/sign-out-everywhere", requireStaff, async (req: Request, res, next) => {
    const actor = actorOf(req);
    try {
      await db.execute(sql`delete from "session" where sess -> 'passport' ->> 'user' = ${actor.id}`);
      realtime.endStaff(actor.id, "signed_out_everywhere");
      clearCookie(res).status(204).end();
    } catch (error) {
      next(error);
    }
  });

  router.get("/api/session", (req, res) => {
    const body: SessionInfo = {
      user: req.user ? toMe(req.user) : null,
      notice: req.user ? null : (req.session.signInNotice ?? null),
      demo,
    };
    res.set("Cache-Control", "no-store").json(body);
  });

  return router;
}
