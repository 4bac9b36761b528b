/**
 * The built client keeps matter-js in the simulation worker's chunk: no other chunk holds it, so
 * the board, the remote and the plan editor do not download it on the main thread. The import
 * graph is checked without a build in tests/architecture/sim-main-thread.test.ts; this checks
 * what Vite actually emitted (production build, as `npm start` serves it).
 */
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { PROJECT_ROOT } from "../../server/paths";
import { BOARD_ROUTE_SOURCE, formatBoardLoad, MATTER_MARKER, measureBoardLoad } from "../../scripts/board-first-load";
import { buildProductionClient, readManifest } from "../../scripts/pupil-first-load";
import { TEST_DATA_DIR } from "../support/paths";

describe("matter-js in the built client", () => {
  const clientDir = join(TEST_DATA_DIR, "board-size-dist");
  beforeAll(() => buildProductionClient(PROJECT_ROOT, clientDir));

  it(`is found by its marker "${MATTER_MARKER}" in the worker chunk (the check can fail)`, () => {
    const load = measureBoardLoad(clientDir);
    expect(load.worker.map((f) => f.file)).toEqual([expect.stringMatching(/^assets\/sim\.worker-.*\.js$/)]);
    expect(load.filesWithMatter).toContain(load.worker[0]!.file);
  });

  it("is in no other chunk, and the board's main thread loads the route chunk but not the worker", () => {
    const load = measureBoardLoad(clientDir);
    console.log(formatBoardLoad(load));
    const workerFiles = load.worker.map((f) => f.file);
    expect(load.filesWithMatter.filter((f) => !workerFiles.includes(f))).toEqual([]);
    const mainFiles = load.mainThread.map((f) => f.file);
    expect(mainFiles).toContain(readManifest(clientDir)[BOARD_ROUTE_SOURCE]!.file);
    for (const file of workerFiles) expect(mainFiles).not.toContain(file);
    expect(load.mainThreadGzipBytes).toBeGreaterThan(0);
  });
});
