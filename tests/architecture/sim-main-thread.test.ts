/**
 * matter-js runs only in the board's simulation worker: no module the staff pages load on the
 * main thread reaches it through its imports. Main-thread code takes rigs and parameters from
 * @sim/catalog (matter-free); @sim/index, which holds the world builders, is for the worker,
 * the server, the CLI and tests. The built chunks are checked too: tests/e2e/board-main-thread.test.ts.
 */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { PROJECT_ROOT } from "../../server/paths";

const APP_ENTRY = "src/main.tsx";
const WORKER_ENTRY = "src/features/live-board/worker/sim.worker.ts";
const MATTER = "matter-js";

const SOURCE = /\.(ts|tsx)$/;
const TEST_FILE = /\.test\.tsx?$/;

function filesUnder(dir: string): string[] {
  return readdirSync(join(PROJECT_ROOT, dir)).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(join(PROJECT_ROOT, path)).isDirectory()) return filesUnder(path);
    return SOURCE.test(name) ? [path] : [];
  });
}

/**
 * `import`/`export … from` statements, side-effect imports and dynamic `import()`. Statements
 * marked `import type`/`export type` are erased from the build and skipped; `import { type A }`
 * is kept (with verbatimModuleSyntax it still loads the module). `new Worker(new URL(…))` is
 * not an import: that is where the worker's graph starts.
 */
const IMPORT = /^\s*(?:import|export)\s+(type\s+)?[^'"]*?\bfrom\s*["']([^"']+)["']|^\s*import\s*["']([^"']+)["']|\bimport\(\s*["']([^"']+)["']\s*\)/gm;

function valueImportSpecs(text: string): string[] {
  const specs: string[] = [];
  for (const m of text.matchAll(IMPORT)) {
    if (m[1]) continue;
    specs.push((m[2] ?? m[3] ?? m[4])!);
  }
  return specs;
}

const ALIASES: [string, string][] = [
  ["@/", "src/"],
  ["@contracts/", "server/contracts/"],
  ["@sim/", "sim/"],
];

/** A project file (project-relative path), a package name, or null for assets (CSS, images). */
function resolveSpec(from: string, rawSpec: string): { file: string } | { pkg: string } | null {
  const spec = rawSpec.replace(/\?.*$/, "");
  let base: string | null = null;
  if (spec.startsWith(".")) base = relative(PROJECT_ROOT, resolve(PROJECT_ROOT, dirname(from), spec));
  for (const [alias, dir] of ALIASES) if (spec.startsWith(alias)) base = dir + spec.slice(alias.length);
  if (base === null) {
    const parts = spec.split("/");
    return { pkg: spec.startsWith("@") ? parts.slice(0, 2).join("/") : parts[0]! };
  }
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, `${base}/index.ts`, `${base}/index.tsx`]) {
    const abs = join(PROJECT_ROOT, candidate);
    if (SOURCE.test(candidate) && existsSync(abs) && statSync(abs).isFile()) return { file: candidate };
  }
  if (/\.(css|svg|png|jpe?g|woff2?|json)$/.test(base)) return null;
  throw new Error(`${from}: cannot resolve import "${rawSpec}"`);
}

const edgesCache = new Map<string, string[]>();
/** Nodes a file loads: project files by path, packages as "pkg:<name>". */
function edgesOf(file: string): string[] {
  let edges = edgesCache.get(file);
  if (!edges) {
    const text = readFileSync(join(PROJECT_ROOT, file), "utf8");
    edges = valueImportSpecs(text).flatMap((spec) => {
      const target = resolveSpec(file, spec);
      if (!target) return [];
      return "file" in target ? [target.file] : [`pkg:${target.pkg}`];
    });
    edgesCache.set(file, edges);
  }
  return edges;
}

/** Everything reachable from the roots, each node with the node it was first reached from. */
function walk(roots: string[]): Map<string, string | null> {
  const parent = new Map<string, string | null>(roots.map((r) => [r, null]));
  const queue = [...roots];
  while (queue.length > 0) {
    const node = queue.shift()!;
    if (node.startsWith("pkg:")) continue;
    for (const next of edgesOf(node)) {
      if (parent.has(next)) continue;
      parent.set(next, node);
      queue.push(next);
    }
  }
  return parent;
}

/** The import chain from a root to matter-js, or null when it does not reach it. */
function chainToMatter(root: string): string[] | null {
  const parent = walk([root]);
  let node: string | null | undefined = `pkg:${MATTER}`;
  if (!parent.has(node)) return null;
  const chain: string[] = [];
  while (node) {
    chain.unshift(node);
    node = parent.get(node);
  }
  return chain;
}

describe("matter-js stays in the simulation worker", () => {
  const mainThread = new Set(walk([APP_ENTRY]).keys());
  const workerGraph = new Set(walk([WORKER_ENTRY]).keys());
  const workerOnly = new Set([...workerGraph].filter((f) => !mainThread.has(f)));
  // Every client module except the worker's own (and tests, which run in Node): also the pages
  // and harnesses no route reaches yet.
  const clientModules = filesUnder("src").filter((f) => !TEST_FILE.test(f) && !workerOnly.has(f));

  it("reads the imports it walks: type-only statements are skipped, everything else is followed", () => {
    const text = [
      'import type { World } from "matter-js";',
      'export type { Chain } from "./chain";',
      'import { type RigId } from "./rig";',
      'import { frameAt } from "@sim/run/playback";',
      "export {",
      "  RIG_CATALOG,",
      '} from "./rigs/catalog";',
      'import "./styles.css";',
      'const page = import("./app/staff-main");',
    ].join("\n");
    expect(valueImportSpecs(text)).toEqual(["./rig", "@sim/run/playback", "./rigs/catalog", "./styles.css", "./app/staff-main"]);
  });

  it("the check can fail: the worker and sim/index.ts do reach matter-js, the catalog does not", () => {
    expect(chainToMatter(WORKER_ENTRY)).not.toBeNull();
    expect(chainToMatter("sim/index.ts")).not.toBeNull();
    expect(chainToMatter("sim/catalog.ts")).toBeNull();
  });

  it("walks the staff app from the entry, through the route chunks, to the board, the remote and the plan editor", () => {
    for (const file of [
      "src/app/routes/lesson-board.tsx",
      "src/app/routes/lesson-remote.tsx",
      "src/app/routes/plan-edit.tsx",
      "src/components/trial-setup/setup-form.ts",
      "src/features/live-board/components/theory-panel.tsx",
      "src/features/live-board/worker/create-sim-worker.ts",
      "sim/catalog.ts",
    ]) {
      expect(mainThread.has(file), file).toBe(true);
    }
    // The worker is started with new Worker(new URL(…)): its graph is its own.
    expect(mainThread.has(WORKER_ENTRY)).toBe(false);
    expect(clientModules.length).toBeGreaterThan(50);
  });

  it("no client module outside the worker reaches matter-js through its imports", () => {
    const reaching = clientModules.flatMap((file) => {
      const chain = chainToMatter(file);
      return chain ? [chain.join(" → ")] : [];
    });
    expect(reaching).toEqual([]);
  });
});
