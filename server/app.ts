import { existsSync } from "node:fs";
import { createServer, type Server as HttpServer } from "node:http";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import compression from "compression";
import express, { type RequestHandler } from "express";
import helmet from "helmet";
import { sql } from "drizzle-orm";
import "./auth/auth.types";
import { authRoutes } from "./auth/auth.routes";
import { createPassport, type OAuthSettings } from "./auth/passport";
import { createSessionMiddleware } from "./auth/session";
import { benchRoutes } from "./bench/bench.routes";
import { createPhotoStore } from "./bench/photo-store";
import { classesRoutes } from "./classes/classes.routes";
import type { Database } from "./db/client";
import { departmentRoutes } from "./department/department.routes";
import { devMailRoutes } from "./dev-mail/dev-mail.routes";
import { AppError } from "./http/app-error";
import { apiNotFound, errorMiddleware } from "./http/error-middleware";
import { invitationsRoutes } from "./invitations/invitations.routes";
import { createLessonLive } from "./lessons/lessons.handlers";
import { lessonPlansRoutes } from "./lesson-plans/lesson-plans.routes";
import { lessonsRoutes } from "./lessons/lessons.routes";
import { lessonReviewRoutes } from "./lesson-review/lesson-review.routes";
import { plannedLessonsRoutes } from "./planned-lessons/planned-lessons.routes";
import { sendLessonSummary } from "./lesson-mail/lesson-summary.service";
import type { Mailer } from "./mail/mailer";
import { createRealtime, type IoServer, type Realtime } from "./realtime/realtime";
import { retentionRoutes } from "./retention/retention.routes";
import { DEFAULT_PURGE_SCHEDULE, startPurgeSchedule, type PurgeSchedule } from "./retention/retention.scheduler";
import { schoolRoutes } from "./school/school.routes";
import { staffRoutes } from "./staff/staff.routes";
import { DEFAULT_DIGEST_SCHEDULE, startDigestSchedule, type DigestSchedule } from "./digest/digest.scheduler";

export interface AppConfig {
  /** How people reach this server, e.g. https://linkleap.school.example (no trailing slash). */
  publicUrl: string;
  /** Demo mode: sign-in through the local provider, demo data. */
  demo: boolean;
  /** Secrets for the session cookie; the first signs, all verify (for rotation). */
  sessionSecret: string | string[];
  oauth: Omit<OAuthSettings, "callbackURL">;
  /** Further origins allowed to call the API and open sockets (the Vite dev server). */
  extraOrigins?: string[];
  /** Folder of the built client to serve, or null to serve the API only. */
  clientDir?: string | null;
  /** Periodically delete expired sessions (off in tests). */
  pruneSessions?: boolean;
  /** Express "trust proxy" setting when behind a reverse proxy that terminates TLS. */
  trustProxy?: boolean | number | string;
  /** Folder of the local SMTP server's captured messages, listed for admins in demo mode. */
  mailDir?: string | null;
  /** Cron pattern of the retention purge; null runs no schedule (tests run the purge themselves). */
  purgeSchedule?: string | null;
  /** Cron pattern of the heads of department's weekly digest; null runs no schedule (tests send it themselves). */
  digestSchedule?: string | null;
  /** Folder for uploaded photos of real runs (`<dataDir>/uploads`); files there have server-made names. */
  uploadsDir: string;
}

export interface AppDeps {
  config: AppConfig;
  database: Database;
  /** Sends invitations; the caller creates and closes it. */
  mailer: Pick<Mailer, "send">;
  log?: (message: string, error?: unknown) => void;
}

export interface LinkleapServer {
  app: express.Express;
  httpServer: HttpServer;
  io: IoServer;
  realtime: Realtime;
  listen(port: number, host?: string): Promise<AddressInfo>;
  close(): Promise<void>;
}

const defaultLog = (message: string, error?: unknown) =>
  error === undefined ? console.log(message) : console.error(message, error);

