/**
 * The demo stack: private PostgreSQL, migrations, demo data, the built client, the local
 * sign-in provider, the local SMTP server and the app, started together and stopped together.
 * `npm start` and `npm run dev` use it; so does the start-up test.
 */
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { createApp, type LinkleapServer } from "../app";
import { connectDatabase, type Database } from "../db/client";
import { migrateDatabase } from "../db/migrate";
import { DEMO_STAFF, DEMO_UNINVITED } from "../db/seed/demo-data";
import { seedDemo } from "../db/seed/seed-demo";
import { StopList } from "../lifecycle";
import { createMailer } from "../mail/mailer";
import { projectPath } from "../paths";
import { STAFF_ROLE_LABELS } from "../contracts/staff-roles";
import { createMailCatcher, type MailCatcher } from "./mail-catcher";
import { ensureDatabase, startCluster, stopCluster, type ClusterHandle } from "./postgres";
import { createSignInProvider, signInProviderEndpoints, type SignInProvider } from "./sign-in-provider";

export interface StackOptions {
  /** Folder for the cluster, mail and secrets (git-ignored `.data/` by default). */
  dataDir: string;
  host: string;
  port: number;
  pgPort: number;
  signInPort: number;
  smtpPort: number;
  /** Address people use; defaults to http://host:port. */
  publicUrl?: string;
  /** Build the client with Vite first (npm start) or leave it to the dev server (npm run dev). */
  buildClient: boolean;
  /** Serve the built client from here (null: API only, as under the Vite dev server). */
  clientDir: string | null;
  extraOrigins?: string[];
  sessionSecret?: string;
  /** The sender of Linkleap's messages. */
  mailFrom?: string;
  /** Stop PostgreSQL on stop() if this stack started it. */
  stopPostgresOnExit: boolean;
  log?: (line: string) => void;
}

export interface RunningStack {
  url: string;
  signInUrl: string;
  smtp: { host: string; port: number };
  databaseUrl: string;
  seeded: boolean;
  mail: MailCatcher;
  stop(): Promise<void>;
}

function persistentSecret(file: string): string {
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  const secret = randomBytes(48).toString("base64url");
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

/**
 * Starts the stack. `stops` collects how to stop each part as it comes up, so a caller that
 * registered it for Ctrl-C before calling can stop a half-started stack too.
 */
export async function startStack(options: StackOptions, stops = new StopList()): Promise<RunningStack> {
  const log = options.log ?? console.log;
  const dataDir = resolve(options.dataDir);
  mkdirSync(dataDir, { recursive: true });
  const stop = () => stops.run();

  if (options.port === 0) throw new Error("The stack needs a fixed port: the sign-in callback URL must be known in advance.");
  try {
    const cluster: ClusterHandle = await startCluster({ dir: join(dataDir, "postgres"), port: options.pgPort, log });
    if (cluster.startedHere && options.stopPostgresOnExit) stops.push(() => stopCluster(join(dataDir, "postgres")));
    await ensureDatabase(cluster.url("postgres"), "linkleap");
    const databaseUrl = cluster.url("linkleap");
    const database: Database = connectDatabase(databaseUrl);
    stops.push(() => database.close());
    await migrateDatabase(database.pool);
    const seeded = await seedDemo(database.db);
    if (seeded) log("Seeded the demo school (first run).");

    if (options.buildClient) {
      log("Building the client…");
      const { build } = await import("vite");
      await build({ configFile: projectPath("vite.config.ts"), logLevel: "warn", build: { outDir: options.clientDir ?? undefined } });
    }

    const mail = createMailCatcher({ dir: join(dataDir, "mail") });
    const smtpAddress = await mail.listen(options.smtpPort, "127.0.0.1");
    stops.push(() => mail.close());

    // The app's own address must be known before the provider, which checks callback URLs.
    const provisionalUrl = options.publicUrl ?? `http://${options.host}:${options.port}`;
    const clientSecret = randomBytes(24).toString("base64url");
    const redirectUris = [provisionalUrl, ...(options.extraOrigins ?? [])].map((o) => `${o.replace(/\/$/, "")}/auth/google/callback`);
    const provider: SignInProvider = createSignInProvider({
      clientId: "linkleap-local",
      clientSecret,
      redirectUris,
      accounts: [
        ...DEMO_STAFF.map((s) => ({ email: s.email, name: s.displayName, note: `${s.note} · demo` })),
        { ...DEMO_UNINVITED },
      ],
    });
    const providerAddress = await provider.listen(options.signInPort, "127.0.0.1");
    stops.push(() => provider.close());
    const signInUrl = `http://127.0.0.1:${providerAddress.port}`;

    const mailer = createMailer({ host: "127.0.0.1", port: smtpAddress.port, secure: false, from: options.mailFrom ?? "Linkleap <linkleap@localhost>" });
    stops.push(async () => mailer.close());

    const server: LinkleapServer = createApp({
      database,
      mailer,
      config: {
        publicUrl: provisionalUrl,
        demo: true,
        sessionSecret: options.sessionSecret ?? persistentSecret(join(dataDir, "session-secret")),
        oauth: { clientID: "linkleap-local", clientSecret, ...signInProviderEndpoints(signInUrl) },
        extraOrigins: options.extraOrigins,
        clientDir: options.clientDir,
        mailDir: join(dataDir, "mail"),
        uploadsDir: join(dataDir, "uploads"),
      },
    });
    await server.listen(options.port, options.host);
    stops.push(() => server.close());

    return {
      url: provisionalUrl,
      signInUrl,
      smtp: { host: "127.0.0.1", port: smtpAddress.port },
      databaseUrl,
      seeded,
      mail,
      stop,
    };
  } catch (error) {
    await stop();
    throw error;
  }
}

/** The lines `npm start` prints once everything answers. */
export function describeStack(stack: RunningStack, dataDir: string): string {
  const width = Math.max(...DEMO_STAFF.map((s) => s.displayName.length));
  const accounts = DEMO_STAFF.map(
    (s) => `    ${s.displayName.padEnd(width)}  ${STAFF_ROLE_LABELS[s.role].padEnd(18)}  ${s.email}`,
  ).join("\n");
  return [
    "",
    `  Linkleap (demo) is running at ${stack.url}`,
    "",
    "  Sign in with one of the demo accounts, picked on the local sign-in page:",
    accounts,
    `    (${DEMO_UNINVITED.email} shows what someone who was not invited sees)`,
    "",
    `  Local sign-in provider  ${stack.signInUrl}`,
    `  Local SMTP server       ${stack.smtp.host}:${stack.smtp.port}  (messages kept in ${join(dataDir, "mail")})`,
    `  PostgreSQL              ${new URL(stack.databaseUrl).host}  (data in ${join(dataDir, "postgres")})`,
    "",
    "  Press Ctrl-C to stop.",
    "",
  ].join("\n");
}
