/**
 * `npm run size:pupil`: builds the client (unless dist/client is newer than every source), then
 * prints what the pupil page's first load downloads, gzip level 9, and exits 1 above the budget
 * or if a library the pupil page must not load is in it.
 */
import { join } from "node:path";
import { PROJECT_ROOT } from "../server/paths";
import {
  PUPIL_FIRST_LOAD_LIMIT_KB,
  buildProductionClient,
  formatFirstLoadTable,
  isBuildFresh,
  measurePupilFirstLoad,
} from "./pupil-first-load";

const distDir = join(PROJECT_ROOT, "dist", "client");
const rebuild = process.argv.includes("--build") || !isBuildFresh(distDir, PROJECT_ROOT);
if (rebuild) {
  console.log("Building the client (production)…");
  buildProductionClient(PROJECT_ROOT, distDir);
} else {
  console.log(`Using the build in ${distDir} (newer than every source; pass --build to rebuild).`);
}

const load = measurePupilFirstLoad(distDir);
console.log("\nFirst load of /join (gzip level 9, node:zlib):\n");
console.log(formatFirstLoadTable(load));

let failed = false;
if (load.jsGzipBytes > PUPIL_FIRST_LOAD_LIMIT_KB * 1024) {
  console.error(`\nOver the budget: ${(load.jsGzipBytes / 1024).toFixed(1)} KB > ${PUPIL_FIRST_LOAD_LIMIT_KB} KB.`);
  failed = true;
}
for (const f of load.forbidden) {
  console.error(`\n${f.library} is in the pupil page's first load (${f.file}).`);
  failed = true;
}
process.exit(failed ? 1 : 0);
