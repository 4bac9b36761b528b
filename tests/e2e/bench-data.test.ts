/**
 * Real runs in the browser: a teacher types a run and sees it on the graph and in the table;
 * then uploads a synthetic photo of known geometry, marks five points on the konva stage,
 * sees the computed heights, saves, and sees the new point on the graph.
 */
import { PNG } from "pngjs";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { keepScreenshot, openClassFromHome, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const ctx = useDemoInBrowser();

/** Markers the chart drew (canvas pixels), and whether the canvas is painted (not white) at each. */
async function drawnMarkers(page: Page) {
  return page.getByTestId("bench-graph").evaluate((el) => {
    const canvas = el as HTMLCanvasElement;
    const markers = JSON.parse(canvas.dataset.markers ?? "[]") as [number, number][];
    const g = canvas.getContext("2d")!;
    const dpr = canvas.width / canvas.clientWidth;
    return markers.map(([x, y]) => {
      const [r, gr, b, a] = g.getImageData(Math.round(x * dpr), Math.round(y * dpr), 1, 1).data;
      return { x, y, painted: a! > 0 && !(r! > 240 && gr! > 240 && b! > 240) };
    });
  });
}

// The photo's layout: 0.50 m ruler over 200 px (2.5 mm/px); rim 400 px above the floor (1.000 m);
// crest 56 px above the rim (0.140 m).
const MARKS = {
  rim: { x: 250, y: 70 },
  crest: { x: 270, y: 14 },
  floor: { x: 200, y: 470 },
  referenceStart: { x: 300, y: 420 },
  referenceEnd: { x: 420, y: 260 },
};
const EXPECTED = { potHeightM: (470 - 70) * (0.5 / 200), riseM: (70 - 14) * (0.5 / 200) };

function syntheticPhoto(): Buffer {
  const png = new PNG({ width: 500, height: 500 });
  png.data.fill(235);
  for (const { x: cx, y: cy } of Object.values(MARKS)) {
    for (let y = cy - 4; y <= cy + 4; y++) {
      for (let x = cx - 4; x <= cx + 4; x++) png.data.set([20, 20, 20, 255], (y * 500 + x) * 4);
    }
  }
  return PNG.sync.write(png);
}

describe("real runs on the class page", () => {
  it("a typed run and a photo measurement appear on the graph and in the table", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url);
    await signInAs(page, ctx.stack.url, "Tom Ashdown");
    await openClassFromHome(page, "10A Physics");
    await page.getByRole("heading", { name: "Real runs" }).waitFor();
    await page.getByText("No real runs yet").waitFor();
    await page.getByRole("heading", { name: /Safety card/ }).waitFor();

    const form = page.getByRole("form", { name: "Add a real run" });
    await form.getByLabel("Height unit").selectOption("cm");
    await form.getByLabel("Pot height (cm)").fill("120");
    await form.getByLabel("Rise (cm)").fill("16");
    await form.getByLabel("Chain speed (m/s), optional").fill("3.4");
    await form.getByRole("button", { name: "Add this run" }).click();
    await page.getByText("Run added.").waitFor();
    const table = page.getByTestId("bench-table");
    await table.getByText("120 cm").waitFor();
    await table.getByText("16 cm").waitFor();
    await page.waitForFunction(() => JSON.parse((document.querySelector("[data-testid=bench-graph]") as HTMLCanvasElement)?.dataset.markers ?? "[]").length === 1);
    const one = await drawnMarkers(page);
    expect(one).toHaveLength(1);
    expect(one[0]!.painted).toBe(true);
    await keepScreenshot(page, "e2e", "15-bench-typed-run");

    await page.getByTestId("bench-photo-input").setInputFiles({ name: "run.png", mimeType: "image/png", buffer: syntheticPhoto() });
    const stage = page.getByTestId("photo-stage");
    await stage.locator("canvas").first().waitFor();
    await stage.scrollIntoViewIfNeeded();
    const scale = Number(await stage.getAttribute("data-scale"));
    for (const mark of ["rim", "crest", "floor", "referenceStart", "referenceEnd"] as const) {
      // The list of marks above the photo changes height as marks are placed: measure every time.
      const box = (await stage.locator("canvas").first().boundingBox())!;
      await page.mouse.click(box.x + MARKS[mark].x * scale, box.y + MARKS[mark].y * scale);
      await page.getByText(`${MARKS[mark].x}, ${MARKS[mark].y}`).waitFor();
    }
    await page.getByLabel("Known length (cm)").fill("50");
    const result = page.getByTestId("photo-result");
    await result.getByText(`${EXPECTED.potHeightM.toFixed(3)} m`).waitFor();
    await result.getByText(`${EXPECTED.riseM.toFixed(3)} m`).waitFor();
    await keepScreenshot(page, "e2e", "16-bench-photo-marked");

    // Keyboard: nudging the selected mark (the last one placed) changes it by one pixel, then back.
    await stage.focus();
    await page.keyboard.press("ArrowRight");
    await page.getByText(`${MARKS.referenceEnd.x + 1}, ${MARKS.referenceEnd.y}`).waitFor();
    await page.keyboard.press("ArrowLeft");
    await page.getByText(`${MARKS.referenceEnd.x}, ${MARKS.referenceEnd.y}`).waitFor();

    await page.getByRole("button", { name: "Save as a real run" }).click();
    await page.getByText(`Saved: pot height ${EXPECTED.potHeightM} m, rise ${EXPECTED.riseM} m.`).waitFor();
    await page.waitForFunction(() => JSON.parse((document.querySelector("[data-testid=bench-graph]") as HTMLCanvasElement)?.dataset.markers ?? "[]").length === 2);
    const two = await drawnMarkers(page);
    expect(two.every((m) => m.painted)).toBe(true);
    await expect(table.locator("tr[data-run-id]").count()).resolves.toBe(2);
    await table.getByText("Photo").waitFor();
    await keepScreenshot(page, "e2e", "17-bench-photo-saved");

    expect(problems).toEqual([]);
    await context.close();
  });
});
