import { existsSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

/**
 * The project root, found by walking up to package.json: paths from import.meta.url
 * differ between tsx and built code, so never count `..` by hand.
 */
function findRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, "package.json"))) {
    const parent = dirname(dir);
    if (parent === dir) throw new Error("Could not find the project root (package.json).");
    dir = parent;
  }
  return dir;
}

export const PROJECT_ROOT = findRoot();
export const projectPath = (...parts: string[]) => resolve(PROJECT_ROOT, ...parts);
