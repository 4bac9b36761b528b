/**
 * Lesson plans in the browser against the real server and Postgres (the demo school): a teacher
 * sees the department's starter plans, builds a two-trial plan in the editor (the sketch and the
 * theory value follow the parameters), saves it, starts a live lesson from it for a class, and
 * the board opens on trial 1 of 2 with the plan's set-up; a pupil answers, the lesson ends, and
 * the teacher opens its review from the class page and downloads the predictions. A colleague's shared plan opens
 * read-only with "Duplicate to edit". Screenshots are kept as test output.
 */
import { readFile } from "node:fs/promises";
import { join } from "node:path";
import { eq } from "drizzle-orm";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { lessons, trials } from "../../server/db/schema";
import { keepScreenshot, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";
import { TEST_OUTPUT_DIR } from "../support/paths";

const ctx = useDemoInBrowser();
const POT_HEIGHT = "Height of the pot above the floor (m)";

describe("lesson plans", () => {
  it("a teacher builds a two-trial plan, starts a live lesson from it, then reviews it and downloads the CSV", async () => {
    const { page, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 1400, height: 1000 });
    await signInAs(page, ctx.stack.url, "Tom Ashdown");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plans" }).click();
    await page.getByRole("heading", { name: "Lesson plans", level: 1 }).waitFor();

    // The demo's three starter plans, shared by the head of department.
    const shared = page.getByRole("list", { name: "Plans shared in your department" });
    await shared.getByTestId("plan-card").first().waitFor();
    expect(await shared.getByTestId("plan-card").count()).toBe(3);
    await shared.getByText("Rods or beads on a thread?").waitFor();
    expect(await shared.getByText("By Helen Marrable").count()).toBe(3);
    await page.getByText("No plans of your own yet").waitFor();
    await keepScreenshot(page, "e2e", "50-plans-list");

    // A colleague's plan opens read-only.
    await shared.getByRole("link", { name: "Open Rods or beads on a thread?" }).click();
    await page.getByRole("button", { name: "Duplicate to edit" }).waitFor();
    expect(await page.getByRole("button", { name: "Save changes" }).count()).toBe(0);
    expect(await page.getByTestId("plan-trial").count()).toBe(2);
    await keepScreenshot(page, "e2e", "51-plan-shared-read-only");
    await page.getByRole("link", { name: "Lesson plans" }).click();
    await shared.getByRole("link", { name: "Open A chain falling onto a scale" }).click();
    await page.getByRole("heading", { name: "Trial 2 of 2: Scale rig" }).waitFor();
    expect(await page.getByTestId("rig-preview").nth(1).getAttribute("aria-label")).toContain("A 2 m chain held just above a scale pan");
    await keepScreenshot(page, "e2e", "55-plan-scale-read-only");

    // A new plan: trial 1 at 0.5 m, then 1.5 m; the theory value and the sketch follow.
    await page.goto(`${ctx.stack.url}/plans/new`);
    await page.getByLabel("Title").fill("Two drops, two chains");
    const first = page.getByTestId("plan-trial").nth(0);
    await first.getByLabel(POT_HEIGHT).fill("0.5");
    const theory = first.getByTestId("trial-theory");
    await expect.poll(() => theory.innerText(), { timeout: 10_000 }).toMatch(/cm$/);
    // Steady fountain, h2 = α·h1/(1 − α − β) above the pile (Biggins & Warner, Proc. R. Soc. A 470:
    // 20130689, 2014): with the default α = 0.12, β = 0 and the rim 3 mm above the pile, 0.5 m → 6.52 cm.
    await expect.poll(() => theory.innerText()).toBe("6.52 cm");
    const sketchAtHalf = await first.getByTestId("rig-preview").innerHTML();
    await first.getByLabel(POT_HEIGHT).fill("1.5");
    await expect.poll(() => theory.innerText(), { timeout: 10_000 }).toBe("20.2 cm");
    expect(await first.getByTestId("rig-preview").innerHTML()).not.toBe(sketchAtHalf);
    expect(await first.getByTestId("rig-preview").getAttribute("aria-label")).toContain("1.5 m above the floor");

    // Trial 2 starts as a copy; beads on a thread at 1 m, no re-vote.
    await page.getByRole("button", { name: "Add a trial" }).click();
    const second = page.getByTestId("plan-trial").nth(1);
    await second.getByRole("heading", { name: "Trial 2 of 2: Fountain rig" }).waitFor();
    await second.getByLabel("Link shape").selectOption("bead-thread");
    await second.getByLabel(POT_HEIGHT).fill("1");
    await second.getByLabel("Offer a re-vote after the discussion").uncheck();
    await expect.poll(() => second.getByTestId("trial-theory").innerText(), { timeout: 10_000 }).toBe("13.3 cm");
    expect(await second.getByTestId("rig-preview").getAttribute("aria-label")).toContain("beads on slack threads");
    await first.getByTestId("rig-preview").screenshot({ path: join(TEST_OUTPUT_DIR, "e2e", "56-plan-sketch-rods-1.5m.png") });
    await second.getByTestId("rig-preview").screenshot({ path: join(TEST_OUTPUT_DIR, "e2e", "57-plan-sketch-beads-1m.png") });

    // Reordering by keyboard: move trial 2 up and back down; focus stays on the moved trial.
    await second.getByRole("button", { name: "Move trial 2 up" }).focus();
    await page.keyboard.press("Enter");
    await expect.poll(() => page.getByTestId("plan-trial").nth(0).getByLabel(POT_HEIGHT).inputValue()).toBe("1");
    const focused = await page.evaluate(() => document.activeElement?.getAttribute("aria-label"));
    expect(focused).toBe("Move trial 1 down");
    await page.keyboard.press("Enter");
    await expect.poll(() => page.getByTestId("plan-trial").nth(0).getByLabel(POT_HEIGHT).inputValue()).toBe("1.5");
    await keepScreenshot(page, "e2e", "52-plan-editor-two-trials");

    // Leaving with unsaved changes asks first; staying keeps everything typed.
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plans" }).click();
    const leave = page.getByRole("dialog", { name: "Leave without saving?" });
    await leave.getByRole("button", { name: "Stay on this page" }).click();
    await leave.waitFor({ state: "hidden" });
    expect(page.url()).toBe(`${ctx.stack.url}/plans/new`);
    expect(await page.getByLabel("Title").inputValue()).toBe("Two drops, two chains");

    await page.getByRole("button", { name: "Save plan" }).click();
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
    const planId = page.url().split("/").at(-1)!;
    await page.getByRole("heading", { name: "Two drops, two chains", level: 1 }).waitFor();
    await page.getByText("All changes saved").waitFor();

    // Start it with a class: the board opens on trial 1 of 2 with the plan's set-up.
    await page.getByRole("button", { name: "Start a lesson" }).click();
    const dialog = page.getByRole("dialog", { name: "Start a live lesson" });
    await dialog.getByLabel("Class").selectOption({ label: "10A Physics" });
    await keepScreenshot(page, "e2e", "53-plan-start-pick-class");
    await dialog.getByRole("button", { name: "Start the lesson" }).click();
    await page.waitForURL(/\/lessons\/[0-9a-f-]+\/board$/);
    const lessonId = page.url().split("/").at(-2)!;
    await page.getByRole("heading", { name: /Trial 1 of 2: Fountain rig/ }).waitFor();
    await page.getByText("Plan: Two drops, two chains").waitFor();
    await expect.poll(() => page.getByLabel(POT_HEIGHT).inputValue()).toBe("1.5");
    await keepScreenshot(page, "e2e", "54-board-from-plan");

    const db = ctx.database.db;
    const [lesson] = await db.select().from(lessons).where(eq(lessons.id, lessonId));
    expect(lesson).toMatchObject({ planId, planTitle: "Two drops, two chains" });
    const rows = await db.select().from(trials).where(eq(trials.lessonId, lessonId)).orderBy(trials.position);
    expect(rows.map((t) => [t.params.potHeight, t.params.linkShape, t.question.revote])).toEqual([
      [1.5, "rod", true],
      [1, "bead-thread", false],
    ]);

    // A pupil answers trial 1; the lesson ends; the teacher reviews it and downloads its predictions.
    const pupil = await watchedPage(ctx.browser, ctx.stack.url, { width: 390, height: 844 });
    await pupil.page.goto(`${ctx.stack.url}/join/${lesson!.code.toLowerCase()}`);
    const pick = pupil.page.getByRole("group", { name: "Pick your name" }).getByRole("button").first();
    const pupilName = (await pick.innerText()).trim();
    await pick.click();
    await pupil.page.getByRole("heading", { name: "Fountain rig" }).waitFor();
    await page.getByText("1 joined").waitFor();
    await page.locator("body").press("n");
    await pupil.page.getByLabel("Your answer (cm)").fill("21,5");
    await pupil.page.getByLabel(/Why do you think so/).fill("=1+1 twice the drop, twice the rise");
    await pupil.page.getByRole("button", { name: "Send my prediction" }).click();
    await pupil.page.getByText("Answer received").waitFor();
    await page.getByText("1 answered").waitFor();
    await page.getByRole("button", { name: "End lesson" }).click();
    await page.getByRole("dialog", { name: "End this lesson?" }).getByRole("button", { name: "End lesson" }).click();
    await page.getByRole("dialog", { name: "End this lesson?" }).waitFor({ state: "hidden" });

    await page.goto(`${ctx.stack.url}/classes`);
    await page.getByRole("link", { name: /10A Physics/ }).first().click();
    const lessonsTable = page.getByTestId("class-lessons");
    await lessonsTable.getByText("Two drops, two chains").waitFor();
    await lessonsTable.getByRole("link", { name: /^Review the lesson of/ }).first().click();
    await page.waitForURL(`${ctx.stack.url}/lessons/${lessonId}/review`);
    await page.getByText(pupilName).first().waitFor();
    await keepScreenshot(page, "e2e", "58-review-of-plan-lesson");
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download predictions (CSV)" }).click()]);
    const csv = Papa.parse<Record<string, string>>(await readFile((await download.path())!, "utf8"), { header: true, skipEmptyLines: true });
    expect(csv.errors).toEqual([]);
    expect(csv.data.map((r) => [r.trial, r.pupil, r.round, r["prediction (cm)"], r.reason])).toEqual([
      ["1", pupilName, "before the run", "21.5", "'=1+1 twice the drop, twice the rise"],
    ]);
    expect(pupil.problems).toEqual([]);
    await pupil.context.close();
    expect(problems).toEqual([]);
  });
});
