/**
 * `npx tsx scripts/board-size.ts [--build] [distDir]`: what the lesson board loads on its main
 * thread (gzip level 9) and which built files hold matter-js. Builds the client first unless
 * dist/client is newer than every source; a distDir given is measured as it is.
 */
import { join, resolve } from "node:path";
import { PROJECT_ROOT } from "../server/paths";
import { formatBoardLoad, measureBoardLoad } from "./board-first-load";
import { buildProductionClient, isBuildFresh } from "./pupil-first-load";

const given = process.argv.slice(2).find((a) => !a.startsWith("--"));
const distDir = given ? resolve(given) : join(PROJECT_ROOT, "dist", "client");
if (!given && (process.argv.includes("--build") || !isBuildFresh(distDir, PROJECT_ROOT))) {
  console.log("Building the client (production)…");
  buildProductionClient(PROJECT_ROOT, distDir);
}

const load = measureBoardLoad(distDir);
console.log(`The board page (/lessons/:id/board), ${distDir} (gzip level 9, node:zlib):\n`);
console.log(formatBoardLoad(load));
const workerFiles = new Set(load.worker.map((f) => f.file));
const outside = load.filesWithMatter.filter((f) => !workerFiles.has(f));
console.log(`\nmatter-js marker found in: ${load.filesWithMatter.join(", ") || "no file"}`);
if (outside.length > 0) {
  console.error(`matter-js is outside the worker: ${outside.join(", ")}`);
  process.exit(1);
}
