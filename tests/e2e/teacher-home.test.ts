/**
 * Home in a real browser against the real server and Postgres (demo data): the teacher's next
 * lessons, recent lessons and plans, a live lesson started in two clicks, and a lesson put in
 * the diary and started from it.
 */
import { describe, expect, it } from "vitest";
import { DEMO_PLANS, DEMO_STAFF } from "../../server/db/seed/demo-data";
import { keepScreenshot, signInAs, useDemoInBrowser, watchedPage } from "../support/browser";

const teacher = DEMO_STAFF.find((s) => s.key === "teacherA")!;
const ctx = useDemoInBrowser();

describe("the teacher's home page", () => {
  it("lists next and recent lessons and plans, starts a live lesson in two clicks, and plans one", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 1280, height: 900 });
    await signInAs(page, ctx.stack.url, teacher.displayName);

    const next = page.getByRole("list", { name: "Next lessons, soonest first" });
    await next.getByText(/Tomorrow, 09:05 · 10A Physics/).waitFor();
    await next.getByText(`${DEMO_PLANS.plans[0]!.title} (3 trials)`).waitFor();
    // The demo's finished lesson leads to its review.
    const recent = page.getByRole("list", { name: "Recent lessons, newest first" });
    const review = recent.getByRole("link", { name: /12 Physics, set 1/ });
    expect(await review.getAttribute("href")).toMatch(/^\/lessons\/[0-9a-f-]+\/review$/);
    await page.getByRole("list", { name: "Lesson plans" }).getByRole("link").first().waitFor();
    expect(await page.getByRole("list", { name: "Lesson plans" }).getByRole("link").count()).toBe(3);
    await keepScreenshot(page, "e2e", "80-teacher-home");

    // Two clicks: open the dialog (the next planned lesson's class is suggested), then Start.
    let clicks = 0;
    await page.getByRole("button", { name: "Start a live lesson" }).click();
    clicks++;
    const dialog = page.getByRole("dialog", { name: "Start a live lesson" });
    expect(await dialog.getByLabel("Class").inputValue()).toBe(
      await dialog.getByLabel("Class").locator("option", { hasText: "10A Physics" }).getAttribute("value"),
    );
    await keepScreenshot(page, "e2e", "81-quick-start");
    await dialog.getByRole("button", { name: "Start", exact: true }).click();
    clicks++;
    await page.waitForURL(/\/lessons\/[0-9a-f-]+\/board$/);
    await page.getByRole("img", { name: /QR code/ }).waitFor();
    expect(clicks).toBe(2);

    // Back home: the open lesson is offered first; put a lesson in the diary without a plan.
    await page.goto(`${ctx.stack.url}/`);
    await page.getByText("A live lesson is still open").waitFor();
    await page.getByRole("button", { name: "Plan a lesson" }).click();
    const plan = page.getByRole("dialog", { name: "Plan a lesson" });
    await plan.getByLabel("Class").selectOption({ label: "12 Physics, set 1" });
    // An impossible time is caught before sending.
    await plan.getByLabel("Time").fill("");
    await plan.getByRole("button", { name: "Add to next lessons" }).click();
    await plan.getByText("Give the lesson's date and time.").waitFor();
    await plan.getByLabel("Time").fill("10:15");
    await plan.getByRole("button", { name: "Add to next lessons" }).click();
    await plan.waitFor({ state: "hidden" });
    await next.getByText(/10:15 · 12 Physics, set 1/).waitFor();
    await next.getByText("No plan: one fountain trial").waitFor();

    // Starting the planned 10A lesson opens its board with the plan's three trials, and it leaves the list.
    await next.getByRole("button", { name: "Start the live lesson with 10A Physics" }).click();
    await page.waitForURL(/\/lessons\/[0-9a-f-]+\/board$/);
    await page.getByText(/Trial 1 of 3/).waitFor();
    await page.goto(`${ctx.stack.url}/`);
    await next.getByText(/12 Physics, set 1/).first().waitFor();
    expect(await next.getByText(/Tomorrow, 09:05 · 10A Physics/).count()).toBe(0);
    await recent.getByText(DEMO_PLANS.plans[0]!.title).first().waitFor();
    await keepScreenshot(page, "e2e", "82-home-after-starting");

    expect(problems).toEqual([]);
    await context.close();
  });

  it("fits a phone screen without sideways scrolling", async () => {
    const context = await ctx.browser.newContext({ viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await signInAs(page, ctx.stack.url, teacher.displayName);
    await page.getByRole("heading", { name: "Next lessons" }).waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await keepScreenshot(page, "e2e", "83-phone-home");
    await context.close();
  });
});
