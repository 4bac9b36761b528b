/// <reference types="node" />
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, resolve, sep } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

/**
 * The client's one-way imports: shared code (`components`, `hooks`, `lib`) never reaches into a
 * feature, and no feature reaches into another; only `app/` composes features. A file that breaks
 * the rule is named in the failure.
 */
const srcDir = fileURLToPath(new URL(".", import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|tsx)$/.test(name) ? [path] : [];
  });
}

const IMPORT = /(?:import|export)\s[^;]*?from\s+["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

/** Where an import points inside src/ (as a path relative to src/), or null for packages and contracts. */
function importTarget(fromFile: string, specifier: string): string | null {
  if (specifier.startsWith("@/")) return specifier.slice(2);
  if (specifier.startsWith(".")) return relative(srcDir, resolve(fromFile, "..", specifier)).split(sep).join("/");
  return null;
}

function violations() {
  const found: string[] = [];
  for (const file of sourceFiles(srcDir)) {
    const from = relative(srcDir, file).split(sep).join("/");
    const [top, feature] = from.split("/");
    const text = readFileSync(file, "utf8");
    for (const match of text.matchAll(IMPORT)) {
      const target = importTarget(file, match[1] ?? match[2] ?? "");
      if (!target?.startsWith("features/")) continue;
      const targetFeature = target.split("/")[1];
      if (top === "features" && targetFeature !== feature) found.push(`${from} imports ${target}`);
      if (top === "components" || top === "hooks" || top === "lib") found.push(`${from} imports ${target}`);
    }
  }
  return found;
}

describe("import boundaries in src/", () => {
  it("resolves aliases and relative paths to the same place", () => {
    expect(importTarget(join(srcDir, "features/classes/api/get-class.ts"), "../../auth/api/auth-keys")).toBe("features/auth/api/auth-keys");
    expect(importTarget(join(srcDir, "app/router.tsx"), "@/features/staff/api/get-staff")).toBe("features/staff/api/get-staff");
    expect(importTarget(join(srcDir, "app/router.tsx"), "react-router")).toBeNull();
  });

  it("no feature imports another feature, and shared code imports no feature", () => {
    expect(violations()).toEqual([]);
  });
});
