/**
 * `npm run dev`: the embedded stack serving the API only, plus Vite's dev server (hot reload)
 * which proxies /api, /auth and /socket.io to it. Open the Vite address it prints.
 * Server code changes need a restart (Ctrl-C, then `npm run dev` again).
 */
import { resolve } from "node:path";
import { createServer } from "vite";
import { parseEnv } from "../config/env";
import { StopList, stopOnSignals } from "../lifecycle";
import { projectPath } from "../paths";
import { describeStack, startStack } from "./stack";

const env = parseEnv();
const vitePort = Number(process.env.VITE_PORT ?? 5173);
const devOrigin = `http://127.0.0.1:${vitePort}`;
const dataDir = resolve(env.LINKLEAP_DATA_DIR);

// Registered first, so Ctrl-C during start-up still stops what is up.
const stops = new StopList();
stopOnSignals(() => stops.run());

const stack = await startStack({
  dataDir,
  host: env.HOST,
  port: env.PORT,
  pgPort: env.PG_PORT,
  signInPort: env.SIGN_IN_PORT,
  smtpPort: env.LOCAL_SMTP_PORT,
  // People open the Vite server, so sign-in must come back there (it proxies /auth).
  publicUrl: env.PUBLIC_URL ?? devOrigin,
  buildClient: false,
  clientDir: null,
  extraOrigins: [devOrigin],
  sessionSecret: env.SESSION_SECRET,
  stopPostgresOnExit: true,
}, stops);
const vite = await createServer({ configFile: projectPath("vite.config.ts") });
stops.push(() => vite.close());
await vite.listen();
console.log(describeStack(stack, dataDir).replace(stack.url, `${devOrigin} (Vite dev server; API on port ${env.PORT})`));

