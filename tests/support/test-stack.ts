import { randomBytes } from "node:crypto";
import { rmSync } from "node:fs";
import { createServer } from "node:net";
import { join } from "node:path";
import { afterAll, beforeAll } from "vitest";
import { createApp, type LinkleapServer } from "../../server/app";
import type { Database, Db } from "../../server/db/client";
import { createTestDatabase, type TestDatabase } from "./test-database";
import { createSignInProvider, signInProviderEndpoints, type ProviderAccount, type SignInProvider } from "../../server/devstack/sign-in-provider";
import { createMailCatcher, type MailCatcher } from "../../server/devstack/mail-catcher";
import { createMailer, type Mailer } from "../../server/mail/mailer";
import { OUTSIDER, PEOPLE } from "./fixtures";
import { TEST_DATA_DIR } from "./paths";

export const TEST_SESSION_SECRET = "test-secret-that-is-long-enough-for-the-schema-1234";

/** Ports already handed out in this process: the OS may offer a just-closed port again. */
const handedOut = new Set<number>();

/** A port nobody is using right now (the app must know its own address before it listens). */
export async function freePort(): Promise<number> {
  for (;;) {
    const port = await new Promise<number>((resolve, reject) => {
      const server = createServer();
      server.unref();
      server.on("error", reject);
      server.listen(0, "127.0.0.1", () => {
        const { port } = server.address() as { port: number };
        server.close(() => resolve(port));
      });
    });
    if (!handedOut.has(port)) {
      handedOut.add(port);
      return port;
    }
  }
}

export interface TestStack {
  url: string;
  port: number;
  providerUrl: string;
  server: LinkleapServer;
  provider: SignInProvider;
  /** The local SMTP server this app sends through; its folder is the app's captured mail. */
  mail: MailCatcher;
  /** The app's folder of uploaded photos. */
  uploadsDir: string;
  /** The app's own mailer (to the local SMTP server), for tests that run mail jobs themselves. */
  mailer: Mailer;
  /**
   * Stops the app (not the provider) so a test can start another on the same port and database.
   * `abrupt` drops every connection without telling sockets to stay away, as a crashed or killed
   * server would: socket.io clients then reconnect by themselves.
   */
  restartApp(options?: { abrupt?: boolean }): Promise<void>;
  close(): Promise<void>;
}

const defaultAccounts: ProviderAccount[] = [
  ...Object.values(PEOPLE).map((p) => ({ email: p.email, name: p.name })),
  { email: OUTSIDER.email, name: OUTSIDER.name },
];

/** The real app and the local sign-in provider on loopback, against a test database. */
export interface TestStackOptions {
  /** The built client to serve. */
  clientDir?: string | null;
  accounts?: ProviderAccount[];
  /** Demo mode (the default) or production mode, as LINKLEAP_MODE chooses. */
  demo?: boolean;
  /** The purge's cron pattern; off by default, so tests run the purge themselves. */
  purgeSchedule?: string | null;
  /** SMTP port to send through instead of the stack's own local server (e.g. one nobody listens on). */
  smtpPort?: number;
}

export async function startTestStack(database: Database, options: TestStackOptions = {}): Promise<TestStack> {
  const clientDir = options.clientDir ?? null;
  // The app's address is only known once it listens; the provider reads this list per request.
  const redirectUris: string[] = [];
  const provider = createSignInProvider({
    clientId: "linkleap-test",
    clientSecret: "test-client-secret",
    redirectUris,
    accounts: options.accounts ?? defaultAccounts,
  });
  const providerAddress = await provider.listen(0);
  const providerUrl = `http://127.0.0.1:${providerAddress.port}`;
  const mailDir = join(TEST_DATA_DIR, "mail", randomBytes(5).toString("hex"));
  const mail = createMailCatcher({ dir: mailDir });
  const uploadsDir = join(TEST_DATA_DIR, "uploads", randomBytes(5).toString("hex"));
  const smtp = await mail.listen(0);
  const mailer = createMailer({
    host: "127.0.0.1",
    port: options.smtpPort ?? smtp.port,
    secure: false,
    from: "Linkleap <linkleap@northfen.example>",
  });

  let port = 0;
  let url = "";
  const makeApp = () =>
    createApp({
      database,
      mailer,
      config: {
        publicUrl: url,
        demo: options.demo ?? true,
        mailDir,
        uploadsDir,
        purgeSchedule: options.purgeSchedule ?? null,
        digestSchedule: null,
        sessionSecret: TEST_SESSION_SECRET,
        oauth: { clientID: "linkleap-test", clientSecret: "test-client-secret", ...signInProviderEndpoints(providerUrl) },
        clientDir,
        pruneSessions: false,
      },
      log: () => {},
    });

  // A port found free can be taken by another test worker before we listen on it: try again.
  let server: ReturnType<typeof makeApp> | null = null;
  for (let attempt = 1; server === null; attempt++) {
    port = await freePort();
    url = `http://127.0.0.1:${port}`;
    redirectUris.splice(0, redirectUris.length, `${url}/auth/google/callback`);
    const candidate = makeApp();
    try {
      await candidate.listen(port);
      server = candidate;
    } catch (error) {
      // The candidate never listened and holds nothing open (no purge schedule in tests): drop it.
      if ((error as NodeJS.ErrnoException).code !== "EADDRINUSE" || attempt >= 5) throw error;
    }
  }

  const stack: TestStack = {
    url,
    port,
    providerUrl,
    provider,
    mail,
    uploadsDir,
    mailer,
    server,
    async restartApp({ abrupt = false } = {}) {
      if (abrupt) {
        const old = stack.server;
        await new Promise<void>((resolve) => {
          old.io.close(() => resolve());
          old.httpServer.closeAllConnections();
        });
      } else await stack.server.close();
      stack.server = makeApp();
      await stack.server.listen(port);
    },
    async close() {
      await stack.server.close();
      await provider.close();
      mailer.close();
      await mail.close();
      rmSync(mailDir, { recursive: true, force: true });
      rmSync(uploadsDir, { recursive: true, force: true });
    },
  };
  return stack;
}

export interface TestContext<F> {
  database: TestDatabase;
  stack: TestStack;
  fixture: F;
}

/**
 * For a test file: a database of its own, seeded, with the app and sign-in provider running
 * against it; all torn down after the file. Fields are filled before the file's first test.
 */
export function useTestStack<F>(seed: (db: Db) => Promise<F>, options: TestStackOptions = {}): TestContext<F> {
  const ctx = {} as TestContext<F>;
  beforeAll(async () => {
    ctx.database = await createTestDatabase();
    ctx.fixture = await seed(ctx.database.db);
    ctx.stack = await startTestStack(ctx.database, options);
  });
  afterAll(async () => {
    await ctx.stack?.close();
    await ctx.database?.drop();
  });
  return ctx;
}
