/**
 * One-way imports, checked on every run:
 * - sim/ is pure: nothing from src/ or server/, and no Node built-ins;
 * - server/ never imports the client;
 * - server/contracts/ imports only zod, sim/ and other contracts, so the client can use it;
 * - the client reaches the server only through server/contracts/;
 * - inside src/, no feature imports another feature, and shared code (components, hooks, lib)
 *   imports no feature: only src/app composes features.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { PROJECT_ROOT } from "../../server/paths";

const SOURCE = /\.(ts|tsx)$/;

function filesUnder(dir: string): string[] {
  const abs = join(PROJECT_ROOT, dir);
  let entries: string[];
  try {
    entries = readdirSync(abs);
  } catch {
    return [];
  }
  return entries.flatMap((name) => {
    const path = join(abs, name);
    if (statSync(path).isDirectory()) return filesUnder(relative(PROJECT_ROOT, path));
    return SOURCE.test(name) ? [relative(PROJECT_ROOT, path)] : [];
  });
}

const IMPORT = /(?:import|export)\s[^'"]*?from\s*["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)|^\s*import\s*["']([^"']+)["']/gm;

/** Import specifiers of a file, with local ones resolved to project-relative paths. */
function importsOf(file: string): { spec: string; target: string | null }[] {
  const text = readFileSync(join(PROJECT_ROOT, file), "utf8");
  const found: { spec: string; target: string | null }[] = [];
  for (const m of text.matchAll(IMPORT)) {
    const spec = (m[1] ?? m[2] ?? m[3])!;
    let target: string | null = null;
    if (spec.startsWith(".")) target = relative(PROJECT_ROOT, resolve(PROJECT_ROOT, dirname(file), spec));
    else if (spec.startsWith("@/")) target = join("src", spec.slice(2));
    else if (spec.startsWith("@contracts/")) target = join("server/contracts", spec.slice("@contracts/".length));
    else if (spec.startsWith("@sim/")) target = join("sim", spec.slice("@sim/".length));
    found.push({ spec, target });
  }
  return found;
}

const violations = (files: string[], bad: (imp: { spec: string; target: string | null }, file: string) => boolean) =>
  files.flatMap((file) => importsOf(file).filter((imp) => bad(imp, file)).map((imp) => `${file} → ${imp.spec}`));

describe("import boundaries", () => {
  it("finds the files it checks (the check itself works)", () => {
    expect(filesUnder("server").length).toBeGreaterThan(10);
    expect(importsOf("server/app.ts").some((i) => i.target === "server/auth/auth.routes")).toBe(true);
  });

  it("sim/ is pure: no client, no server, no Node built-ins", () => {
    const bad = violations(filesUnder("sim"), ({ spec, target }) =>
      spec.startsWith("node:") || Boolean(target && (target.startsWith("src") || target.startsWith("server"))),
    );
    expect(bad).toEqual([]);
  });

  it("server/ never imports the client", () => {
    expect(violations(filesUnder("server"), ({ target }) => Boolean(target?.startsWith("src")))).toEqual([]);
  });

  it("server/contracts/ imports only zod, sim/ and other contracts", () => {
    // Test files beside the contracts are never bundled: they may also use the test tools.
    const testTools = ["vitest", "pngjs"];
    const bad = violations(filesUnder("server/contracts"), ({ spec, target }, file) =>
      target
        ? !(target.startsWith("server/contracts") || target.startsWith("sim"))
        : spec !== "zod" && !(file.endsWith(".test.ts") && testTools.includes(spec)),
    );
    expect(bad).toEqual([]);
  });

  it("the client reaches the server only through server/contracts/", () => {
    const bad = violations(filesUnder("src"), ({ target }) =>
      Boolean(target?.startsWith("server") && !target.startsWith("server/contracts")),
    );
    expect(bad).toEqual([]);
  });

  it("no client feature imports another feature", () => {
    const featureOf = (path: string) => /^src\/features\/([^/]+)/.exec(path)?.[1];
    const bad = violations(filesUnder("src/features"), ({ target }, file) => {
      const other = target ? featureOf(target) : undefined;
      return Boolean(other && other !== featureOf(file));
    });
    expect(bad).toEqual([]);
  });

  it("shared client code imports no feature", () => {
    const shared = ["src/components", "src/hooks", "src/lib"].flatMap(filesUnder);
    expect(shared.length).toBeGreaterThan(0);
    expect(violations(shared, ({ target }) => Boolean(target?.startsWith("src/features/")))).toEqual([]);
  });
});
