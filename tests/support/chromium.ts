import { existsSync } from "node:fs";
import { aptInstall } from "../../server/devstack/apt";

export const CHROMIUM_PATH = "/usr/bin/chromium";

/** Flags that work on these machines: headless, no GPU, no calls home (the network is closed). */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** Installs Debian's chromium with apt-get when it is missing (never a downloaded browser). */
export async function ensureChromium(): Promise<string> {
  if (!existsSync(CHROMIUM_PATH)) aptInstall(["chromium"]);
  if (!existsSync(CHROMIUM_PATH)) throw new Error(`chromium was installed but ${CHROMIUM_PATH} is missing.`);
  return CHROMIUM_PATH;
}
