/**
 * What the lesson board (/lessons/:id/board) loads on the main thread: the entry chunk, the staff
 * app, the board's route chunk and every chunk those import statically, read from Vite's build
 * manifest (gzip level 9, as scripts/pupil-first-load.ts measures the pupil page). The
 * simulation worker's chunk is listed apart: it loads in the worker, and it alone holds matter-js.
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { FORBIDDEN_MARKERS, kb, readManifest, staticImportsOf } from "./pupil-first-load";

export const STAFF_ENTRY_SOURCE = "src/app/staff-main.tsx";
export const BOARD_ROUTE_SOURCE = "src/app/routes/lesson-board.tsx";
/** A string only matter-js's built code holds (its console messages start with it). */
export const MATTER_MARKER = FORBIDDEN_MARKERS["matter-js"];

export interface SizedFile {
  file: string;
  bytes: number;
  gzipBytes: number;
}

export interface BoardLoad {
  /** JavaScript the board page loads on the main thread. */
  mainThread: SizedFile[];
  mainThreadGzipBytes: number;
  /** The worker chunks the build emitted (from the manifest's assets). */
  worker: SizedFile[];
  /** Every built JavaScript file holding the matter-js marker, worker or not. */
  filesWithMatter: string[];
}

const sized = (distDir: string, file: string): SizedFile => {
  const bytes = readFileSync(join(distDir, file));
  return { file, bytes: bytes.length, gzipBytes: gzipSync(bytes, { level: 9 }).length };
};

export function measureBoardLoad(distDir: string): BoardLoad {
  const manifest = readManifest(distDir);
  const entryKey = Object.keys(manifest).find((k) => manifest[k]!.isEntry);
  if (!entryKey) throw new Error("The build manifest has no entry.");
  for (const key of [STAFF_ENTRY_SOURCE, BOARD_ROUTE_SOURCE]) if (!manifest[key]) throw new Error(`The build manifest has no ${key}.`);

  // Static imports only: the route chunk's dynamic imports (the QR code) load later, if at all.
  const seen = staticImportsOf(manifest, [entryKey, STAFF_ENTRY_SOURCE, BOARD_ROUTE_SOURCE]);

  // Vite lists a `new Worker(new URL(…))` bundle among the importing chunk's assets.
  const workerFiles = [
    ...new Set(Object.values(manifest).flatMap((chunk) => ((chunk as { assets?: string[] }).assets ?? []).filter((f) => f.endsWith(".js")))),
  ];
  const mainThread = [...seen].map((k) => sized(distDir, manifest[k]!.file));
  const filesWithMatter = readdirSync(join(distDir, "assets"))
    .filter((f) => f.endsWith(".js"))
    .map((f) => `assets/${f}`)
    .filter((f) => readFileSync(join(distDir, f), "utf8").includes(MATTER_MARKER));
  return {
    mainThread,
    mainThreadGzipBytes: mainThread.reduce((n, f) => n + f.gzipBytes, 0),
    worker: workerFiles.map((f) => sized(distDir, f)),
    filesWithMatter,
  };
}

export function formatBoardLoad(load: BoardLoad): string {
  const files = [...load.mainThread, ...load.worker];
  const width = Math.max(...files.map((f) => f.file.length), 16);
  const row = (f: SizedFile, note = "") =>
    `${f.file.padEnd(width)}  ${kb(f.bytes).padStart(8)}  ${kb(f.gzipBytes).padStart(8)}${load.filesWithMatter.includes(f.file) ? "  matter-js" : ""}${note}`;
  return [
    `${"file".padEnd(width)}  ${"raw KB".padStart(8)}  ${"gzip KB".padStart(8)}`,
    ...load.mainThread.map((f) => row(f)),
    `${"main thread".padEnd(width)}  ${"".padStart(8)}  ${kb(load.mainThreadGzipBytes).padStart(8)}`,
    ...load.worker.map((f) => row(f, "  (worker)")),
  ].join("\n");
}