/** Builds the HTTP server, API, sockets and static client. Starting and stopping is the caller's. */
export function createApp({ config, database, mailer, log = defaultLog }: AppDeps): LinkleapServer {
  const { db, pool } = database;
  const publicUrl = config.publicUrl.replace(/\/$/, "");
  const secure = publicUrl.startsWith("https://");
  const allowedOrigins = [new URL(publicUrl).origin, ...(config.extraOrigins ?? [])];

  const app = express();
  const httpServer = createServer(app);
  app.disable("x-powered-by");
  if (config.trustProxy !== undefined) app.set("trust proxy", config.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // Fonts, scripts and styles all ship with the app: nothing from elsewhere.
          "img-src": ["'self'", "data:", "blob:"],
          "font-src": ["'self'", "data:"],
          "style-src": ["'self'", "'unsafe-inline'"],
          "connect-src": ["'self'", ...allowedOrigins],
          "upgrade-insecure-requests": secure ? [] : null,
        },
      },
      strictTransportSecurity: secure,
    }),
  );
  app.use(compression());

  const { middleware: sessionMiddleware } = createSessionMiddleware({
    pool,
    secret: config.sessionSecret,
    secureCookies: secure,
    prune: config.pruneSessions ?? true,
  });
  const passport = createPassport(db, { ...config.oauth, callbackURL: `${publicUrl}/auth/google/callback` });
  const passportSession = passport.session() as RequestHandler;

  const realtime = createRealtime(httpServer, { sessionMiddleware, passportSession, allowedOrigins });
  const lessonLive = createLessonLive({
    io: realtime.io,
    db,
    publicUrl,
    log,
    // The teacher's summary goes after the lesson has ended; a mail server that is down costs only the e-mail.
    onEnded: (lessonId) =>
      void sendLessonSummary(db, { mailer, publicUrl }, lessonId).catch((error) => log("[lessons] summary e-mail not sent", error)),
  });

  app.get("/api/health", async (_req, res) => {
    await db.execute(sql`select 1`);
    res.set("Cache-Control", "no-store").json({ ok: true });
  });

  app.use(express.json({ limit: "200kb" }));
  app.use(sameOriginWrites(allowedOrigins));
  app.use(sessionMiddleware);
  app.use(passportSession);

  app.use(
    authRoutes({
      db,
      passport,
      realtime,
      demo: config.demo,
      publicUrl,
      secureCookies: secure,
      log,
    }),
  );
  // One photo store: bench routes save and read photos; the purge and "delete now" remove them.
  const photos = createPhotoStore(config.uploadsDir);
  const purgeSchedule: PurgeSchedule | null =
    config.purgeSchedule === null ? null : startPurgeSchedule(db, { pattern: config.purgeSchedule ?? DEFAULT_PURGE_SCHEDULE, photos, log });

  const digestSchedule: DigestSchedule | null =
    config.digestSchedule === null
      ? null
      : startDigestSchedule(db, { pattern: config.digestSchedule ?? DEFAULT_DIGEST_SCHEDULE, mailer, publicUrl, log });

  app.use(invitationsRoutes({ db, mailer, publicUrl, log }));
  // Before the classes router: admins may delete a class's pupil data, and its guard would stop them.
  app.use(retentionRoutes(db, purgeSchedule, photos));
  app.use(schoolRoutes(db));
  app.use(classesRoutes(db));
  app.use(lessonsRoutes(db, lessonLive));
  app.use(plannedLessonsRoutes(db));
  app.use(lessonPlansRoutes(db));
  app.use(lessonReviewRoutes(db));
  app.use(benchRoutes(db, photos));
  app.use(departmentRoutes(db));
  app.use(staffRoutes(db, realtime));
  if (config.demo && config.mailDir) app.use(devMailRoutes(config.mailDir));
  app.use("/api", apiNotFound);

  const clientDir = config.clientDir;
  if (clientDir && existsSync(join(clientDir, "index.html"))) {
    app.use(
      "/assets",
      express.static(join(clientDir, "assets"), { immutable: true, maxAge: "365d", fallthrough: false }),
    );
    app.use(express.static(clientDir, { index: false, maxAge: "1h" }));
    // Every other page is the client's: React Router takes it from there.
    app.get("/{*splat}", (_req, res) => {
      // `root` keeps send's dot-file check to the file's own name (the folder may be under .data/).
      res.set("Cache-Control", "no-cache").sendFile("index.html", { root: clientDir });
    });
  }

  app.use(errorMiddleware(log));

  return {
    app,
    httpServer,
    io: realtime.io,
    realtime,
    listen(port, host = "127.0.0.1") {
      return new Promise((resolve, reject) => {
        httpServer.once("error", reject);
        httpServer.listen(port, host, () => {
          httpServer.off("error", reject);
          resolve(httpServer.address() as AddressInfo);
        });
      });
    },
    async close() {
      await purgeSchedule?.stop();
      await digestSchedule?.stop();
      // io.close() also closes the http server; end sockets first so it can finish.
      realtime.io.disconnectSockets(true);
      await new Promise<void>((resolve) => {
        realtime.io.close(() => resolve());
        httpServer.closeAllConnections();
      });
    },
  };
}

/**
 * Cookies are SameSite=Lax, and writes must also come from our own pages: a state-changing
 * request that names another origin is refused before it reaches any handler.
 */
function sameOriginWrites(allowedOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (req.method === "GET" || req.method === "HEAD" || req.method === "OPTIONS") return next();
    const origin = req.headers.origin;
    if (origin && !allowedOrigins.includes(origin)) {
      return next(new AppError("forbidden", "Requests must come from Linkleap's own pages."));
    }
    next();
  };
}
