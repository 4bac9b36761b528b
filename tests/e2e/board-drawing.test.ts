/**
 * The board's rig drawing in Debian's chromium: a real fountain run from the simulation worker
 * (through the board's own worker hook), drawn by RigStage. Checks that the chain is painted
 * where the chain is, keeps screenshots, and prints how long one frame takes to draw (a figure
 * to read, not a timed assertion).
 */
import { rmSync } from "node:fs";
import { join } from "node:path";
import type { Browser, Page } from "playwright-core";
import { build } from "vite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { projectPath } from "../../server/paths";
import { keepScreenshot, launchBrowser } from "../support/browser";
import { TEST_DATA_DIR } from "../support/paths";
import { serveFolder, type StaticServer } from "../support/static-server";

/** What the test page (src/features/live-board/testing/rig-stage-harness.tsx) offers. */
declare global {
  interface Window {
    harness?: {
      status: "running" | "ready" | "failed";
      error?: string;
      previewDrawn: boolean;
      duration: number;
      frames: number;
      elements: number;
      drawAt(t: number): number;
      drawnAt(t: number): number;
    };
  }
}

const dir = join(TEST_DATA_DIR, "board-drawing");
let server: StaticServer | undefined;
let base = "";
let browser: Browser;

beforeAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await build({
    configFile: projectPath("vite.config.ts"),
    logLevel: "error",
    build: { outDir: dir, emptyOutDir: true, sourcemap: false, rolldownOptions: { input: projectPath("tests/e2e/board-drawing.html") } },
  });
  server = await serveFolder(dir);
  base = `${server.url}/tests/e2e/board-drawing.html`;
  browser = await launchBrowser();
}, 180_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

/** Counts chain-coloured (amber) pixels of the chain layer, in bands of the stage's height. */
async function chainPixels(page: Page) {
  return page.evaluate(() => {
    const canvases = document.querySelectorAll("canvas");
    const chain = canvases[canvases.length - 1]!;
    const ctx = chain.getContext("2d")!;
    const { width, height } = chain;
    const data = ctx.getImageData(0, 0, width, height).data;
    const bands = Array.from({ length: 10 }, () => 0);
    let total = 0;
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++) {
        const i = (y * width + x) * 4;
        // Amber: strong red, mid green, little blue (the two link shades #F2C35B and #D9A63A).
        if (data[i + 3]! > 128 && data[i]! > 190 && data[i + 1]! > 130 && data[i + 1]! < 215 && data[i + 2]! < 120) {
          total++;
          bands[Math.floor((y / height) * 10)]!++;
        }
      }
    }
    return { total, bands, width, height };
  });
}

async function openHarness(query: string) {
  const page = await browser.newPage({ viewport: { width: 900, height: 900 } });
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(e.message));
  await page.goto(`${base}?${query}`);
  return { page, problems };
}

describe("the board's rig drawing", () => {
  it("draws the fountain rig at rest before any run (set-up phase)", async () => {
    const { page, problems } = await openHarness(`rig=fountain&params=${encodeURIComponent(JSON.stringify({ links: 400 }))}&phase=setup`);
    await page.waitForFunction(() => window.harness?.previewDrawn === true, null, { timeout: 60_000 });
    await page.waitForTimeout(300);
    const pixels = await chainPixels(page);
    await keepScreenshot(page, "board-drawing", "fountain-at-rest");
    // At rest the chain hangs from the rim down to the floor: amber in the lower half of the stage too.
    expect(pixels.total).toBeGreaterThan(200);
    expect(pixels.bands.slice(5).reduce((a, b) => a + b, 0)).toBeGreaterThan(50);
    expect(problems).toEqual([]);
    await page.close();
  }, 120_000);

  it("plays a real fountain recording from the worker: the chain is drawn in every frame, and the drawing time is printed", async () => {
    const { page, problems } = await openHarness(`rig=fountain&params=${encodeURIComponent(JSON.stringify({ links: 1000 }))}&seed=4&maxSeconds=4`);
    await page.waitForFunction(() => window.harness?.status !== "running", null, { timeout: 170_000, polling: 500 });
    const info = await page.evaluate(() => ({ status: window.harness!.status, error: window.harness!.error, frames: window.harness!.frames, elements: window.harness!.elements, duration: window.harness!.duration }));
    expect(info.error).toBeUndefined();
    expect(info.status).toBe("ready");
    expect(info.elements).toBe(1000);
    expect(info.frames).toBeGreaterThan(60);

    // Draw 240 moments across the run, as playback would, and time each draw.
    // The canvas may only record the paths; reading one pixel back makes it paint them, so the
    // second figure includes the painting.
    const times = await page.evaluate((duration) => {
      const canvases = document.querySelectorAll("canvas");
      const ctx = canvases[canvases.length - 1]!.getContext("2d")!;
      const draw: number[] = [];
      const painted: number[] = [];
      for (let i = 0; i < 240; i++) {
        const started = performance.now();
        draw.push(window.harness!.drawAt((duration * i) / 239));
        ctx.getImageData(0, 0, 1, 1);
        painted.push(performance.now() - started);
      }
      return { draw, painted };
    }, info.duration);
    expect(times.draw.every((t) => Number.isFinite(t) && t >= 0)).toBe(true);
    const figures = (list: number[]) => {
      const sorted = [...list].sort((a, b) => a - b);
      const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * q))]!.toFixed(2);
      return `median ${at(0.5)} ms, 95th percentile ${at(0.95)} ms, max ${at(1)} ms`;
    };
    const drawn = await page.evaluate((d) => [window.harness!.drawnAt(0), window.harness!.drawnAt(d)], info.duration);
    console.log(
      `RigStage, fountain 1000 links (${drawn[0]} drawn at the start, ${drawn[1]} at ${info.duration.toFixed(1)} s), 900×900 px, headless chromium (no GPU), ${times.draw.length} frames:\n` +
        `  draw call (JS, paths recorded): ${figures(times.draw)}\n` +
        `  draw and paint (pixel read back): ${figures(times.painted)}`,
    );

    const end = await chainPixels(page);
    await keepScreenshot(page, "board-drawing", "fountain-1000-links-end");
    expect(end.total).toBeGreaterThan(200);
    // Links on their way down to the floor: amber in the bottom fifth as well as near the pot.
    expect(end.bands[8]! + end.bands[9]!).toBeGreaterThan(20);

    // Another moment draws a different picture (the chain moves).
    const midTime = await page.evaluate((d) => window.harness!.drawAt(d / 3), info.duration);
    expect(Number.isFinite(midTime)).toBe(true);
    const mid = await chainPixels(page);
    await keepScreenshot(page, "board-drawing", "fountain-1000-links-third");
    expect(mid.bands).not.toEqual(end.bands);
    expect(problems).toEqual([]);
    await page.close();
  }, 180_000);
});
