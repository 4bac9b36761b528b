/**
 * The pupil page stays small and separate: it takes only types from the zod contracts, values
 * only from the zod-free ones, and none of the staff app's heavy libraries or its router.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { PROJECT_ROOT } from "../../server/paths";

const PUPIL_DIR = join(PROJECT_ROOT, "src", "pupil");
const ZOD_FREE_CONTRACTS = ["lesson-rules", "lesson-questions", "protocol"];
const FORBIDDEN_PACKAGES = ["react-router", "@tanstack/react-query", "zod", "konva", "react-konva", "matter-js", "chart.js", "react-chartjs-2"];

const IMPORT = /^\s*(import|export)\s+(type\s+)?[^'"]*?from\s*["']([^"']+)["']/gm;

function pupilImports() {
  const files = readdirSync(PUPIL_DIR).filter((f) => /\.tsx?$/.test(f) && !f.endsWith(".test.ts"));
  return files.flatMap((file) =>
    [...readFileSync(join(PUPIL_DIR, file), "utf8").matchAll(IMPORT)].map((m) => ({ file, typeOnly: Boolean(m[2]), spec: m[3]! })),
  );
}

describe("pupil page imports", () => {
  const imports = pupilImports();

  it("finds the imports it checks", () => {
    expect(imports.some((i) => i.spec === "socket.io-client")).toBe(true);
    expect(imports.some((i) => i.spec === "@contracts/lessons" && i.typeOnly)).toBe(true);
  });

  it("takes values only from zod-free contracts", () => {
    const bad = imports.filter(
      (i) => i.spec.startsWith("@contracts/") && !i.typeOnly && !ZOD_FREE_CONTRACTS.includes(i.spec.slice("@contracts/".length)),
    );
    expect(bad).toEqual([]);
  });

  it("loads none of the staff app's libraries, features, app shell or the simulation", () => {
    const bad = imports.filter(
      (i) =>
        !i.typeOnly &&
        (FORBIDDEN_PACKAGES.some((p) => i.spec === p || i.spec.startsWith(`${p}/`)) ||
          i.spec.startsWith("@/app") ||
          i.spec.startsWith("@/features") ||
          i.spec.startsWith("@sim") ||
          i.spec === "@/components/ui/button"),
    );
    expect(bad).toEqual([]);
  });
});
