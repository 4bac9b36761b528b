import { join } from "node:path";
import { build } from "vite";
import { projectPath } from "../../server/paths";
import { TEST_DATA_DIR } from "./paths";

/** Builds the client as `npm start` does, into a folder of the tests' own. */
export async function buildClientForTests(name = "client-dist"): Promise<string> {
  const outDir = join(TEST_DATA_DIR, name);
  await build({ configFile: projectPath("vite.config.ts"), logLevel: "error", build: { outDir, emptyOutDir: true } });
  return outDir;
}
