/**
 * The lesson graphs in Debian's chromium: a tiny page built with Vite renders the per-trial
 * comparison graph (a number and a choice question), the fountain series graph and the tally
 * form, in the light and the board theme. Checks that the canvas is drawn where the values say,
 * that the summary figures are right, that the board text is big enough, and keeps screenshots.
 */
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import tailwindcss from "@tailwindcss/vite";
import react from "@vitejs/plugin-react";
import type { Browser } from "playwright-core";
import { build } from "vite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { projectPath } from "../../server/paths";
import { keepScreenshot, launchBrowser } from "../support/browser";
import { TEST_DATA_DIR } from "../support/paths";
import { drawnOnCanvas } from "../support/chart-canvas";
import { serveFolder, type StaticServer } from "../support/static-server";

const dir = join(TEST_DATA_DIR, "lesson-graph");
const out = join(dir, "dist");
let server: StaticServer | undefined;
let base = "";
let browser: Browser;

// Pot 0.8 m: the steady theory with α = 0.12, β = 0 gives 0.8 × 0.12/0.88 m = 10.9 cm.
const RESULT = { value: 11, uncertainty: 0.3, unit: "cm" };
const THEORY = { value: (0.8 * 0.12) / 0.88 * 100, uncertainty: null, unit: "cm" };
const FIXTURE = {
  number: {
    question: { kind: "number", prompt: "How high above the rim will the chain rise?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true },
    quantityLabel: "Rise of the chain above the rim",
    answers: [
      { round: 1, value: 20, choice: null },
      { round: 1, value: 10, choice: null },
      { round: 1, value: 12, choice: null },
    ],
    result: RESULT,
    theory: THEORY,
    bench: [12.5],
  },
  choice: {
    question: {
      kind: "choice",
      prompt: "How high above the rim will the chain rise?",
      quantity: "rise",
      unit: "cm",
      askReason: true,
      askExplanation: true,
      revote: true,
      choices: [
        { label: "Under 10 cm", min: null, max: 10 },
        { label: "10 to 20 cm", min: 10, max: 20 },
        { label: "20 cm or more", min: 20, max: null },
      ],
    },
    quantityLabel: "Rise of the chain above the rim",
    answers: [
      { round: 1, value: null, choice: 0 },
      { round: 1, value: null, choice: 1 },
      { round: 1, value: null, choice: 1 },
      { round: 2, value: null, choice: 1 },
    ],
    result: RESULT,
    theory: THEORY,
  },
  series: {
    trials: [
      { potHeight: 0.8, predictions: [10, 12, 20], result: 11 },
      { potHeight: 1.5, predictions: [15, 30, 22], result: 20.1 },
    ],
    theory: { alpha: 0.12, beta: 0 },
    bench: [{ potHeight: 1.2, rise: 15 }],
  },
};

const src = (p: string) => JSON.stringify(projectPath(p));
const ENTRY = `
import { createRoot } from "react-dom/client";
import { Chart } from "chart.js";
import ${src("src/styles/app.css")};
import { TrialGraph } from ${src("src/features/lesson-graph/components/trial-graph.tsx")};
import { FountainSeriesGraph } from ${src("src/features/lesson-graph/components/fountain-series-graph.tsx")};
import { TallyForm } from ${src("src/features/lesson-graph/components/tally-form.tsx")};
const f = ${JSON.stringify(FIXTURE)};
const theme = new URLSearchParams(location.search).get("theme") === "board" ? "board" : "light";
if (theme === "board") document.documentElement.dataset.theme = "board";
window.__legends = () => Object.values(Chart.instances).map((c) => ({ id: c.canvas.dataset.testid, legend: c.legend.legendItems.map((i) => i.text) }));
window.__tallies = [];
const save = (t) => new Promise((resolve) => setTimeout(() => { window.__tallies.push(t); resolve(); }, 50));
createRoot(document.getElementById("root")).render(
  <main className="grid gap-10 p-6">
    <section data-testid="number"><TrialGraph {...f.number} theme={theme} /></section>
    <section data-testid="choice"><TrialGraph {...f.choice} theme={theme} /></section>
    <section data-testid="series"><FountainSeriesGraph {...f.series} theme={theme} /></section>
    <section data-testid="tally" className="max-w-prose"><TallyForm question={f.number.question} round={1} initial={null} onSubmit={save} /></section>
    <section data-testid="tally-choice" className="max-w-prose"><TallyForm question={f.choice.question} round={2} initial={{ counts: [0, 2, 0], values: null }} onSubmit={save} /></section>
  </main>,
);
`;

beforeAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, "entry.tsx"), ENTRY);
  writeFileSync(join(dir, "index.html"), `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>lesson graph</title><link rel="icon" href="data:,"></head><body><div id="root"></div><script type="module" src="./entry.tsx"></script></body></html>`);
  await build({
    configFile: false,
    root: dir,
    logLevel: "silent",
    plugins: [react(), tailwindcss()],
    resolve: {
      alias: [
        { find: /^@\//, replacement: `${projectPath("src")}/` },
        { find: /^@contracts\//, replacement: `${projectPath("server/contracts")}/` },
        { find: /^@sim\//, replacement: `${projectPath("sim")}/` },
      ],
    },
    build: { outDir: out, emptyOutDir: true, minify: false },
  });
  server = await serveFolder(out);
  base = server.url;
  browser = await launchBrowser();
}, 180_000);

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function openPage(theme: "light" | "board") {
  const context = await browser.newContext({ viewport: { width: 1280, height: 720 } });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on("pageerror", (e) => problems.push(e.message));
  page.on("console", (m) => m.type() === "error" && problems.push(m.text()));
  await page.goto(`${base}/?theme=${theme}`);
  await page.waitForFunction(() => document.querySelectorAll("canvas[data-drawn]").length === 3);
  return { context, page, problems };
}

describe.each(["light", "board"] as const)("lesson graphs in the %s theme", (theme) => {
  it("the comparison graph draws every answer, the result and the theory, and states the summary figures", async () => {
    const { context, page, problems } = await openPage(theme);
    const numberCanvas = page.getByTestId("number").getByTestId("trial-graph-canvas");
    const sets = await drawnOnCanvas(numberCanvas);
    const byLabel = (start: string) => sets.find((s) => s.label.startsWith(start))!;
    const predictions = byLabel("Predictions before the run (circles)");
    const result = byLabel("Simulated result 11 cm (solid line)");
    const theoryLine = byLabel("Theory 10.9 cm (dashed line)");
    expect(predictions.points).toHaveLength(3);
    expect(byLabel("Real runs (triangles)").points).toHaveLength(1);
    for (const p of [...predictions.points, ...byLabel("Real runs").points]) expect(p.painted).toBe(true);
    // Answers 20, 10, 12 in that order: along the axis 10 < 12 < 20, and the result (11) between 10 and 12.
    const [x20, x10, x12] = predictions.points.map((p) => p.x) as [number, number, number];
    expect(x10).toBeLessThan(x12);
    expect(x12).toBeLessThan(x20);
    expect(result.points[0]!.x).toBeGreaterThan(x10);
    expect(result.points[0]!.x).toBeLessThan(x12);
    expect(theoryLine.points[0]!.x).toBeLessThan(result.points[0]!.x);
    const mid = { x: result.points[0]!.x, y: Math.round((result.points[0]!.y + result.points[1]!.y) / 2) };
    const linePainted = await numberCanvas.evaluate((el, m) => {
      const c = el as HTMLCanvasElement;
      const dpr = c.width / c.clientWidth;
      return c.getContext("2d")!.getImageData(Math.round(m.x * dpr), Math.round(m.y * dpr), 1, 1).data[3]! > 0;
    }, mid);
    expect(linePainted).toBe(true);

    const summary = page.getByTestId("number").getByTestId("trial-graph-summary");
    // Hand-worked in prediction-summary.test.ts: 10, 12, 20 → median 12, R-7 quartiles 11 and 16;
    // within 10 % of 11 (±1.1): 10 and 12.
    await expect.poll(() => summary.getByTestId("trial-graph-summary-round-1").innerText()).toBe(
      "Before the run: median 12 cm · spread (interquartile range, the middle half of the answers) 5 cm · within 10 % of the result: 2 of 3 (67 %) · 3 answers.",
    );
    expect(await summary.innerText()).toContain("Simulated result: 11 cm (± 0.3 cm). Theory: 10.9 cm.");
    // The chart points screen readers at the figures.
    const describedBy = await numberCanvas.getAttribute("aria-describedby");
    expect(await page.locator(`[id="${describedBy}"]`).innerText()).toContain("median 12 cm");

    const choiceSummary = page.getByTestId("choice").getByTestId("trial-graph-summary");
    expect(await choiceSummary.innerText()).toContain("in the choice “10 to 20 cm”");
    expect(await choiceSummary.getByTestId("trial-graph-summary-round-1").innerText()).toBe(
      "Before the run: 3 answers · 2 of 3 (67 %) chose the one that holds the result.",
    );
    const bars = await drawnOnCanvas(page.getByTestId("choice").getByTestId("trial-graph-canvas"));
    expect(bars.map((b) => b.points.length)).toEqual([3, 3]);
    // The taller bar (2 answers) reaches higher up the canvas than the 1-answer bar.
    expect(bars[0]!.points[1]!.y).toBeLessThan(bars[0]!.points[0]!.y);

    const legends = await page.evaluate(() => (window as unknown as { __legends: () => { id: string; legend: string[] }[] }).__legends());
    expect(legends.find((l) => l.id === "fountain-series-canvas")!.legend).toEqual([
      "Theory 0.136 × h1 (dashed)",
      "Predictions (small circles)",
      "Simulated results (large diamonds)",
      "Real runs (triangles)",
    ]);
    expect(legends.filter((l) => l.id === "trial-graph-canvas").map((l) => l.legend)).toContainEqual([
      "Before the run (filled bars; hatched: the choice that holds the result)",
      "Re-vote after discussion (outlined bars)",
    ]);

    const series = await drawnOnCanvas(page.getByTestId("fountain-series-canvas"));
    expect(series.map((s) => s.points.length)).toEqual([2, 6, 2, 1]);
    for (const s of series.slice(1)) for (const p of s.points) expect(p.painted).toBe(true);
    // The theory line passes under the simulated result at 0.8 m (10.9 cm < 11 cm: a higher y pixel).
    const origin = series[0]!.points[0]!;
    const end = series[0]!.points[1]!;
    const resultAt08 = series[2]!.points[0]!;
    const theoryY = origin.y + ((end.y - origin.y) * (resultAt08.x - origin.x)) / (end.x - origin.x);
    expect(theoryY).toBeGreaterThan(resultAt08.y);
    expect(theoryY - resultAt08.y).toBeLessThan(10);

    if (theme === "board") {
      // Board text at least 3 % of the screen height (720 px → 21.6 px).
      const size = await summary.evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
      expect(size).toBeGreaterThanOrEqual(0.03 * 720);
    }
    await keepScreenshot(page, "e2e", `lesson-graph-${theme}`);
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe("tally form", () => {
  it("reads a typed list with decimal commas, says what it read, and saves it", async () => {
    const { context, page, problems } = await openPage("light");
    const tally = page.getByTestId("tally");
    const box = tally.getByLabel("Values given before the run (cm)");
    await box.fill("12,5");
    await tally.getByRole("button", { name: "Save the tally" }).click();
    await tally.getByText("“12,5” could be one value (12.5) or two (12 and 5).", { exact: false }).waitFor();
    await box.fill("12,5\n13\n14,5\nabout 9");
    await tally.getByRole("button", { name: "Save the tally" }).click();
    await tally.getByText("These are not numbers: “about”.", { exact: false }).waitFor();
    await box.fill("12,5\n13\n14,5");
    expect(await tally.getByTestId("tally-read-as").innerText()).toBe("Read as 3 values: 12.5, 13, 14.5 cm.");
    await box.press("Tab");
    await page.keyboard.press("Enter");
    await tally.getByText("Saved: 3 values.").waitFor();
    const saved = await page.evaluate(() => (window as unknown as { __tallies: unknown[] }).__tallies);
    expect(saved).toEqual([{ counts: null, values: [12.5, 13, 14.5] }]);
    await keepScreenshot(page, "e2e", "lesson-graph-tally");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("counts hands per choice with ± buttons of at least 44 px, refuses a count that is not a whole number, and saves", async () => {
    const { context, page, problems } = await openPage("light");
    const tally = page.getByTestId("tally-choice");
    await tally.getByRole("group", { name: "Hands up for each choice (in the re-vote)" }).waitFor();
    expect(await tally.getByLabel("10 to 20 cm", { exact: true }).inputValue()).toBe("2");
    const plus = tally.getByRole("button", { name: "One more for Under 10 cm" });
    const box = (await plus.boundingBox())!;
    expect(Math.min(box.width, box.height)).toBeGreaterThanOrEqual(44);
    expect(await tally.getByRole("button", { name: "One fewer for Under 10 cm" }).isDisabled()).toBe(true);
    await plus.click();
    await plus.focus();
    await page.keyboard.press("Enter");
    expect(await tally.getByLabel("Under 10 cm", { exact: true }).inputValue()).toBe("2");
    await tally.getByLabel("20 cm or more", { exact: true }).fill("one");
    await tally.getByRole("button", { name: "Save the tally" }).click();
    await tally.getByText("The count for “20 cm or more” is not a whole number.").waitFor();
    await tally.getByLabel("20 cm or more", { exact: true }).fill("1");
    expect(await tally.getByText(/^Total:/).innerText()).toBe("Total: 5 hands");
    await tally.getByRole("button", { name: "Save the tally" }).click();
    await tally.getByText("Saved: 5 hands over 3 choices.").waitFor();
    const saved = await page.evaluate(() => (window as unknown as { __tallies: unknown[] }).__tallies);
    expect(saved).toEqual([{ counts: [2, 2, 1], values: null }]);
    await tally.scrollIntoViewIfNeeded();
    await keepScreenshot(page, "e2e", "lesson-graph-tally-choice");
    expect(problems).toEqual([]);
    await context.close();
  });
});
