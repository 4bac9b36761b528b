/**
 * The simulation is one code base for the browser and the server: bundled by Vite for the
 * browser, run inside a module Web Worker in Debian's chromium, it gives the same numbers as
 * in Node (both run V8, and sim/ takes its randomness from a seed, never from the clock).
 */
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import type { Browser } from "playwright-core";
import { build } from "vite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { RIGS, runTrial } from "../../sim";
import { projectPath } from "../../server/paths";
import { launchBrowser } from "../support/browser";
import { TEST_DATA_DIR } from "../support/paths";
import { serveFolder, type StaticServer } from "../support/static-server";

const dir = join(TEST_DATA_DIR, "sim-worker");
let server: StaticServer | undefined;
let base = "";
let browser: Browser;

const TRIALS = [
  { rig: "hanging", params: { span: 1.2, chainLength: 1.5 }, seed: 1 },
  { rig: "fountain", params: { links: 200 }, seed: 5, maxSeconds: 0.3 },
] as const;

beforeAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  await build({
    configFile: false,
    logLevel: "silent",
    build: {
      outDir: dir,
      emptyOutDir: false,
      minify: true,
      lib: { entry: projectPath("sim/index.ts"), formats: ["es"], fileName: () => "sim.js" },
    },
  });
  writeFileSync(
    join(dir, "worker.js"),
    `import { RIGS, runTrial } from "./sim.js";
     onmessage = ({ data }) => {
       const run = runTrial(RIGS[data.rig], data.params, { seed: data.seed, frameRate: 30, maxSeconds: data.maxSeconds });
       postMessage({ measured: run.measured, lastFrame: Array.from(run.frames.at(-1)), steps: run.run.steps });
     };`,
  );
  writeFileSync(join(dir, "index.html"), "<!doctype html><title>sim worker</title>");
  server = await serveFolder(dir);
  base = server.url;
  browser = await launchBrowser();
}, 120_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe("the simulation in a browser worker", () => {
  it("bundles with no Node built-ins and stays a modest download", () => {
    const size = readFileSync(join(dir, "sim.js")).length;
    // matter-js is most of it; the board loads it in a worker, never on a pupil's first page.
    expect(size).toBeGreaterThan(50_000);
    expect(size).toBeLessThan(400_000);
  });

  for (const trial of TRIALS) {
    it(`runs the ${trial.rig} rig in a module worker and matches Node exactly`, async () => {
      const page = await browser.newPage();
      await page.goto(base);
      const inBrowser = await page.evaluate(
        (message) =>
          new Promise<{ measured: Record<string, { value: number }>; lastFrame: number[]; steps: number }>((resolve, reject) => {
            const worker = new Worker("/worker.js", { type: "module" });
            worker.onmessage = ({ data }) => resolve(data);
            worker.onerror = (event) => reject(new Error(event.message));
            worker.postMessage(message);
          }),
        trial,
      );
      await page.close();
      const inNode = runTrial(RIGS[trial.rig], trial.params, { seed: trial.seed, frameRate: 30, maxSeconds: "maxSeconds" in trial ? trial.maxSeconds : undefined });
      expect(inBrowser.steps).toBe(inNode.run.steps);
      expect(inBrowser.lastFrame).toEqual(Array.from(inNode.frames.at(-1)!));
      for (const [key, settled] of Object.entries(inNode.measured)) {
        if (Number.isFinite(settled.value)) expect(inBrowser.measured[key]!.value, key).toBe(settled.value);
      }
    }, 120_000);
  }
});
