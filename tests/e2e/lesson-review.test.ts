/**
 * In a real browser against the real server and Postgres (the demo school): the demo teacher
 * opens the Year 12 class, reviews its finished lesson, sorts and filters the predictions,
 * downloads the predictions CSV and reads it back, and opens the printable summary (print
 * media, one A4 page, no pupil names).
 */
import { readFile } from "node:fs/promises";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { DEMO_CLASSES, DEMO_PAST_LESSON, DEMO_STAFF } from "../../server/db/seed/demo-data";
import { keepScreenshot, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const teacher = DEMO_STAFF.find((s) => s.key === "teacherA")!;
const roster = DEMO_CLASSES.find((c) => c.name === DEMO_PAST_LESSON.className)!.roster;
const pupils = roster.slice(0, DEMO_PAST_LESSON.trials[0].answers.length);
const ctx = useDemoInBrowser();

let reviewPath = "";
const numbersIn = (texts: string[]) => texts.map((t) => Number(t.replace("−", "-").replace(/[^\d.-]/g, "")));

describe("reviewing a finished lesson in the browser", () => {
  it("opens the review from the class page, sorts, filters, downloads the CSV and prints a one-page summary without names", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 1280, height: 900 });
    page.on("response", (r) => r.status() >= 400 && problems.push(`${r.status()} ${new URL(r.url()).pathname}`));
    await signInAs(page, ctx.stack.url, teacher.displayName);

    // The class page: lessons newest first with date, plan, trials run and pupils taking part.
    await page.goto(`${ctx.stack.url}/classes`);
    await page.getByRole("link", { name: /12 Physics, set 1/ }).first().click();
    const lessonsTable = page.getByTestId("class-lessons");
    await lessonsTable.waitFor();
    const headers = await lessonsTable.locator("thead th").allInnerTexts();
    expect(headers.slice(0, 4)).toEqual(["Date", "Plan", "Trials run", "Pupils taking part"]);
    const firstRow = lessonsTable.locator("tbody tr").first();
    expect(await firstRow.locator("td").nth(1).innerText()).toBe(String(DEMO_PAST_LESSON.trials.length));
    expect(await firstRow.locator("td").nth(2).innerText()).toBe(String(pupils.length));
    await keepScreenshot(page, "e2e", "60-class-lessons");

    await firstRow.getByRole("link", { name: /^Review the lesson of/ }).click();
    await page.waitForURL(/\/lessons\/[0-9a-f-]+\/review$/);
    reviewPath = new URL(page.url()).pathname;
    await page.getByRole("heading", { name: "Trial 1: Fountain rig" }).waitFor();
    await page.getByTestId("trial-graph-canvas").first().waitFor();
    // Two fountain trials: the series graph across the lesson too.
    await page.getByRole("heading", { name: "Across the lesson" }).waitFor();
    await keepScreenshot(page, "e2e", "61-lesson-review");

    // Sorting trial 1's predictions by answer, with a click: numbers in order, aria-sort set.
    const table = page.getByTestId("predictions-table").first();
    const answerHeader = table.getByRole("columnheader", { name: /Answer \(cm\)/ });
    await answerHeader.getByRole("button").click();
    expect(await answerHeader.getAttribute("aria-sort")).toBe("ascending");
    const answers = numbersIn(await table.locator("tbody tr td:nth-child(3)").allInnerTexts());
    const given: number[] = DEMO_PAST_LESSON.trials[0].answers.flatMap((a) => (a === null ? [] : [a]));
    expect(answers).toEqual([...given].sort((a, b) => a - b));
    await answerHeader.getByRole("button").click();
    expect(await answerHeader.getAttribute("aria-sort")).toBe("descending");
    expect(numbersIn(await table.locator("tbody tr td:nth-child(3)").allInnerTexts())).toEqual([...given].sort((a, b) => b - a));

    // …and by pupil with the keyboard: Tab onto the header's button, Enter.
    const pupilHeader = table.getByRole("columnheader", { name: /^Pupil/ });
    await pupilHeader.getByRole("button").focus();
    await page.keyboard.press("Enter");
    expect(await pupilHeader.getAttribute("aria-sort")).toBe("ascending");
    expect(await answerHeader.getAttribute("aria-sort")).toBeNull();
    const names = await table.locator("tbody tr td:nth-child(1)").allInnerTexts();
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, "en", { sensitivity: "base", numeric: true })));
    await keepScreenshot(page, "e2e", "62-review-sorted");

    // Filtering trial 2 (it had a re-vote): by name, then by round.
    const second = page.getByTestId("predictions-table").nth(1);
    const firstName = pupils[0]!.split(" ")[0]!;
    await page.getByLabel("Find a pupil in trial 2").fill(firstName.toUpperCase());
    const filtered = await second.locator("tbody tr td:nth-child(1)").allInnerTexts();
    expect(filtered).toEqual([pupils[0], pupils[0]]);
    await page.getByLabel("Find a pupil in trial 2").fill("");
    await page.getByLabel("Round (trial 2)").selectOption("2");
    const rounds = await second.locator("tbody tr td:nth-child(2)").allInnerTexts();
    expect(rounds.length).toBe(DEMO_PAST_LESSON.trials[1].revote!.filter((v) => v !== null).length);
    expect(new Set(rounds)).toEqual(new Set(["Re-vote"]));
    await keepScreenshot(page, "e2e", "63-review-filtered");

    // The predictions CSV: a download named after the class and date, parsing back to the lesson's answers.
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download predictions (CSV)" }).click()]);
    expect(download.suggestedFilename()).toMatch(/^12-Physics-set-1-\d{4}-\d{2}-\d{2}-predictions\.csv$/);
    const text = await readFile((await download.path())!, "utf8");
    const csv = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
    expect(csv.errors).toEqual([]);
    expect(csv.meta.fields).toEqual(expect.arrayContaining(["pupil", "round", "prediction (cm)", "result (cm)", "theory (cm)", "height of the pot above the floor (m)"]));
    const expected = DEMO_PAST_LESSON.trials.flatMap((t, ti) => [
      ...t.answers.flatMap((v, i) => (v === null ? [] : [[String(ti + 1), pupils[i], "before the run", String(v)]])),
      ...(t.revote ?? []).flatMap((v, i) => (v === null ? [] : [[String(ti + 1), pupils[i], "re-vote", String(v)]])),
    ]);
    const rows = csv.data.map((r) => [r.trial, r.pupil, r.round, r["prediction (cm)"]]);
    expect([...rows].sort()).toEqual([...expected].sort());
    expect(csv.data.find((r) => r.trial === "1")!["result (cm)"]).toBe("14.3");

    // The printable summary: print media, one A4 page, graphs drawn, and no pupil's name anywhere.
    await page.getByRole("link", { name: "Print summary" }).click();
    await page.waitForURL(/\/summary$/);
    const sheet = page.getByTestId("lesson-summary");
    await sheet.waitFor();
    await sheet.getByTestId("trial-graph-canvas").nth(DEMO_PAST_LESSON.trials.length - 1).waitFor();
    await keepScreenshot(page, "e2e", "64-summary-screen");
    // A4 at 96 px per inch: 794 × 1123 px.
    await page.setViewportSize({ width: 794, height: 1123 });
    await page.emulateMedia({ media: "print" });
    await keepScreenshot(page, "e2e", "65-summary-print");
    expect(await page.getByRole("button", { name: "Print" }).isVisible()).toBe(false);
    const printed = await sheet.innerText();
    for (const name of pupils) expect(printed).not.toContain(name);
    expect(printed).toContain(DEMO_PAST_LESSON.explanations.find((e) => e.shown)!.text);
    expect(printed).not.toContain(DEMO_PAST_LESSON.explanations.find((e) => !e.shown)!.text);
    expect(printed).toMatch(/median 12 cm/);
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    const pages = pdf.toString("latin1").match(/\/Type\s*\/Page(?!s)/g) ?? [];
    expect(pages.length).toBe(1);

    expect(problems).toEqual([]);
    await context.close();
  });

  it("fits a phone screen (tables scroll inside their frame), and the head of department cannot open it", async () => {
    expect(reviewPath).toMatch(/^\/lessons\/[0-9a-f-]+\/review$/);
    const phone = await ctx.browser.newContext({ viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true });
    const page = await phone.newPage();
    await signInAs(page, ctx.stack.url, teacher.displayName);
    await page.goto(`${ctx.stack.url}${reviewPath}`);
    await page.getByRole("heading", { name: "Trial 1: Fountain rig" }).waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    await keepScreenshot(page, "e2e", "66-review-phone");
    expect(overflow).toBeLessThanOrEqual(0);
    await phone.close();

    const head = DEMO_STAFF.find((s) => s.key === "head")!;
    const { context, page: headPage } = await watchedPage(ctx.browser, ctx.stack.url);
    await signInAs(headPage, ctx.stack.url, head.displayName);
    await headPage.goto(`${ctx.stack.url}${reviewPath}`);
    await headPage.getByRole("heading", { name: "Lesson not found" }).waitFor();
    const text = await headPage.locator("main").innerText();
    for (const name of pupils) expect(text).not.toContain(name);
    await keepScreenshot(headPage, "e2e", "67-review-refused-to-head");
    await context.close();
  });
});
