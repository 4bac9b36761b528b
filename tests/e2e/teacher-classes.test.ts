/**
 * In a real browser (Debian's chromium via playwright-core) against the real server and
 * Postgres: the demo teacher signs in through the local provider, creates a class, sees it
 * listed, reloads, and it is still there.
 */
import { describe, expect, it } from "vitest";
import { DEMO_STAFF } from "../../server/db/seed/demo-data";
import { keepScreenshot, pickAccount, useDemoInBrowser, watchedPage } from "../support/browser";

const teacher = DEMO_STAFF.find((s) => s.key === "teacherA")!;
const ctx = useDemoInBrowser();

describe("a teacher's classes in the browser", () => {
  it("signs in as the demo teacher, creates a class, and finds it again after a reload", async () => {
    const { context, page, problems } = await watchedPage(ctx.browser, ctx.stack.url, { width: 1280, height: 800 });
    page.on("response", (r) => r.status() >= 400 && problems.push(`${r.status()} ${new URL(r.url()).pathname}`));

    // Signed out, any page leads to sign-in.
    await page.goto(`${ctx.stack.url}/classes`);
    await page.waitForURL(/\/sign-in/);
    await keepScreenshot(page, "e2e", "01-sign-in");

    await pickAccount(page, teacher.displayName);
    // Back where the teacher was going.
    await page.waitForURL(`${ctx.stack.url}/classes`);
    await page.getByRole("heading", { name: "Your classes" }).waitFor();

    // The demo classes are there.
    await page.getByText("10A Physics").first().waitFor();

    await page.getByRole("button", { name: "New class" }).click();
    // Submitting empty shows the message next to the field, and saves nothing.
    await page.getByLabel("Class name").fill("");
    await page.getByRole("button", { name: "Create class" }).click();
    await page.getByText(/Give the class name/).first().waitFor();

    await page.getByLabel("Class name").fill("9Q Physics");
    await page.getByLabel("Year group").fill("Year 9");
    await page.getByLabel("Subject").fill("Physics");
    await page.getByRole("button", { name: "Create class" }).click();
    await page.getByRole("link", { name: /9Q Physics/ }).first().waitFor();
    await keepScreenshot(page, "e2e", "02-class-created");

    await page.reload();
    await page.getByRole("link", { name: /9Q Physics/ }).first().waitFor();
    await keepScreenshot(page, "e2e", "03-after-reload");

    expect(problems).toEqual([]);
    await context.close();
  });

  it("works on a narrow phone screen: the class list fits without sideways scrolling", async () => {
    const context = await ctx.browser.newContext({ viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${ctx.stack.url}/sign-in`);
    await pickAccount(page, teacher.displayName);
    await page.waitForURL(`${ctx.stack.url}/`);
    await page.goto(`${ctx.stack.url}/classes`);
    await page.getByText("10A Physics").first().waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await keepScreenshot(page, "e2e", "04-phone-classes");
    await context.close();
  });
});
