/**
 * The pupil page's first load, measured on a production build (NODE_ENV=production, as
 * `npm start` serves it) with the same function as `npm run size:pupil` (gzip level 9): within
 * budget, and free of the staff app's heavy libraries.
 */
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { PROJECT_ROOT } from "../../server/paths";
import {
  FORBIDDEN_MARKERS,
  buildProductionClient,
  PUPIL_FIRST_LOAD_LIMIT_KB,
  filesWithMarkers,
  formatFirstLoadTable,
  measurePupilFirstLoad,
  readManifest,
} from "../../scripts/pupil-first-load";
import { TEST_DATA_DIR } from "../support/paths";

describe("pupil page first load", () => {
  const clientDir = join(TEST_DATA_DIR, "pupil-size-dist");
  beforeAll(() => buildProductionClient(PROJECT_ROOT, clientDir));

  it(`is at most ${PUPIL_FIRST_LOAD_LIMIT_KB} KB of gzipped JavaScript and loads none of the staff app's heavy libraries`, () => {
    const load = measurePupilFirstLoad(clientDir);
    console.log(formatFirstLoadTable(load));
    const js = load.files.filter((f) => f.kind === "js");
    // The entry and the pupil chunk are in it; the staff app is not.
    const manifest = readManifest(clientDir);
    expect(js.map((f) => f.file)).toContain(manifest["src/pupil/pupil-main.tsx"]!.file);
    expect(js.map((f) => f.file)).not.toContain(manifest["src/app/staff-main.tsx"]!.file);
    expect(load.jsGzipBytes).toBeGreaterThan(0);
    expect(load.jsGzipBytes).toBeLessThanOrEqual(PUPIL_FIRST_LOAD_LIMIT_KB * 1024);
    expect(load.forbidden).toEqual([]);
  });

  it("the library markers do find their libraries where the staff app uses them (the check can fail)", () => {
    const found = filesWithMarkers(clientDir);
    // konva, chart.js, react-router, TanStack Query and zod are in the staff app's build today;
    // matter-js is checked too but may not be in the client build yet.
    for (const library of ["konva", "chart.js", "react-router", "@tanstack/react-query", "zod"] as const) {
      expect(found[library], `${library} marker "${FORBIDDEN_MARKERS[library]}"`).not.toEqual([]);
    }
  });
});
