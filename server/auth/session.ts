import connectPgSimple from "connect-pg-simple";
import session from "express-session";
import type pg from "pg";

export const SESSION_COOKIE = "linkleap.sid";
/** A school day: a board left signed in on a shared computer does not stay signed in for long. */
export const SESSION_MAX_AGE_MS = 10 * 60 * 60 * 1000;

export interface SessionOptions {
  pool: pg.Pool;
  secret: string | string[];
  secureCookies: boolean;
  /** Prune expired rows periodically (off in tests, which must not leave timers behind). */
  prune: boolean;
}

/** express-session stored in Postgres (the `session` table from our own migrations). */
export function createSessionMiddleware(options: SessionOptions) {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool: options.pool,
    tableName: "session",
    createTableIfMissing: false,
    pruneSessionInterval: options.prune ? 15 * 60 : false,
  });
  const middleware = session({
    name: SESSION_COOKIE,
    store,
    secret: options.secret,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: "lax",
      secure: options.secureCookies,
      maxAge: SESSION_MAX_AGE_MS,
    },
  });
  return { middleware, store };
}
