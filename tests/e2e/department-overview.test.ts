/**
 * The head of department's overview in the browser, on the demo school (its one finished
 * lesson: 12 Physics, set 1, a week ago, 12 pupils, two fountain trials run): totals, charts and
 * their tables, another date range kept in the address, a range the server refuses, and the CSV.
 */
import { readFileSync } from "node:fs";
import Papa from "papaparse";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { addDays, isoDay } from "../../server/contracts/department-overview";
import { DEMO_CLASSES, DEMO_PAST_LESSON } from "../../server/db/seed/demo-data";
import { keepScreenshot, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const ctx = useDemoInBrowser();
const SHOTS = "e2e";

const tile = (page: Page, label: string) =>
  page.getByTestId("overview-totals").locator("div", { has: page.locator("dt", { hasText: label }) }).locator("dd");

describe("the head of department's overview", () => {
  it("shows the department's totals, charts and tables, follows a new range, and downloads the CSV", async () => {
    const { page, context, problems } = await watchedPage(ctx.browser, ctx.stack.url);
    await signInAs(page, ctx.stack.url, "Helen Marrable");
    await page.getByRole("link", { name: "Department" }).first().click();
    await page.getByRole("heading", { name: "Overview" }).waitFor();
    await page.getByText("days are the school’s (Europe/London)").waitFor();

    // The demo's lesson a week ago is in the default range, the last 12 weeks.
    await page.getByTestId("overview-totals").waitFor();
    expect(await tile(page, "Lessons").innerText()).toBe("1");
    expect(await tile(page, "Trials run").innerText()).toBe("2");
    expect(await tile(page, "Pupils taking part").innerText()).toBe(String(DEMO_PAST_LESSON.trials[0].answers.length));
    expect(await tile(page, "Teachers").innerText()).toBe("1");
    expect(await page.getByRole("button", { name: "Last 12 weeks" }).getAttribute("aria-pressed")).toBe("true");

    // Charts drawn (lazily loaded) and the same numbers in tables.
    for (const id of ["lessons-chart", "rigs-chart", "closeness-chart"]) await page.getByTestId(id).locator("canvas").waitFor();
    const lessonsTable = page.getByTestId("lessons-table");
    await lessonsTable.getByRole("rowheader", { name: "Tom Ashdown" }).waitFor();
    expect(await page.getByTestId("rigs-table").innerText()).toMatch(/Fountain rig\s+2/);
    // Round 1 answers within 10 % of the result: 15 and 14 of 11 answers against 14.3 cm, 22 and 21 of 11 against 22.7 cm: 4 of 22.
    expect(await page.getByTestId("closeness-table").innerText()).toMatch(/\s2\s+22\s+18 %/);
    // Totals only: no pupil's name anywhere in the overview.
    const overviewText = await page.getByTestId("overview-body").innerText();
    for (const c of DEMO_CLASSES) for (const name of c.roster) expect(overviewText).not.toContain(name);
    await keepScreenshot(page, SHOTS, "70-department-overview");

    await page.getByText("Class", { exact: true }).first().click();
    await lessonsTable.getByRole("rowheader", { name: DEMO_PAST_LESSON.className }).waitFor();
    await keepScreenshot(page, SHOTS, "71-overview-by-class");

    // A range with no lessons: typed dates apply on "Show" and stay in the address.
    const today = isoDay(new Date());
    const from = addDays(today, -400);
    const to = addDays(today, -370);
    await page.getByLabel("From").fill(from);
    await page.getByLabel("To (included)").fill(to);
    await page.getByRole("button", { name: "Show", exact: true }).click();
    await page.getByText("No live lessons from").waitFor();
    expect(new URL(page.url()).searchParams.get("from")).toBe(from);
    expect(new URL(page.url()).searchParams.get("to")).toBe(to);
    await keepScreenshot(page, SHOTS, "72-overview-empty-range");
    await page.reload();
    await page.getByText("No live lessons from").waitFor();
    expect(await page.getByLabel("From").inputValue()).toBe(from);

    // An end before the start: the server's message under the end date.
    await page.getByLabel("To (included)").fill(addDays(from, -1));
    await page.getByRole("button", { name: "Show", exact: true }).click();
    await page.getByText("The end date must be on or after the start date.").waitFor();
    await keepScreenshot(page, SHOTS, "73-overview-bad-range");

    // A preset brings the figures back.
    await page.getByRole("button", { name: "Last 12 weeks" }).click();
    await page.getByTestId("overview-totals").waitFor();
    expect(await tile(page, "Lessons").innerText()).toBe("1");

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("overview-csv").click()]);
    expect(download.suggestedFilename()).toMatch(/^department-overview-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.csv$/);
    const csv = readFileSync((await download.path())!, "utf8");
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toContain("Within 10 % of result (%)");
    expect(parsed.data).toHaveLength(1);
    expect(parsed.data[0]).toMatchObject({ Teacher: "Tom Ashdown", Class: DEMO_PAST_LESSON.className, Lessons: "1", "Trials run": "2" });
    for (const c of DEMO_CLASSES) for (const name of c.roster) expect(csv).not.toContain(name);
    await keepScreenshot(page, SHOTS, "74-overview-after-download");

    // The one refused request is the backwards range above.
    expect(problems).toEqual(["Failed to load resource: the server responded with a status of 400 (Bad Request)"]);
    await context.close();
  });

  it("on a phone, the overview fits the screen and its tables scroll sideways", async () => {
    const { page, context, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 390, height: 844 });
    await signInAs(page, ctx.stack.url, "Helen Marrable");
    await page.goto(`${ctx.stack.url}/department`);
    await page.getByTestId("overview-totals").waitFor();
    await page.getByTestId("lessons-chart").locator("canvas").waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await keepScreenshot(page, SHOTS, "75-overview-phone");
    expect(problems).toEqual([]);
    await context.close();
  });
});
