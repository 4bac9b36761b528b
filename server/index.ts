/**
 * `npm start`. In demo mode (the default) it starts the whole embedded stack with demo data;
 * with LINKLEAP_MODE=production it serves the built client against the configured services.
 */
import { existsSync } from "node:fs";
import { join, resolve } from "node:path";
import { createApp } from "./app";
import { parseEnv } from "./config/env";
import { connectDatabase } from "./db/client";
import { migrateDatabase } from "./db/migrate";
import { describeStack, startStack } from "./devstack/stack";
import { StopList, stopOnSignals } from "./lifecycle";
import { createMailer } from "./mail/mailer";
import { projectPath } from "./paths";

async function main() {
  const env = parseEnv();
  const clientDir = projectPath("dist", "client");
  // Registered first, so Ctrl-C during start-up (say, mid-build) still stops what is up.
  const stops = new StopList();
  stopOnSignals(() => stops.run());

  if (env.LINKLEAP_MODE === "demo") {
    const dataDir = resolve(env.LINKLEAP_DATA_DIR);
    const stack = await startStack({
      dataDir,
      host: env.HOST,
      port: env.PORT,
      pgPort: env.PG_PORT,
      signInPort: env.SIGN_IN_PORT,
      smtpPort: env.LOCAL_SMTP_PORT,
      publicUrl: env.PUBLIC_URL,
      buildClient: process.env.LINKLEAP_SKIP_BUILD !== "1",
      clientDir,
      sessionSecret: env.SESSION_SECRET,
      mailFrom: env.MAIL_FROM,
      stopPostgresOnExit: true,
    }, stops);
    console.log(describeStack(stack, dataDir));
  } else {
    if (!existsSync(join(clientDir, "index.html"))) {
      throw new Error("No built client in dist/client: run `npm run build` before starting in production mode.");
    }
    const database = connectDatabase(env.DATABASE_URL!);
    stops.push(() => database.close());
    await migrateDatabase(database.pool);
    const mailer = createMailer({
      host: env.SMTP_HOST!,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      user: env.SMTP_USER,
      pass: env.SMTP_PASS,
      from: env.MAIL_FROM,
    });
    stops.push(async () => mailer.close());
    const server = createApp({
      database,
      mailer,
      config: {
        publicUrl: env.PUBLIC_URL!,
        demo: false,
        sessionSecret: env.SESSION_SECRET!,
        oauth: {
          clientID: env.GOOGLE_CLIENT_ID!,
          clientSecret: env.GOOGLE_CLIENT_SECRET!,
          authorizationURL: env.GOOGLE_AUTHORIZATION_URL ?? "https://accounts.google.com/o/oauth2/v2/auth",
          tokenURL: env.GOOGLE_TOKEN_URL ?? "https://oauth2.googleapis.com/token",
          userProfileURL: env.GOOGLE_USERINFO_URL ?? "https://openidconnect.googleapis.com/v1/userinfo",
        },
        clientDir,
        uploadsDir: resolve(env.LINKLEAP_DATA_DIR, "uploads"),
        trustProxy: 1,
      },
    });
    await server.listen(env.PORT, env.HOST);
    stops.push(() => server.close());
    console.log(`Linkleap is listening on ${env.HOST}:${env.PORT} (public address ${env.PUBLIC_URL})`);
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
