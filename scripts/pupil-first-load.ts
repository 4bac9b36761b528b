/**
 * What a pupil's phone downloads to open /join: the entry chunk, the pupil chunk it imports on
 * that path, and every chunk those import statically, read from Vite's build manifest. Sizes are
 * gzip at level 9 (node:zlib), as a server with compression or a pre-compressed deploy would send.
 */
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";

/** The budget for the pupil page's first-load JavaScript, gzip. */
export const PUPIL_FIRST_LOAD_LIMIT_KB = 120;
export const PUPIL_ENTRY_SOURCE = "src/pupil/pupil-main.tsx";

/** Strings that only appear in the built code of libraries the pupil page must not load. */
export const FORBIDDEN_MARKERS = {
  "matter-js": "matter-js:", // prefix of matter-js's own console messages (Common.log/warn)
  konva: "Konva warning",
  "chart.js": "Canvas is already in use. Chart with ID",
  "react-router": "useNavigate() may be used only",
  "@tanstack/react-query": "No QueryClient set",
  zod: "$ZodError",
} as const;

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

export interface FirstLoadFile {
  file: string;
  kind: "js" | "css";
  bytes: number;
  gzipBytes: number;
}

export interface FirstLoad {
  files: FirstLoadFile[];
  jsGzipBytes: number;
  cssGzipBytes: number;
  /** Forbidden libraries found in first-load JavaScript, with the file. */
  forbidden: { library: string; file: string }[];
}

export function readManifest(distDir: string): Manifest {
  return JSON.parse(readFileSync(join(distDir, ".vite", "manifest.json"), "utf8")) as Manifest;
}

/**
 * The manifest keys a page loads up front from these starting chunks: each one and everything it
 * imports statically (dynamic imports load later, if at all).
 */
export function staticImportsOf(manifest: Manifest, start: readonly string[]): Set<string> {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    const chunk = manifest[key];
    if (!chunk) throw new Error(`The build manifest lists ${key} as an import but has no entry for it.`);
    seen.add(key);
    for (const imp of chunk.imports ?? []) visit(imp);
  };
  for (const key of start) visit(key);
  return seen;
}

export function measurePupilFirstLoad(distDir: string): FirstLoad {
  const manifest = readManifest(distDir);
  const entryKey = Object.keys(manifest).find((k) => manifest[k]!.isEntry);
  if (!entryKey) throw new Error("The build manifest has no entry.");
  if (!manifest[PUPIL_ENTRY_SOURCE]) throw new Error(`The build manifest has no ${PUPIL_ENTRY_SOURCE}.`);

  const seen = staticImportsOf(manifest, [entryKey, PUPIL_ENTRY_SOURCE]);

  const jsFiles = [...seen].map((k) => manifest[k]!.file);
  const cssFiles = [...new Set([...seen].flatMap((k) => manifest[k]!.css ?? []))];
  const measure = (file: string, kind: "js" | "css"): FirstLoadFile => {
    const bytes = readFileSync(join(distDir, file));
    return { file, kind, bytes: bytes.length, gzipBytes: gzipSync(bytes, { level: 9 }).length };
  };
  const files = [...jsFiles.map((f) => measure(f, "js")), ...cssFiles.map((f) => measure(f, "css"))];

  const forbidden: FirstLoad["forbidden"] = [];
  for (const file of jsFiles) {
    const text = readFileSync(join(distDir, file), "utf8");
    for (const [library, marker] of Object.entries(FORBIDDEN_MARKERS)) if (text.includes(marker)) forbidden.push({ library, file });
  }
  const sum = (kind: "js" | "css") => files.filter((f) => f.kind === kind).reduce((n, f) => n + f.gzipBytes, 0);
  return { files, jsGzipBytes: sum("js"), cssGzipBytes: sum("css"), forbidden };
}

/** Which built JavaScript files (any chunk) contain each marker: shows the markers do find their library. */
export function filesWithMarkers(distDir: string): Record<string, string[]> {
  const assets = readdirSync(join(distDir, "assets")).filter((f) => f.endsWith(".js"));
  const texts = assets.map((f) => [f, readFileSync(join(distDir, "assets", f), "utf8")] as const);
  return Object.fromEntries(
    Object.entries(FORBIDDEN_MARKERS).map(([library, marker]) => [library, texts.filter(([, t]) => t.includes(marker)).map(([f]) => f)]),
  );
}

const newestUnder = (path: string): number => {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return Math.max(st.mtimeMs, ...readdirSync(path).map((name) => newestUnder(join(path, name))));
};

/** A build is fresh when its manifest is newer than every client source, contract, sim file and config. */
export function isBuildFresh(distDir: string, projectRoot: string): boolean {
  const manifest = join(distDir, ".vite", "manifest.json");
  if (!existsSync(manifest)) return false;
  const inputs = ["src", "server/contracts", "sim", "index.html", "vite.config.ts", "tailwind.config.ts", "package-lock.json"];
  const newest = Math.max(...inputs.map((p) => newestUnder(join(projectRoot, p))));
  return statSync(manifest).mtimeMs > newest;
}

/**
 * A production build into `outDir`, in a child process with NODE_ENV=production: inside vitest
 * NODE_ENV is "test", and a build there bundles React's larger development code.
 */
export function buildProductionClient(projectRoot: string, outDir: string): void {
  const vite = join(projectRoot, "node_modules", "vite", "bin", "vite.js");
  const run = spawnSync(process.execPath, [vite, "build", "--outDir", outDir, "--emptyOutDir", "--logLevel", "warn"], {
    cwd: projectRoot,
    env: { ...process.env, NODE_ENV: "production" },
    encoding: "utf8",
  });
  if (run.status !== 0) throw new Error(`vite build failed:\n${run.stdout}\n${run.stderr}`);
}

export const kb = (bytes: number) => (bytes / 1024).toFixed(1);

export function formatFirstLoadTable(load: FirstLoad): string {
  const width = Math.max(...load.files.map((f) => f.file.length), 4);
  const lines = [`${"file".padEnd(width)}  ${"raw KB".padStart(8)}  ${"gzip KB".padStart(8)}`];
  for (const f of load.files) {
    const note = f.kind === "css" ? "  (css, not in the JS budget)" : "";
    lines.push(`${f.file.padEnd(width)}  ${kb(f.bytes).padStart(8)}  ${kb(f.gzipBytes).padStart(8)}${note}`);
  }
  lines.push(`${"JavaScript total".padEnd(width)}  ${"".padStart(8)}  ${kb(load.jsGzipBytes).padStart(8)}  (limit ${PUPIL_FIRST_LOAD_LIMIT_KB} KB)`);
  lines.push(`${"CSS total".padEnd(width)}  ${"".padStart(8)}  ${kb(load.cssGzipBytes).padStart(8)}`);
  return lines.join("\n");
}
